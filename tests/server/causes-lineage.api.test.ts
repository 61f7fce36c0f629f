import jStat from 'jstat';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Factor } from '../../shared/enums';
import type { CauseRow, CausesDto } from '../../shared/schemas/analysis-causes';
import type { FactorLevel } from '../../shared/schemas/analysis';
import { signedIn, type Client } from '../setup/factories';
import { createTestApp } from '../setup/test-app';
import { everyCause } from '../setup/analysis-pages';
import { clearProduction } from './analysis-planted.fixture';
import { lineagePlan, plantLineageHistory, type PlantedJar } from './causes-lineage.fixture';

const app = createTestApp();
const Z = 1.959963984540054;
type Keyed = Partial<Record<Factor, (j: PlantedJar) => string>>;
const levelOf: Keyed = {
  cookRun: (j) => j.cookRun,
  session: (j) => j.session,
  operator: (j) => j.operator,
  culture: (j) => j.culture,
  week: (j) => j.week,
  transfers: (j) => j.transfers,
  room: (j) => j.room,
};
const inLevel = (j: PlantedJar, l: FactorLevel) => levelOf[l.factor]?.(j) === l.level;

/**
 * Brute force over the planted jars, one by one: the Mantel–Haenszel relative risk of a level against
 * its rest stratified by membership in `given` (Mantel & Haenszel 1959), the Greenland & Robins (1985)
 * variance of its log, and the Cochran–Mantel–Haenszel test with the continuity correction (as R's
 * mantelhaen.test), p from jstat's chi-square with 1 df.
 */
function bruteAdjusted(jars: PlantedJar[], level: FactorLevel, given: FactorLevel[]) {
  const strata = new Map<string, { a: number; n1: number; c: number; n0: number }>();
  for (const j of jars) {
    if (levelOf[level.factor]?.(j) === undefined) continue;
    const key = given.map((g) => (inLevel(j, g) ? '1' : '0')).join('');
    const s = strata.get(key) ?? { a: 0, n1: 0, c: 0, n0: 0 };
    if (inLevel(j, level)) {
      s.n1++;
      if (j.contaminated) s.a++;
    } else {
      s.n0++;
      if (j.contaminated) s.c++;
    }
    strata.set(key, s);
  }
  const used = [...strata.values()].filter((s) => s.n1 > 0 && s.n0 > 0);
  const pooled = (h: number) => {
    let [r, q, v] = [0, 0, 0];
    for (const s of used) {
      const [a, c, n1, n0] = [s.a + h, s.c + h, s.n1 + 2 * h, s.n0 + 2 * h];
      const N = n1 + n0;
      r += (a * n0) / N;
      q += (c * n1) / N;
      v += (n1 * n0 * (a + c)) / N ** 2 - (a * c) / N;
    }
    return { r, q, v };
  };
  // DESIGN.md §4.3: when either sum is zero, 0.5 is added to every contributing stratum's four cells.
  let { r, q, v } = pooled(0);
  if (r === 0 || q === 0) ({ r, q, v } = pooled(0.5));
  let [delta, variance] = [0, 0];
  for (const { a, n1, c, n0 } of used) {
    const N = n1 + n0;
    delta += a - (n1 * (a + c)) / N;
    variance += (n1 * n0 * (a + c) * (N - a - c)) / (N ** 2 * (N - 1));
  }
  const rr = r / q;
  const se = Math.sqrt(v / (r * q));
  const x2 = (Math.abs(delta) - (Math.abs(delta) >= 0.5 ? 0.5 : 0)) ** 2 / variance;
  return { rr, lo: rr * Math.exp(-Z * se), hi: rr * Math.exp(Z * se), p: 1 - jStat.chisquare.cdf(x2, 1) };
}

const close = (actual: number, expected: number) => expect(Math.abs(actual - expected)).toBeLessThan(1e-6);

let jars: PlantedJar[];
let body: CausesDto;
let reader: Client;
const row = (factor: Factor, level: string) => body.causes.find((c) => c.factor === factor && c.level === level);

beforeAll(async () => {
  await clearProduction();
  jars = await plantLineageHistory();
  reader = await signedIn(app, 'supervisor');
  body = await everyCause(reader.agent);
});

