import { beforeAll, describe, expect, it } from 'vitest';
import type { WeeklyDto } from '../../shared/schemas/analysis-weekly';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { addDays, isoWeekLabel, planted } from './analysis-planted.fixture';
import {
  all,
  countBy,
  expectClose,
  history,
  plantHistory,
  RECENT_CLEAN,
  RECENT_DAYS_AGO,
  today,
} from './analysis.fixtures';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  ({ reader } = await plantHistory(app));
});

describe('GET /api/analysis/weekly', () => {
  let body: WeeklyDto;
  beforeAll(async () => {
    const res = await reader.agent.get(`/api/analysis/weekly?from=${planted.firstMonday}&to=${today}`);
    if (res.status !== 200) throw new Error(`weekly answered ${res.status}`);
    body = res.body as WeeklyDto;
  });

  it('lists each ISO week with exact counts and grains', () => {
    const expected = countBy(all, (j) => isoWeekLabel(j.inoculatedOn));
    expect(body.weeks.map((w) => w.week)).toEqual([...expected.keys()].sort());
    for (const w of body.weeks) {
      expect({ jars: w.jars, contaminated: w.contaminated, incubating: w.incubating }).toEqual(expected.get(w.week));
      expect(w.rate).toBe(w.contaminated / w.jars);
      const grains = countBy(
        all.filter((j) => isoWeekLabel(j.inoculatedOn) === w.week),
        (j) => j.grain,
      );
      expect(w.grains.map((g) => [g.grain, g.jars, g.contaminated])).toEqual(
        [...grains.entries()].sort(([a], [b]) => (a < b ? -1 : 1)).map(([g, t]) => [g, t.jars, t.contaminated]),
      );
    }
  });

  it('marks the recent week that holds incubating jars provisional, never out of control, and leaves it out of p̄', () => {
    const recentWeek = isoWeekLabel(addDays(today, -RECENT_DAYS_AGO));
    const week = body.weeks.find((w) => w.week === recentWeek)!;
    expect(week).toMatchObject({ provisional: true, outOfControl: false, incubating: RECENT_CLEAN });
    expect(body.weeks.filter((w) => w.provisional)).toHaveLength(1);
    // p-chart centre line Σx/Σn over the included weeks — Montgomery, Introduction to Statistical Quality Control, ch. 7.
    const settled = history;
    expect(body.pBar).toBe(settled.filter((j) => j.contaminant).length / settled.length);
  });

  it('gives 3-sigma limits for each week’s own n and flags the short-run week out of control', () => {
    const pBar = body.pBar!;
    for (const w of body.weeks) {
      const spread = 3 * Math.sqrt((pBar * (1 - pBar)) / w.jars);
      expectClose(w.ucl, Math.min(1, pBar + spread), 1e-12);
      expect(w.lcl).toBeCloseTo(Math.max(0, pBar - spread), 12);
      // DESIGN.md §4.4 (revised for issue 9): only above the upper limit is out of control; below the lower is belowLcl.
      expect(w.outOfControl).toBe(!w.provisional && w.rate > w.ucl);
      expect(w.belowLcl).toBe(!w.provisional && w.rate < w.lcl);
    }
    const shortWeek = isoWeekLabel(addDays(planted.firstMonday, 7 * planted.shortRunWeek));
    expect(body.weeks.find((w) => w.week === shortWeek)!.outOfControl).toBe(true);
  });

  it('marks a settled week above the lab target even when it is in control (DESIGN §4.4)', async () => {
    expect(body.target).toBe(0.05);
    for (const w of body.weeks) expect(w.aboveTarget).toBe(!w.provisional && w.rate > body.target);
    const calm = body.weeks.filter((w) => !w.provisional && !w.outOfControl && w.rate > 0);
    const highest = calm.sort((a, b) => b.rate - a.rate)[0]!;
    await dataSource.query('UPDATE lab_settings SET contaminationTarget = ? WHERE id = 1', [highest.rate / 2]);
    try {
      const res = await reader.agent.get(`/api/analysis/weekly?from=${planted.firstMonday}&to=${today}`);
      const week = (res.body as WeeklyDto).weeks.find((w) => w.week === highest.week)!;
      expect(week).toMatchObject({ outOfControl: false, aboveTarget: true });
      expect((res.body as WeeklyDto).weeks.find((w) => w.provisional)!.aboveTarget).toBe(false);
    } finally {
      await dataSource.query('UPDATE lab_settings SET contaminationTarget = 0.05 WHERE id = 1');
    }
  });

  it('defaults to the last twelve ISO weeks', async () => {
    const res = await reader.agent.get('/api/analysis/weekly');
    const def = res.body as WeeklyDto;
    expect(def.to).toBe(today);
    expect(isoWeekLabel(def.from)).toBe(isoWeekLabel(addDays(today, -7 * 11)));
    expect(new Date(`${def.from}T00:00:00Z`).getUTCDay()).toBe(1);
    expect(def.weeks.map((w) => w.week)).toEqual([isoWeekLabel(addDays(today, -RECENT_DAYS_AGO))]);
  });
});
