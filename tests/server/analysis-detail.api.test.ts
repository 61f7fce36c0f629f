import pmf from '@stdlib/stats-base-dists-hypergeometric-pmf';
import { beforeAll, describe, expect, it } from 'vitest';
import type { ActionVerdictsDto, BeforeAfterDto } from '../../shared/schemas/analysis-actions';
import type { ColonisationDto } from '../../shared/schemas/analysis-colonisation';
import type { JarsBehindDto } from '../../shared/schemas/analysis-jars-behind';
import type { LethalityDto } from '../../shared/schemas/analysis-lethality';
import type { RatesDto } from '../../shared/schemas/analysis-rates';
import { psiToKPa } from '../../shared/stats/steam';
import { localDate } from '../../server/core/local-time';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { addDays, clearProduction, historyCsv, type HistoryJar } from './analysis-planted.fixture';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

async function grainId(name: string): Promise<number> {
  const [row] = await dataSource.query<{ id: number }[]>('SELECT id FROM grains WHERE name = ?', [name]);
  return Number(row!.id);
}

interface JarSeed {
  label: string;
  grainId: number;
  cookRunId?: number | null;
  inoculatedOn: string;
  status: string;
  colonisedOn?: string | null;
  endedOn?: string | null;
}

async function insertJars(jars: JarSeed[]): Promise<number[]> {
  const ids: number[] = [];
  for (const j of jars) {
    const res = await dataSource.query<{ insertId: number }>(
      'INSERT INTO jars (label, grainId, cookRunId, status, inoculatedAt, inoculatedOn, colonisedOn, endedOn) VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
      [
        j.label,
        j.grainId,
        j.cookRunId ?? null,
        j.status,
        `${j.inoculatedOn} 12:00:00`,
        j.inoculatedOn,
        j.colonisedOn ?? null,
        j.endedOn ?? null,
      ],
    );
    ids.push(Number(res.insertId));
  }
  return ids;
}

async function insertIncident(jarIds: number[], foundOn: string, opts: { voided?: boolean; verdict?: string } = {}) {
  const res = await dataSource.query<{ insertId: number }>(
    `INSERT INTO incidents (foundAt, foundOn, foundByName, contaminant, status, verdict, voided, version)
     VALUES (?, ?, 'Test finder', 'bacterial', 'closed', ?, ?, 1)`,
    [`${foundOn} 12:00:00`, foundOn, opts.verdict ?? 'confirmed', opts.voided ? 1 : 0],
  );
  for (const jarId of jarIds)
    await dataSource.query('INSERT INTO incident_jars (incidentId, jarId) VALUES (?, ?)', [res.insertId, jarId]);
  return Number(res.insertId);
}

async function insertCookRun(
  code: string,
  minutes: number,
  extra: {
    gaugeKPa?: number | null;
    altitudeM?: number;
    f0?: number | null;
    f0Source?: string | null;
    container?: string;
    logPlacement?: 'chamber' | 'centre';
  } = {},
) {
  const res = await dataSource.query<{ insertId: number }>(
    'INSERT INTO cook_runs (code, minutesAtPressure, gaugeKPa, altitudeM, f0, f0Source, container, logPlacement) VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
    [
      code,
      minutes,
      extra.gaugeKPa ?? null,
      extra.altitudeM ?? 0,
      extra.f0 ?? null,
      extra.f0Source ?? null,
      extra.container ?? null,
      extra.logPlacement ?? null,
    ],
  );
  return Number(res.insertId);
}

beforeAll(async () => {
  await clearProduction();
  reader = await signedIn(app, 'trainer');
});