describe('GET /api/analysis/causes on a planted history with lineage, moves and a confounded operator', () => {
  it('counts each jar for the culture at the root of its lineage, with its transfers, and where it stood', () => {
    for (const [factor, key] of Object.entries(levelOf) as [Factor, (j: PlantedJar) => string][]) {
      const levels = new Set(jars.map(key));
      for (const level of levels) {
        const mine = jars.filter((j) => key(j) === level);
        expect(row(factor, level), `${factor} ${level}`).toMatchObject({
          jars: mine.length,
          contaminated: mine.filter((j) => j.contaminated).length,
          incubating: 0,
        });
      }
    }
    expect(row('culture', lineagePlan.badCulture)!.jars).toBeGreaterThan(3 * 40);
  });

  it('never blames the quarantine room the contaminated jars were moved to after they were found', () => {
    expect(body.causes.some((c) => c.factor === 'room' && c.level === lineagePlan.quarantine)).toBe(false);
    expect(body.causes.some((c) => c.factor === 'room' && c.level === 'Room C')).toBe(false);
    for (const room of ['Room A', 'Room B']) expect(row('room', room)!.standing).not.toBe('lead');
  });

  it('chooses the bad run and the bad culture as leads, in that order', () => {
    expect(body.leads.map((l) => `${l.factor}:${l.level}`)).toEqual([
      `cookRun:${lineagePlan.badRun}`,
      `culture:${lineagePlan.badCulture}`,
    ]);
    expect(body.leads[0]!.row.standing).toBe('lead');
  });

  it('explains the innocent operator by the bad run: crude interval above 1, adjusted not', () => {
    const innocent = row('operator', lineagePlan.innocent)!;
    expect(innocent.rr95[0]).toBeGreaterThan(1);
    expect(innocent.confoundedWith).toEqual([]);
    expect(innocent.standing).toBe('explained');
    expect(innocent.adjusted!.given).toEqual(body.leads.map(({ factor, level }) => ({ factor, level })));
    expect(innocent.adjusted!.rr95[0]).toBeLessThanOrEqual(1);
  });

  it('gives every row adjusted figures equal to a jar-by-jar recomputation to 1e-6', () => {
    const leads = body.leads.map(({ factor, level }) => ({ factor, level }));
    const checked: CauseRow[] = body.causes.filter((c) => levelOf[c.factor]);
    expect(checked.length).toBeGreaterThan(40);
    for (const c of checked) {
      const own = leads.filter((l) => !(l.factor === c.factor && l.level === c.level));
      const given = own.filter((l) => !c.sameJarsAs.some((s) => s.factor === l.factor && s.level === l.level));
      expect(c.adjusted?.given ?? [], `${c.factor} ${c.level}`).toEqual(c.adjusted ? given : []);
      if (!c.adjusted) continue;
      const e = bruteAdjusted(jars, c, given);
      close(c.adjusted.relativeRisk, e.rr);
      close(c.adjusted.rr95[0], e.lo);
      close(c.adjusted.rr95[1], e.hi);
      close(c.adjusted.pValue, e.p);
    }
  });

  it('judges "fares worse" by rate against rest, never by the corrected relative risk', () => {
    const worse = body.causes.filter((c) => c.rate > c.restRate);
    expect(body.causes.slice(0, worse.length).every((c) => c.rate > c.restRate)).toBe(true);
    for (const c of body.causes.filter((x) => x.contaminated === 0)) expect(c.hint).toBeNull();
  });

  it('pages the rows and keeps the leads whole on every page', async () => {
    const res = await reader.agent.get('/api/analysis/causes?page=2&pageSize=5');
    expect(res.status).toBe(200);
    const page = res.body as CausesDto;
    expect(page).toMatchObject({ page: 2, pageSize: 5, total: body.causes.length });
    expect(page.causes.map((c) => `${c.factor}:${c.level}`)).toEqual(
      body.causes.slice(5, 10).map((c) => `${c.factor}:${c.level}`),
    );
    expect(page.leads.map((l) => l.level)).toEqual(body.leads.map((l) => l.level));
    const bad = await reader.agent.get('/api/analysis/causes?page=0');
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body)).toContain('page');
  });
});
