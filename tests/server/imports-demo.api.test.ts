import { IsNull, Not } from 'typeorm';
import { beforeAll, describe, expect, it } from 'vitest';
import type { LethalityDto } from '../../shared/schemas/analysis-lethality';
import type { RatesPageDto } from '../../shared/schemas/analysis-rates';
import type { WeeklyDto } from '../../shared/schemas/analysis-weekly';

import { dataSource } from '../../server/db/data-source';
import { GrainLot } from '../../server/grain/grain-lot.entity';
import { PrepBatch } from '../../server/grain/prep-batch.entity';
import { Incident } from '../../server/incidents/incident.entity';
import { Jar } from '../../server/jars/jar.entity';
import { addDays, mondayOf } from '../../server/demo-lab/demo-calendar';
import { planDemoGrain } from '../../server/demo-lab/demo-grain';
import { demoWeeks, planDemoHistory } from '../../server/demo-lab/demo-history';
import { loadDemoLab } from '../../server/demo-lab/demo-lab';
import { plantedProblems, weekBefore } from '../../server/demo-lab/planted-problems';
import { clearProduction } from '../setup/clear-production';
import { signedIn } from '../setup/factories';
import { createTestApp } from '../setup/test-app';
import { everyCause } from '../setup/analysis-pages';
import { runPageSchema } from './cook-runs.fixtures';
import { bodyOf } from '../setup/bodies';

/** A fixed day, so the counts below are exact: the loader makes the same lab for the same day on any date. */
const LOADED_ON = '2026-03-18';
const loaded = planDemoHistory(LOADED_ON);
const loadedGrain = planDemoGrain(loaded);
const firstDay = addDays(mondayOf(LOADED_ON), -7 * (demoWeeks - 1));
const EXPECTED_JARS = 1167;
const EXPECTED_IMPORTED = 79;
const EXPECTED_LOTS = 26;
const EXPECTED_BATCHES = 104;
/** The short run leads, shadowed by its duration bucket (it is alone under 60 min) and by its week. */
const EXPECTED_LEAD = [
  'cookRun CR-2614',
  'cookMinutes <60',
  'culture LC-0931',
  'week 2026-W06',
  'operator Ferris Quell',
];
/** [inoculated in the 21 days before that day, status, jars] in the status column's order; the four open incidents mark their jars contaminated. */
const EXPECTED_STATUSES: [number, string, number][] = [
  [0, 'colonised', 844],
  [0, 'contaminated', 74],
  [1, 'incubating', 240],
  [1, 'contaminated', 9],
];

