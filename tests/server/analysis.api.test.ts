import pmf from '@stdlib/stats-base-dists-hypergeometric-pmf';
import padjust from '@stdlib/stats-padjust';
import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { factors, type Factor } from '../../shared/enums';
import type { CauseRow, CausesDto } from '../../shared/schemas/analysis-causes';
import type { CrosstabDto, RatesDto } from '../../shared/schemas/analysis-rates';
import type { WeeklyDto } from '../../shared/schemas/analysis-weekly';
import { wilsonInterval } from '../../shared/stats/wilson';
import { localDate } from '../../server/core/local-time';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import {
  addDays,
  clearProduction,
  historyCsv,
  isoWeekLabel,
  planted,
  plantedHistory,
  recentJars,
  type HistoryJar,
} from './analysis-planted.fixture';

const app = createTestApp();
const today = localDate(new Date());
const RECENT_DAYS_AGO = 3;
const RECENT_CLEAN = 10;
const history = plantedHistory();
const recent = recentJars(today, RECENT_DAYS_AGO, RECENT_CLEAN);
const all = [...history, ...recent];
const WINDOW_DAYS = 21;

const daysOld = (j: HistoryJar) =>
  Math.round((Date.parse(`${today}T00:00:00Z`) - Date.parse(`${j.inoculatedOn}T00:00:00Z`)) / 86_400_000);
const isIncubating = (j: HistoryJar) => !j.contaminant && daysOld(j) < WINDOW_DAYS;
const bucket = (m: number) => (m < 60 ? '<60' : m < 90 ? '60-89' : m < 120 ? '90-119' : m < 180 ? '120-179' : '180+');

/** The level of each factor an imported jar records; imported history has no prep batch, workspace or room. */
const levelOf: Partial<Record<Factor, (j: HistoryJar) => string>> = {
  grain: (j) => j.grain,
  cookRun: (j) => j.cookRun,
  cookMinutes: (j) => bucket(j.cookMinutes),
  session: (j) => j.session,
  operator: (j) => j.operator,
  culture: (j) => j.culture,
  week: (j) => isoWeekLabel(j.inoculatedOn),
};

function countBy(jars: HistoryJar[], key: (j: HistoryJar) => string) {
  const out = new Map<string, { jars: number; contaminated: number; incubating: number }>();
  for (const j of jars) {
    const t = out.get(key(j)) ?? { jars: 0, contaminated: 0, incubating: 0 };
    t.jars++;
    if (j.contaminant) t.contaminated++;
    if (isIncubating(j)) t.incubating++;
    out.set(key(j), t);
  }
  return out;
}

/**
 * Fisher's exact test, two-sided (Fisher, The Design of Experiments, 1935; Agresti, Categorical Data
 * Analysis, 2002, §3.5): the sum of hypergeometric probabilities of every table with the observed margins
 * no likelier than the observed one, with R's relative tolerance 1 + 1e-7. Summed by brute force over
 * the whole support with @stdlib's pmf, independently of shared/stats/fisher.ts.
 */
function bruteFisher(a: number, b: number, c: number, d: number): number {
  const N = a + b + c + d;
  const K = a + b;
  const n = a + c;
  const observed = pmf(a, N, K, n);
  let p = 0;
  for (let x = Math.max(0, n - (N - K)); x <= Math.min(K, n); x++) {
    const px = pmf(x, N, K, n);
    if (px <= observed * (1 + 1e-7)) p += px;
  }
  return Math.min(1, p);
}

/** Katz et al., Biometrics 34:469–474 (1978): log-method interval, 0.5 added to every cell when one is zero. */
function katz(a: number, n1: number, c: number, n2: number) {
  const zero = [a, n1 - a, c, n2 - c].includes(0) ? 0.5 : 0;
  const [x1, m1, x2, m2] = [a + zero, n1 + 2 * zero, c + zero, n2 + 2 * zero];
  const rr = x1 / m1 / (x2 / m2);
  const se = Math.sqrt(1 / x1 - 1 / m1 + 1 / x2 - 1 / m2);
  return { rr, lo: rr * Math.exp(-1.959963984540054 * se), hi: rr * Math.exp(1.959963984540054 * se) };
}