describe('ISO weeks and buckets', () => {
  beforeAll(async () => {
    const supervisor = await signedIn(app, 'supervisor');
    const jar = (label: string, inoculatedOn: string, cookMinutes: number): HistoryJar => ({
      label,
      grain: 'wheat',
      cookRun: `PX-W-CR-${cookMinutes}`,
      cookMinutes,
      inoculatedOn,
      session: `PX-W-S-${inoculatedOn}`,
      operator: 'Ena Solberg',
      culture: 'PX-W-LC',
      contaminant: null,
      foundOn: null,
    });
    const jars = [
      jar('PX-W-1', '2020-12-28', 59),
      jar('PX-W-2', '2021-01-03', 60),
      jar('PX-W-3', '2021-01-04', 89),
      // Past year ends only: the import refuses dates more than a day ahead. 2015 has 53 ISO weeks too.
      jar('PX-W-4', '2015-12-31', 119),
      jar('PX-W-5', '2016-01-01', 120),
      jar('PX-W-6', '2016-01-03', 179),
      jar('PX-W-7', '2016-01-04', 180),
    ];
    const res = await supervisor.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', supervisor.token())
      .set('Content-Type', 'text/csv')
      .send(historyCsv(jars));
    if (res.status !== 200) throw new Error(`import failed: ${JSON.stringify(res.body).slice(0, 300)}`);
  });

  it('labels weeks by the ISO week-year: 2016-01-01 is 2015-W53 and 2021-01-03 is 2020-W53', async () => {
    // ISO 8601-1:2019 §5.2.4.2 week dates: week 1 holds the year's first Thursday.
    const res = await reader.agent.get('/api/analysis/rates?by=week&from=2015-12-01&to=2021-01-31');
    expect(res.status).toBe(200);
    const rows = (res.body as RatesDto).rows.map((r) => [r.level, r.jars]);
    expect(rows).toEqual([
      ['2015-W53', 3],
      ['2016-W01', 1],
      ['2020-W53', 2],
      ['2021-W01', 1],
    ]);
  });

  it('buckets whole minutes at pressure on the default edges 60, 90, 120, 180', async () => {
    const body = (await reader.agent.get('/api/analysis/rates?by=cookMinutes&from=2015-12-01&to=2021-01-31'))
      .body as RatesDto;
    expect(body.rows.map((r) => [r.level, r.jars])).toEqual([
      ['<60', 1],
      ['60-89', 2],
      ['90-119', 1],
      ['120-179', 2],
      ['180+', 1],
    ]);
  });
});

describe('GET /api/analysis/colonisation', () => {
  // 6-MP arm of Freireich et al. (1963) as tabulated by Gehan, Biometrika 52:203–223 (1965) [data from
  // memory], read as days to full colonisation; + marks a jar censored (discarded) on that day.
  const raw = '6 6 6 6+ 7 9+ 10 10+ 11+ 13 16 17+ 19+ 20+ 22 23 25+ 32+ 32+ 34+ 35+'.split(' ');
  const start = '2024-02-05';

  beforeAll(async () => {
    const oats = await grainId('oats');
    await insertJars(
      raw.map((t, i) => {
        const day = Number.parseInt(t, 10);
        const censored = t.endsWith('+');
        return {
          label: `PX-KM-${i}`,
          grainId: oats,
          inoculatedOn: start,
          status: censored ? 'discarded' : 'colonised',
          colonisedOn: censored ? null : addDays(start, day),
          endedOn: censored ? addDays(start, day) : null,
        };
      }),
    );
    // A contaminated jar that never colonised is censored on the day it was found.
    const [turned] = await insertJars([
      {
        label: 'PX-KM-X',
        grainId: await grainId('maize'),
        inoculatedOn: start,
        status: 'contaminated',
        endedOn: addDays(start, 4),
      },
    ]);
    await insertIncident([turned!], addDays(start, 4));
  });

  it('reproduces the published product-limit curve and median per grain', async () => {
    const res = await reader.agent.get(`/api/analysis/colonisation?from=${start}&to=${start}`);
    expect(res.status).toBe(200);
    const oats = (res.body as ColonisationDto).curves.find((c) => c.grain === 'oats')!;
    expect(oats).toMatchObject({ jars: 21, colonised: 9, censored: 12, medianDays: 23 });
    const at = (d: number) => oats.steps.find((s) => s.day === d)!.stillColonising;
    expect(at(6)).toBeCloseTo(0.8571, 4);
    expect(at(7)).toBeCloseTo(0.8067, 4);
    expect(at(10)).toBeCloseTo(0.7529, 4);
    expect(at(13)).toBeCloseTo(0.6902, 4);
    expect(at(16)).toBeCloseTo(0.6275, 4);
    expect(at(22)).toBeCloseTo(0.5378, 4);
    expect(at(23)).toBeCloseTo(0.4482, 4);
    const maize = (res.body as ColonisationDto).curves.find((c) => c.grain === 'maize')!;
    expect(maize).toMatchObject({ jars: 1, colonised: 0, censored: 1, medianDays: null });
    expect(maize.steps).toEqual([{ day: 4, atRisk: 1, colonised: 0, censored: 1, stillColonising: 1 }]);
  });

  it('leaves imported jars out, contaminated and clean alike (they carry no colonisation day)', async () => {
    const day = '2024-03-04';
    const wheat = await grainId('wheat');
    const ids = await insertJars([
      { label: 'PX-KM-OWN', grainId: wheat, inoculatedOn: day, status: 'colonised', colonisedOn: addDays(day, 12) },
      { label: 'PX-KM-IMP-X', grainId: wheat, inoculatedOn: day, status: 'contaminated', endedOn: addDays(day, 5) },
      { label: 'PX-KM-IMP-C', grainId: wheat, inoculatedOn: day, status: 'colonised' },
    ]);
    await dataSource.query('UPDATE jars SET imported = 1 WHERE id IN (?, ?)', [ids[1], ids[2]]);
    await insertIncident([ids[1]!], addDays(day, 5));
    const res = await reader.agent.get(`/api/analysis/colonisation?from=${day}&to=${day}`);
    const curve = (res.body as ColonisationDto).curves.find((c) => c.grain === 'wheat')!;
    expect(curve).toMatchObject({ jars: 1, colonised: 1, censored: 0, medianDays: 12 });
  });
});