describe('loadDemoLab', () => {
  const app = createTestApp();

  beforeAll(async () => {
    // Other files in this worker's database leave jars, runs and cultures behind; the loader only fills an empty record.
    await clearProduction();
    await loadDemoLab(() => undefined, LOADED_ON);
  }, 120_000);

  it('imports the plan for the day it is given, with its open incidents, and loads nothing twice', async () => {
    const counts = async () => ({
      jars: await dataSource.manager.count(Jar),
      imported: await dataSource.manager.countBy(Incident, { imported: true, status: 'closed', verdict: 'confirmed' }),
      open: await dataSource.manager.countBy(Incident, { imported: false, status: 'open', verdict: 'pending' }),
      lots: await dataSource.manager.count(GrainLot),
      batches: await dataSource.manager.count(PrepBatch),
    });
    const first = await counts();
    expect(first).toEqual({
      jars: EXPECTED_JARS,
      imported: EXPECTED_IMPORTED,
      open: 4,
      lots: EXPECTED_LOTS,
      batches: EXPECTED_BATCHES,
    });
    expect(first.jars).toBe(loaded.jars.length);
    expect(first.imported).toBe(loaded.jars.filter((j) => j.contaminant).length);
    expect([first.lots, first.batches]).toEqual([loadedGrain.lots.length, loadedGrain.batches.length]);
    const open = await dataSource.manager.findBy(Incident, { imported: false });
    expect(open.every((i) => i.foundOn >= addDays(LOADED_ON, -9) && i.foundOn < LOADED_ON)).toBe(true);

    await loadDemoLab(() => undefined, LOADED_ON);
    await loadDemoLab(() => undefined);
    expect(await counts()).toEqual(first);
  });

  it('points every jar at its prep batch, so prepBatch is a factor of the analysis', async () => {
    expect(await dataSource.manager.countBy(Jar, { prepBatchId: IsNull() })).toBe(0);
    const rows = await dataSource.query<{ code: string; n: string }[]>(
      'SELECT pb.code, COUNT(*) AS n FROM jars j JOIN prep_batches pb ON pb.id = j.prepBatchId GROUP BY pb.code',
    );
    expect(new Map(rows.map((r) => [r.code, Number(r.n)]))).toEqual(
      new Map(loadedGrain.batches.map((b) => [b.code, b.jars.length])),
    );
    const supervisor = await signedIn(app, 'supervisor');
    const res = await supervisor.agent
      .get('/api/analysis/rates')
      .query({ by: 'prepBatch', from: firstDay, to: LOADED_ON, pageSize: 200 });
    expect(res.status).toBe(200);
    const rates = res.body as RatesPageDto;
    expect(rates.total).toBe(EXPECTED_BATCHES);
    expect(rates.rows).toHaveLength(EXPECTED_BATCHES);
    expect(rates.rows.reduce((s, r) => s + r.jars, 0)).toBe(EXPECTED_JARS);
  });

  it('ranks each planted cause first of its factor among the likely causes, ahead of the prep batches it shares', async () => {
    // Ranked by Fisher's exact test (Fisher, The Design of Experiments, 1935) with Benjamini–Hochberg q-values (1995),
    // both checked number for number in analysis.api.test.ts; this checks only the demo's order.
    const supervisor = await signedIn(app, 'supervisor');
    const { causes } = await everyCause(supervisor.agent, { from: firstDay, to: LOADED_ON });
    const firstOf = (factor: string) => causes.find((c) => c.factor === factor)?.level;
    expect(firstOf('cookRun')).toBe(plantedProblems.shortCookRun.code);
    expect(firstOf('culture')).toBe(plantedProblems.badCulture.code);
    expect(firstOf('operator')).toBe(plantedProblems.sloppyWeek.operator);
    const rank = (level: string) => causes.findIndex((c) => c.level === level);
    const planted = [
      plantedProblems.shortCookRun.code,
      plantedProblems.badCulture.code,
      plantedProblems.sloppyWeek.operator,
    ];
    const worstPlanted = Math.max(...planted.map(rank));
    const firstBatch = causes.findIndex((c) => c.factor === 'prepBatch');
    expect(rank(plantedProblems.shortCookRun.code)).toBeLessThan(firstBatch);
    expect(causes.slice(0, worstPlanted + 1).map((c) => `${c.factor} ${c.level}`)).toEqual(EXPECTED_LEAD);
  });

  it('lists the short cook run below its cook target although its estimated F0 passes 15 (DESIGN §4.6)', async () => {
    const supervisor = await signedIn(app, 'supervisor');
    const code = plantedProblems.shortCookRun.code;
    const lethality = await supervisor.agent
      .get('/api/analysis/lethality')
      .query({ from: firstDay, to: LOADED_ON, only: 'below' });
    const below = lethality.body as LethalityDto;
    const short = below.runs.find((r) => r.cookRun === code)!;
    // 45 min at the steam temperature gives an upper-bound F0 near 42; 1 L jars need 90 min (TRADE.md §1, common practice).
    expect(short.f0!).toBeGreaterThan(15);
    expect(short).toMatchObject({ judgedBy: 'minutes', minimumMinutes: 90, f0UpperBound: true, belowTarget: true });
    expect(below.runs.map((r) => r.cookRun)).toEqual([code]);
    expect(below).toMatchObject({ total: 1, belowTarget: 1, only: 'below' });
    expect(below.runsInPeriod).toBeGreaterThan(1);
    const list = await supervisor.agent.get('/api/cook-runs').query({ belowTarget: 'true' });
    expect(bodyOf(list, runPageSchema).items.map((r) => r.code)).toEqual([code]);
  });

  it('marks settled weeks above the 5 % target, the short run’s week among them, in control or not', async () => {
    const supervisor = await signedIn(app, 'supervisor');
    const res = await supervisor.agent.get('/api/analysis/weekly').query({ from: firstDay, to: LOADED_ON });
    const weekly = res.body as WeeklyDto;
    expect(weekly.target).toBe(0.05);
    const shortWeek = weekBefore(LOADED_ON, plantedProblems.shortCookRun.weeksBeforeCurrent);
    expect(weekly.weeks.find((w) => w.week === shortWeek)).toMatchObject({ aboveTarget: true });
    expect(weekly.weeks.some((w) => w.aboveTarget && !w.outOfControl)).toBe(true);
  });

  it('links grain-to-grain jars to their parent jar instead of a culture', async () => {
    const linked = await dataSource.manager.find(Jar, { where: { parentJarId: Not(IsNull()) } });
    expect(linked).toHaveLength(loaded.jars.filter((j) => j.parent).length);
    expect(linked.every((j) => j.cultureId === null)).toBe(true);
    const grandchildren = linked.filter((j) => linked.some((p) => p.id === j.parentJarId));
    expect(grandchildren.length).toBeGreaterThan(0);
  });

  it('keeps clean jars of the last three weeks before that day incubating and older clean jars colonised', async () => {
    const rows = await dataSource.query<{ status: string; recent: string; n: string }[]>(
      `SELECT status, inoculatedOn > ? AS recent, COUNT(*) AS n FROM jars GROUP BY status, recent ORDER BY recent, status`,
      [addDays(LOADED_ON, -21)],
    );
    expect(rows.map((r) => [Number(r.recent), r.status, Number(r.n)])).toEqual(EXPECTED_STATUSES);
  });
});
