import pmf from '@stdlib/stats-base-dists-hypergeometric-pmf';
import { beforeAll, describe, expect, it } from 'vitest';
import type { ActionVerdictsDto, BeforeAfterDto } from '../../shared/schemas/analysis-actions';
import type { JarsBehindDto } from '../../shared/schemas/analysis-jars-behind';
import { localDate } from '../../server/core/local-time';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { grainId, insertCookRun, insertIncident, insertJars } from './analysis-rows.fixtures';
import { addDays, clearProduction } from './analysis-planted.fixture';
import { issuePath } from '../setup/bodies';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  await clearProduction();
  reader = await signedIn(app, 'trainer');
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
    expect(issuePath(res)).toBe('actionId');
    const bad = await reader.agent.get('/api/analysis/before-after?actionId=x');
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('actionId');
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
    expect(issuePath(future)).toBe('doneOn');
    const bad = await reader.agent.get(`/api/analysis/before-after?actionId=${openId}&doneOn=15.06.2025`);
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('doneOn');
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
    expect(issuePath(await reader.agent.get('/api/analysis/jars?factor=cookRun'))).toBe('level');
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
    expect(issuePath(half)).toBe('level2');
  });
});