const expectClose = (actual: number, expected: number, rel = 1e-9) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.max(Math.abs(expected), 1e-300));

let reader: Awaited<ReturnType<typeof signedIn>>;
let imported: unknown;

beforeAll(async () => {
  await clearProduction();
  const supervisor = await signedIn(app, 'supervisor');
  const res = await supervisor.agent
    .post('/api/imports/history')
    .set('X-CSRF-Token', supervisor.token())
    .set('Content-Type', 'text/csv')
    .send(historyCsv(all));
  if (res.status !== 200) throw new Error(`import failed: ${JSON.stringify(res.body).slice(0, 500)}`);
  imported = res.body.imported;
  reader = await signedIn(app, 'technician');
});

describe('GET /api/analysis/* — access and input', () => {
  it('reads the planted history through the import route', () => {
    expect(imported).toEqual({ jars: all.length, incidents: all.filter((j) => j.contaminant).length });
  });

  it('answers 401 without a session', async () => {
    for (const path of [
      'rates?by=grain',
      'crosstab?rows=grain&cols=cookRun',
      'causes',
      'weekly',
      'colonisation',
      'lethality',
    ]) {
      expect((await supertest(app).get(`/api/analysis/${path}`)).status).toBe(401);
    }
  });

  it.each(['technician', 'supervisor', 'trainer', 'admin'] as const)('lets a %s read the rates', async (role) => {
    const client = await signedIn(app, role);
    expect((await client.agent.get('/api/analysis/rates?by=grain')).status).toBe(200);
  });

  it.each([
    ['/api/analysis/rates?by=colour', 'by'],
    ['/api/analysis/rates', 'by'],
    ['/api/analysis/rates?by=grain&from=2025-13-01', 'from'],
    ['/api/analysis/rates?by=grain&to=yesterday', 'to'],
    ['/api/analysis/rates?by=grain&from=2025-05-01&to=2025-04-01', 'to'],
    ['/api/analysis/crosstab?rows=grain&cols=shelf', 'cols'],
    ['/api/analysis/crosstab?rows=lot&cols=grain', 'rows'],
    ['/api/analysis/crosstab?rows=grain&cols=grain', 'cols'],
    ['/api/analysis/causes?minJars=0', 'minJars'],
    ['/api/analysis/weekly?from=03/03/2025', 'from'],
  ])('answers 400 naming the field for %s', async (url, field) => {
    const res = await reader.agent.get(url);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-input');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
  });
});