describe('GET /api/analysis/lethality', () => {
  beforeAll(async () => {
    // TRADE.md §3 [COMP]: the 1-min cycle 100…121×10…100 °C gives F0 = 12.239 by the rectangle sum.
    const jar = { container: '1 L jar' };
    await insertCookRun('PX-L-LOG', 10, {
      f0: 12.239,
      f0Source: 'log',
      logPlacement: 'centre',
      gaugeKPa: psiToKPa(15),
    });
    await insertCookRun('PX-L-SEA', 90, { gaugeKPa: psiToKPa(15), ...jar });
    await insertCookRun('PX-L-ALT', 90, { gaugeKPa: psiToKPa(15), altitudeM: 1500, ...jar });
    await insertCookRun('PX-L-NOGAUGE', 10);
    // A chamber log with a high F0 on a short cycle: the centre of the jars lagged behind it.
    await insertCookRun('PX-L-CHAMBER', 45, { f0: 41.9, f0Source: 'log', logPlacement: 'chamber', ...jar });
    await insertCookRun('PX-L-BAG', 120, { gaugeKPa: psiToKPa(15), container: '3 KG bag ' });
  });

  it('holds only a jar-centre log to the F0 target and judges the rest by minutes per container', async () => {
    // DESIGN §4.6; container minimums 1 L jar 90 min, 3 kg bag 150 min at about 103 kPa (TRADE.md §1, common practice).
    const body = (await reader.agent.get('/api/analysis/lethality')).body as LethalityDto;
    const run = (code: string) => body.runs.find((r) => r.cookRun === code)!;
    expect(body.containerMinutes).toEqual({ '1 L jar': 90, '2 L jar': 120, '3 kg bag': 150 });
    expect(run('PX-L-LOG')).toMatchObject({ judgedBy: 'centre-probe', f0UpperBound: false, belowTarget: true });
    expect(run('PX-L-CHAMBER')).toMatchObject({
      judgedBy: 'minutes',
      minimumMinutes: 90,
      f0UpperBound: true,
      belowTarget: true,
    });
    expect(run('PX-L-SEA')).toMatchObject({ judgedBy: 'minutes', f0UpperBound: true, belowTarget: false });
    expect(run('PX-L-BAG')).toMatchObject({ judgedBy: 'minutes', minimumMinutes: 150, belowTarget: true });
    expect(run('PX-L-NOGAUGE')).toMatchObject({ judgedBy: 'unjudged', minimumMinutes: null, belowTarget: false });
  });

  it('shows F0 from the log or estimated from steam at the run’s pressure, flagged against the target', async () => {
    const res = await reader.agent.get('/api/analysis/lethality');
    expect(res.status).toBe(200);
    const body = res.body as LethalityDto;
    expect(body.target).toBe(15);
    const run = (code: string) => body.runs.find((r) => r.cookRun === code)!;
    expect(run('PX-L-LOG')).toMatchObject({ f0: 12.239, f0Source: 'log', logPlacement: 'centre', assumedGauge: false });
    // TRADE.md §3 [COMP] from IAPWS-IF97 and ISO 2533: 15 psig → 120.95 °C at sea level (F0 ≈ 87 for 90 min),
    // 118.3 °C at 1,500 m (F0 ≈ 47).
    expect(run('PX-L-SEA').f0).toBeCloseTo(90 * 10 ** ((120.95 - 121.1) / 10), 0);
    expect(run('PX-L-SEA').f0Source).toBe('estimate');
    expect(Math.round(run('PX-L-ALT').f0!)).toBe(47);
    expect(run('PX-L-ALT').belowTarget).toBe(false);
    const noGauge = run('PX-L-NOGAUGE');
    expect(noGauge).toMatchObject({ assumedGauge: true, f0Source: 'estimate' });
    expect(noGauge.f0).toBeCloseTo(10 * 10 ** ((120.95 - 121.1) / 10), 1);
  });

  it('exports the runs as CSV', async () => {
    const res = await reader.agent.get('/api/analysis/lethality?format=csv');
    expect(res.status).toBe(200);
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toMatch(/^cook_run,cooked_on,container,minutes_at_pressure/);
    expect(lines.length).toBeGreaterThanOrEqual(5);
  });
});

