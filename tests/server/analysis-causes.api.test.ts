import padjust from '@stdlib/stats-padjust';
import { beforeAll, describe, expect, it } from 'vitest';
import { factors, type Factor } from '../../shared/enums';
import type { CauseRow } from '../../shared/schemas/analysis-causes';
import { createTestApp } from '../setup/test-app';
import { everyCause } from '../setup/analysis-pages';
import { signedIn } from '../setup/factories';
import { addDays, isoWeekLabel, planted } from './analysis-planted.fixture';
import {
  all,
  bruteFisher,
  countBy,
  expectClose,
  history,
  isIncubating,
  katz,
  levelOf,
  plantHistory,
  RECENT_CLEAN,
} from './analysis.fixtures';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  ({ reader } = await plantHistory(app));
});

describe('GET /api/analysis/causes', () => {
  let causes: CauseRow[];
  beforeAll(async () => {
    causes = (await everyCause(reader.agent)).causes;
  });

  // DESIGN.md §3 (revised for issue 9): likely causes count settled jars only; incubating ones are reported beside.
  it('tests level vs rest over settled jars for every level with settled jars on both sides, with exact counts', () => {
    const settled = all.filter((j) => !isIncubating(j));
    const expectedRows = Object.entries(levelOf).flatMap(([, key]) => [...countBy(settled, key).keys()]);
    expect(causes).toHaveLength(expectedRows.length);
    for (const [factor, key] of Object.entries(levelOf)) {
      const incubating = countBy(all, key);
      for (const [level, t] of countBy(settled, key)) {
        const row = causes.find((c) => c.factor === factor && c.level === level)!;
        expect(row).toMatchObject({
          jars: t.jars,
          contaminated: t.contaminated,
          incubating: incubating.get(level)!.incubating,
          restJars: settled.length - t.jars,
          restContaminated: settled.filter((j) => j.contaminant).length - t.contaminated,
        });
      }
    }
    expect(causes.find((c) => c.factor === 'session' && c.level === 'PX-S-NOW')).toMatchObject({
      jars: 1,
      incubating: RECENT_CLEAN,
    });
  });

  it('gives Fisher two-sided p-values equal to a brute-force hypergeometric sum', () => {
    for (const c of causes) {
      const expected = bruteFisher(
        c.contaminated,
        c.jars - c.contaminated,
        c.restContaminated,
        c.restJars - c.restContaminated,
      );
      expectClose(c.pValue, expected, 1e-8);
    }
  });

  it('gives relative risks with the Katz log-method interval and the 0.5 rule for zero cells', () => {
    for (const c of causes) {
      const e = katz(c.contaminated, c.jars, c.restContaminated, c.restJars);
      expectClose(c.relativeRisk, e.rr, 1e-12);
      expectClose(c.rr95[0], e.lo, 1e-12);
      expectClose(c.rr95[1], e.hi, 1e-12);
    }
    expect(causes.some((c) => c.contaminated === 0)).toBe(true);
  });

  it('gives Benjamini–Hochberg q-values over all rows returned (as @stdlib/stats-padjust bh)', () => {
    // Benjamini & Hochberg, JRSS B 57:289–300 (1995), step-up procedure.
    const q = padjust(
      causes.map((c) => c.pValue),
      'bh',
    );
    causes.forEach((c, i) => expectClose(c.qValue, q[i]!, 1e-9));
  });

  it('sorts rows that fare worse (rate > restRate) first, then q, relativeRisk descending, p, factor order, level', () => {
    for (let i = 1; i < causes.length; i++) {
      const [a, b] = [causes[i - 1]!, causes[i]!];
      const key = (c: CauseRow) => [
        c.rate > c.restRate ? 0 : 1,
        c.qValue,
        -c.relativeRisk,
        c.pValue,
        factors.indexOf(c.factor),
      ];
      const [ka, kb] = [key(a), key(b)];
      const j = ka.findIndex((v, n) => v !== kb[n]);
      expect(j === -1 ? a.level < b.level : ka[j]! < kb[j]!).toBe(true);
    }
  });

  it('puts each planted cause first among the harmful rows of its factor and in the first three overall', () => {
    const top3 = causes.slice(0, 3).map((c) => `${c.factor}:${c.level}`);
    for (const [factor, level] of [
      ['cookRun', planted.shortRun],
      ['culture', planted.badCulture],
      ['operator', planted.sloppyOperator],
    ] as const) {
      const firstHarmful = causes.find((c) => c.factor === factor && c.relativeRisk > 1)!;
      expect(firstHarmful.level).toBe(level);
      expect(top3).toContain(`${factor}:${level}`);
    }
  });

  it('names confounded levels: the short run holds all of its bucket and grain', () => {
    const short = causes.find((c) => c.factor === 'cookRun' && c.level === planted.shortRun)!;
    const shortGrain = history.find((j) => j.cookRun === planted.shortRun)!.grain;
    expect(short.confoundedWith).toEqual([
      { factor: 'grain', level: shortGrain },
      { factor: 'cookMinutes', level: '<60' },
      { factor: 'week', level: isoWeekLabel(addDays(planted.firstMonday, 7 * planted.shortRunWeek)) },
    ]);
    const culture = causes.find((c) => c.factor === 'culture' && c.level === planted.badCulture)!;
    expect(culture.confoundedWith).toEqual([]);
  });

  it('says the data cannot tell levels apart only for levels that hold each other’s jars both ways', () => {
    // The short run's grain, bucket and week hold ≥ 90 % of its jars, but it holds far less of theirs.
    const short = causes.find((c) => c.factor === 'cookRun' && c.level === planted.shortRun)!;
    expect(short.hint).not.toContain('cannot tell');
    expect(causes.some((c) => c.hint?.includes('cannot tell'))).toBe(false);
    expect(causes.some((c) => c.hint && /\b(cookMinutes|cookRun|prepBatch)\b|(?<!ISO )week \d{4}-W/.test(c.hint))).toBe(
      false,
    );
  });

  it('gives each planted cause a common-practice hint that fits its contaminant', () => {
    const row = (factor: Factor, level: string) => causes.find((c) => c.factor === factor && c.level === level)!;
    const short = row('cookRun', planted.shortRun);
    expect(short.hint).toMatch(/sterilisation cycle/);
    expect(short.hintBasis).toMatch(/^common practice; Stamets & Chilton/);
    expect(short.medianDaysToDetection).toBe(4);
    expect(short.contaminants).toEqual({ bacterial: short.contaminated });
    expect(row('culture', planted.badCulture).hint).toMatch(/test it on agar/);
    expect(row('operator', planted.sloppyOperator).hint).toMatch(/technique or the workspace/);
    expect(row('operator', planted.sloppyOperator).hintBasis).toBe('common practice');
    for (const c of causes.filter((x) => x.contaminated === 0)) expect(c.hint).toBeNull();
  });

  it('skips levels smaller than minJars', async () => {
    const body = await everyCause(reader.agent, { minJars: 20 });
    expect(body.causes.every((c) => c.jars >= 20)).toBe(true);
    expect(body.causes.some((c) => c.factor === 'session')).toBe(false);
    const q = padjust(
      body.causes.map((c) => c.pValue),
      'bh',
    );
    body.causes.forEach((c, i) => expectClose(c.qValue, q[i]!, 1e-9));
  });
});