describe('GET /api/analysis/rates', () => {
  it.each(['grain', 'cookRun', 'cookMinutes', 'operator', 'culture', 'week'] as const)(
    'counts jars, contaminated and incubating by %s exactly, with Wilson intervals',
    async (by) => {
      const res = await reader.agent.get(`/api/analysis/rates?by=${by}`);
      expect(res.status).toBe(200);
      const body = res.body as RatesDto;
      const expected = countBy(all, levelOf[by]!);
      expect(body.by).toBe(by);
      expect(
        Object.fromEntries(
          body.rows.map((r) => [r.level, { jars: r.jars, contaminated: r.contaminated, incubating: r.incubating }]),
        ),
      ).toEqual(Object.fromEntries(expected));
      expect(body.overall).toMatchObject({
        jars: all.length,
        contaminated: all.filter((j) => j.contaminant).length,
        incubating: RECENT_CLEAN,
      });
      for (const r of [...body.rows, body.overall]) {
        expect(r.rate).toBe(r.contaminated / r.jars);
        // Wilson score interval, z = 1.959963984540054 — Newcombe, Statistics in Medicine 17:857–872 (1998), method 3.
        const [lo, hi] = wilsonInterval(r.contaminated, r.jars);
        expect(Math.abs(r.ci95[0] - lo)).toBeLessThan(1e-12);
        expect(Math.abs(r.ci95[1] - hi)).toBeLessThan(1e-12);
        expect(Number.isInteger(r.jars) && Number.isInteger(r.contaminated) && Number.isInteger(r.incubating)).toBe(
          true,
        );
      }
    },
  );

  it('labels cook-duration buckets from the default edges', async () => {
    const body = (await reader.agent.get('/api/analysis/rates?by=cookMinutes')).body as RatesDto;
    expect(body.rows.map((r) => r.level)).toEqual(['<60', '90-119']);
    const short = body.rows.find((r) => r.level === '<60')!;
    expect(short.jars).toBe(all.filter((j) => j.cookMinutes < 60).length);
  });

  it('limits the period to jars inoculated from..to inclusive', async () => {
    const from = addDays(planted.firstMonday, 1);
    const to = addDays(planted.firstMonday, 8);
    const body = (await reader.agent.get(`/api/analysis/rates?by=grain&from=${from}&to=${to}`)).body as RatesDto;
    const inside = all.filter((j) => j.inoculatedOn >= from && j.inoculatedOn <= to);
    expect(body.overall.jars).toBe(inside.length);
    expect(body.overall.jars).toBe(3 * 4 * 12 + 12);
  });

  it('leaves factors the history does not record out of the rows and says how many jars lack them', async () => {
    const body = (await reader.agent.get('/api/analysis/rates?by=room')).body as RatesDto;
    expect(body.rows).toEqual([]);
    expect(body.notRecorded).toBe(all.length);
    expect(body.overall.jars).toBe(all.length);
  });

  it('exports the table as CSV', async () => {
    const res = await reader.agent.get('/api/analysis/rates?by=culture&format=csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('level,jars,contaminated,incubating,rate,ci95_low,ci95_high');
    expect(lines).toHaveLength(1 + 4 + 1);
  });
});

describe('GET /api/analysis/crosstab', () => {
  it('counts every grain × cook-duration cell exactly', async () => {
    const res = await reader.agent.get('/api/analysis/crosstab?rows=grain&cols=cookMinutes');
    expect(res.status).toBe(200);
    const body = res.body as CrosstabDto;
    const expected = countBy(all, (j) => `${j.grain}|${bucket(j.cookMinutes)}`);
    expect(body.cells).toHaveLength(expected.size);
    for (const cell of body.cells) {
      const e = expected.get(`${cell.row}|${cell.col}`)!;
      expect({ jars: cell.jars, contaminated: cell.contaminated, incubating: cell.incubating }).toEqual(e);
      const [lo, hi] = wilsonInterval(cell.contaminated, cell.jars);
      expect(Math.abs(cell.ci95[0] - lo)).toBeLessThan(1e-12);
      expect(Math.abs(cell.ci95[1] - hi)).toBeLessThan(1e-12);
    }
    expect(body.cols).toEqual(['<60', '90-119']);
    expect([...body.rows].sort()).toEqual(['millet', 'rye', 'sorghum']);
  });
});

describe('GET /api/analysis/causes', () => {
  let causes: CauseRow[];
  beforeAll(async () => {
    const res = await reader.agent.get('/api/analysis/causes');
    if (res.status !== 200) throw new Error(`causes answered ${res.status}`);
    causes = (res.body as CausesDto).causes;
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
    const res = await reader.agent.get('/api/analysis/causes?minJars=20');
    expect(res.status).toBe(200);
    const body = res.body as CausesDto;
    expect(body.causes.every((c) => c.jars >= 20)).toBe(true);
    expect(body.causes.some((c) => c.factor === 'session')).toBe(false);
    const q = padjust(
      body.causes.map((c) => c.pValue),
      'bh',
    );
    body.causes.forEach((c, i) => expectClose(c.qValue, q[i]!, 1e-9));
  });
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