describe('GET /api/analysis/before-after', () => {
  const pivot = '2025-06-15';
  let actionId: number;
  let bareActionId: number;

  beforeAll(async () => {
    const run = await insertCookRun('PX-BA-RUN', 90);
    const rye = await grainId('rye');
    const make = (prefix: string, day: string, n: number) =>
      Array.from({ length: n }, (_, i) => ({
        label: `${prefix}-${i}`,
        grainId: rye,
        cookRunId: run,
        inoculatedOn: day,
        status: 'colonised',
      }));
    // Newcombe, Statistics in Medicine 17:873–890 (1998), method 10 worked example [values from memory]:
    // 56/70 − 48/80 = 0.2000, 95 % interval 0.0524 to 0.3339.
    const after = await insertJars(make('PX-BA-A', addDays(pivot, 3), 70));
    const before = await insertJars(make('PX-BA-B', addDays(pivot, -3), 80));
    await insertJars(make('PX-BA-P', pivot, 5));
    await insertIncident(after.slice(0, 56), addDays(pivot, 8));
    await insertIncident(before.slice(0, 48), addDays(pivot, 2));
    // A voided incident and a ruled-out one do not make a jar contaminated.
    await insertIncident(after.slice(60, 62), addDays(pivot, 8), { voided: true });
    await insertIncident(after.slice(62, 64), addDays(pivot, 8), { verdict: 'ruled-out' });
    const incidentId = await insertIncident([], pivot);
    const res = await dataSource.query<{ insertId: number }>(
      `INSERT INTO corrective_actions (incidentId, what, ownerName, dueOn, doneOn, factor, level) VALUES (?, 'Longer cook', 'Test owner', ?, ?, 'cookRun', 'PX-BA-RUN')`,
      [incidentId, pivot, pivot],
    );
    actionId = Number(res.insertId);
    const bare = await dataSource.query<{ insertId: number }>(
      `INSERT INTO corrective_actions (incidentId, what, ownerName, dueOn) VALUES (?, 'Retrain', 'Test owner', ?)`,
      [incidentId, pivot],
    );
    bareActionId = Number(bare.insertId);
  });

  it('compares equal periods before and after the action with Newcombe’s method-10 interval', async () => {
    const res = await reader.agent.get(`/api/analysis/before-after?actionId=${actionId}&days=10`);
    expect(res.status).toBe(200);
    const body = res.body as BeforeAfterDto;
    expect(body.before).toMatchObject({ from: '2025-06-05', to: '2025-06-14', jars: 80, contaminated: 48 });
    expect(body.after).toMatchObject({ from: '2025-06-16', to: '2025-06-25', jars: 70, contaminated: 56 });
    expect(body.difference).toBeCloseTo(0.2, 12);
    expect(body.ci95[0]).toBeCloseTo(0.0524, 4);
    expect(body.ci95[1]).toBeCloseTo(0.3339, 4);
    // Fisher two-sided by brute force over the hypergeometric support (Fisher 1935; Agresti 2002).
    const observed = pmf(56, 150, 104, 70);
    let p = 0;
    for (let x = 24; x <= 70; x++) if (pmf(x, 150, 104, 70) <= observed * (1 + 1e-7)) p += pmf(x, 150, 104, 70);
    expect(body.pValue! / p).toBeCloseTo(1, 9);
  });

  it('answers 404 for an unknown action and 422 naming actionId when the action names no level', async () => {
    expect((await reader.agent.get('/api/analysis/before-after?actionId=999999')).status).toBe(404);
    const res = await reader.agent.get(`/api/analysis/before-after?actionId=${bareActionId}`);
    expect(res.status).toBe(422);
    expect(res.body.error.issues[0].path).toBe('actionId');
    const bad = await reader.agent.get('/api/analysis/before-after?actionId=x');
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('actionId');
  });

  it('previews an open action as if done on the day being entered, so closing it shows its before/after', async () => {
    const incidentId = await insertIncident([], pivot);
    const res = await dataSource.query<{ insertId: number }>(
      `INSERT INTO corrective_actions (incidentId, what, ownerName, dueOn, factor, level) VALUES (?, 'Longer cook', 'Test owner', ?, 'cookRun', 'PX-BA-RUN')`,
      [incidentId, pivot],
    );
    const openId = Number(res.insertId);
    const open = await reader.agent.get(`/api/analysis/before-after?actionId=${openId}`);
    expect(open.status).toBe(422);
    // The same Newcombe method-10 example as above: 56/70 − 48/80, 95 % 0.0524 to 0.3339.
    const preview = await reader.agent.get(`/api/analysis/before-after?actionId=${openId}&days=10&doneOn=${pivot}`);
    expect(preview.status).toBe(200);
    const body = preview.body as BeforeAfterDto;
    expect(body).toMatchObject({ pivot, settled: true, before: { jars: 80, contaminated: 48 }, after: { jars: 70 } });
    expect(body.ci95[0]).toBeCloseTo(0.0524, 4);
    const future = await reader.agent.get(`/api/analysis/before-after?actionId=${openId}&doneOn=2999-01-01`);
    expect(future.status).toBe(422);
    expect(future.body.error.issues[0].path).toBe('doneOn');
    const bad = await reader.agent.get(`/api/analysis/before-after?actionId=${openId}&doneOn=15.06.2025`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('doneOn');
  });

  it('waits for the after-period to settle: recent jars count for nothing yet, and the days remaining are given', async () => {
    const today = localDate(new Date());
    const doneOn = addDays(today, -10);
    const run = await insertCookRun('PX-BA-NOW', 90);
    const rye = await grainId('rye');
    const jarIds = await insertJars(
      [-5, 3].map((d, i) => ({
        label: `PX-BA-NOW-${i}`,
        grainId: rye,
        cookRunId: run,
        inoculatedOn: addDays(doneOn, d),
        status: 'incubating',
      })),
    );
    const incidentId = await insertIncident([jarIds[0]!], addDays(doneOn, -1));
    const res = await dataSource.query<{ insertId: number }>(
      `INSERT INTO corrective_actions (incidentId, what, ownerName, dueOn, doneOn, factor, level) VALUES (?, 'Longer cook', 'Test owner', ?, ?, 'cookRun', 'PX-BA-NOW')`,
      [incidentId, doneOn, doneOn],
    );
    const body = (await reader.agent.get(`/api/analysis/before-after?actionId=${Number(res.insertId)}`))
      .body as BeforeAfterDto;
    // Shortest comparison 7 days each side; the after-period ends on doneOn + 7, settled 21 days later.
    expect(body).toMatchObject({ days: 7, settled: false, daysRemaining: 7 + 21 - 10, difference: null });
    // The jar inoculated 3 days after the action is younger than the window and clean: not settled, left out.
    expect(body.after).toMatchObject({ jars: 0, contaminated: 0 });
    expect(body.before).toMatchObject({ jars: 1, contaminated: 1 });
  });

  it('lists every corrective action with its verdict, or why there is none', async () => {
    const res = await reader.agent.get('/api/analysis/actions?pageSize=200');
    expect(res.status).toBe(200);
    const body = res.body as ActionVerdictsDto;
    const done = body.items.find((a) => a.id === actionId)!;
    expect(done.comparison).toMatchObject({ settled: true, before: { jars: 80 }, after: { jars: 70 } });
    const bare = body.items.find((a) => a.id === bareActionId)!;
    expect(bare.comparison).toBeNull();
    expect(bare.unavailable).toMatch(/no factor level/);
    expect(body.total).toBe(body.items.length);
    expect((await reader.agent.get('/api/analysis/actions?pageSize=500')).status).toBe(400);
  });

  it('lists the jars behind a number, page by page', async () => {
    const res = await reader.agent.get(
      `/api/analysis/jars?factor=cookRun&level=PX-BA-RUN&from=2025-06-16&to=2025-06-25&only=contaminated&pageSize=50`,
    );
    expect(res.status).toBe(200);
    const body = res.body as JarsBehindDto;
    expect(body.total).toBe(56);
    expect(body.items).toHaveLength(50);
    expect(body.items.every((j) => j.contaminated && j.label.startsWith('PX-BA-A') && j.foundOn === '2025-06-23')).toBe(
      true,
    );
    const page2 = (
      await reader.agent.get(
        `/api/analysis/jars?factor=cookRun&level=PX-BA-RUN&from=2025-06-16&to=2025-06-25&only=contaminated&pageSize=50&page=2`,
      )
    ).body as JarsBehindDto;
    expect(page2.items).toHaveLength(6);
    expect((await reader.agent.get('/api/analysis/jars?factor=cookRun')).body.error.issues[0].path).toBe('level');
  });

  it('links each contaminated jar to its incident, and narrows by a second factor', async () => {
    const base = '/api/analysis/jars?factor=cookRun&level=PX-BA-RUN&from=2025-06-16&to=2025-06-25';
    const [incidentId] = await dataSource.query<{ id: number }[]>(
      "SELECT ij.incidentId AS id FROM incident_jars ij JOIN jars j ON j.id = ij.jarId WHERE j.label = 'PX-BA-A-0'",
    );
    const all = (await reader.agent.get(`${base}&pageSize=200`)).body as JarsBehindDto;
    const first = all.items.find((j) => j.label === 'PX-BA-A-0')!;
    expect(first.incidentId).toBe(Number(incidentId!.id));
    // Jars 60 and 61 carry only a voided incident: nothing to link.
    expect(all.items.find((j) => j.label === 'PX-BA-A-60')!.incidentId).toBeNull();
    // From June 1st the run holds the 80 jars of 2025-W24 too; 2025-06-18 lies in 2025-W25 (ISO 8601).
    const wide = '/api/analysis/jars?factor=cookRun&level=PX-BA-RUN&from=2025-06-01&to=2025-06-25';
    expect(((await reader.agent.get(wide)).body as JarsBehindDto).total).toBe(155);
    const week = (await reader.agent.get(`${wide}&factor2=week&level2=2025-W25&pageSize=200`)).body as JarsBehindDto;
    expect(week).toMatchObject({ factor2: 'week', level2: '2025-W25', total: 70 });
    expect(week.items.every((j) => j.label.startsWith('PX-BA-A'))).toBe(true);
    const half = await reader.agent.get(`${base}&factor2=week`);
    expect(half.status).toBe(400);
    expect(half.body.error.issues[0].path).toBe('level2');
  });
});
