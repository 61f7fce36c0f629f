import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { ProcedureStep } from '../../server/procedures/procedure-step.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { makeIncident, makeJars, makeSession } from '../setup/lab-rows';

const app = createTestApp();
type Client = Awaited<ReturnType<typeof signedIn>>;

const steps = [
  { text: 'Wipe the workspace with 70 % isopropyl alcohol and let it dry.', caution: 'Alcohol is flammable.' },
  { text: 'Flame the needle until it glows, then let it cool.' },
  { text: 'Inoculate through the port.' },
];
const newProcedure = () => ({ code: uniqueName('P'), title: 'Sterile technique', steps });

async function create(client: Client, body: object = newProcedure()) {
  const res = await client.agent.post('/api/procedures').set('X-CSRF-Token', client.token()).send(body);
  expect(res.status).toBe(201);
  return res.body as { id: number; versions: { id: number; version: number }[]; currentVersionId: number };
}

async function stepsOf(client: Client, versionId: number) {
  const res = await client.agent.get(`/api/procedure-versions/${versionId}`).expect(200);
  return res.body.steps as { id: number; position: number; text: string; incidentsLinked: number }[];
}

describe('procedures: role checks', () => {
  it.each([
    ['get', '/api/procedures'],
    ['get', '/api/procedures/1'],
    ['get', '/api/procedure-versions/1'],
    ['get', '/api/procedure-steps/1/stats'],
    ['get', '/api/incidents/1/step-links'],
  ] as const)('answers 401 to %s %s without a session', async (_m, url) => {
    expect((await supertest(app).get(url)).status).toBe(401);
  });

  it('answers 401 to a write with a valid CSRF token but no session', async () => {
    const anon = await (await import('../setup/test-app')).csrfAgent(app);
    const res = await anon.agent.post('/api/procedures').set('X-CSRF-Token', anon.token()).send(newProcedure());
    expect(res.status).toBe(401);
  });

  it.each(['technician', 'supervisor'] as const)('refuses every procedure write to a %s with 403', async (role) => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const [step] = await stepsOf(trainer, proc.currentVersionId);
    const client = await signedIn(app, role);
    const t = client.token();
    expect((await client.agent.post('/api/procedures').set('X-CSRF-Token', t).send(newProcedure())).status).toBe(403);
    expect(
      (
        await client.agent
          .post(`/api/procedures/${proc.id}/versions`)
          .set('X-CSRF-Token', t)
          .send({ changeNote: 'x', steps })
      ).status,
    ).toBe(403);
    expect(
      (
        await client.agent
          .post('/api/incidents/1/step-links')
          .set('X-CSRF-Token', t)
          .send({ stepId: step!.id, note: 'x' })
      ).status,
    ).toBe(403);
    expect((await client.agent.delete('/api/step-links/1').set('X-CSRF-Token', t)).status).toBe(403);
    // Reading stays open to every role.
    expect((await client.agent.get(`/api/procedures/${proc.id}`)).status).toBe(200);
  });

  it('lets an admin create a procedure', async () => {
    const admin = await signedIn(app, 'admin');
    const proc = await create(admin);
    expect(proc.versions).toHaveLength(1);
  });
});

describe('procedures: validation and missing records', () => {
  it.each([
    [{ ...newProcedure(), steps: [] }, 'steps'],
    [{ ...newProcedure(), steps: [{ text: '  ' }] }, 'steps.0.text'],
    [{ ...newProcedure(), code: 'has space' }, 'code'],
    [{ ...newProcedure(), title: '' }, 'title'],
  ])('answers 400 naming the field (%#)', async (body, path) => {
    const trainer = await signedIn(app, 'trainer');
    const res = await trainer.agent.post('/api/procedures').set('X-CSRF-Token', trainer.token()).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });

  it('answers 409 naming code when the code is taken', async () => {
    const trainer = await signedIn(app, 'trainer');
    const body = newProcedure();
    await create(trainer, body);
    const res = await trainer.agent.post('/api/procedures').set('X-CSRF-Token', trainer.token()).send(body);
    expect(res.status).toBe(409);
    expect(res.body.error.issues[0].path).toBe('code');
  });

  it('answers 400 naming changeNote when a new version gives no reason', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const res = await trainer.agent
      .post(`/api/procedures/${proc.id}/versions`)
      .set('X-CSRF-Token', trainer.token())
      .send({ steps });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('changeNote');
  });

  it('answers 404 for unknown procedures, versions, steps and incidents', async () => {
    const trainer = await signedIn(app, 'trainer');
    const t = trainer.token();
    expect((await trainer.agent.get('/api/procedures/999999')).status).toBe(404);
    expect((await trainer.agent.get('/api/procedure-versions/999999')).status).toBe(404);
    expect((await trainer.agent.get('/api/procedure-steps/999999/stats')).status).toBe(404);
    expect(
      (
        await trainer.agent
          .post('/api/procedures/999999/versions')
          .set('X-CSRF-Token', t)
          .send({ changeNote: 'x', steps })
      ).status,
    ).toBe(404);
    expect(
      (
        await trainer.agent
          .post('/api/incidents/999999/step-links')
          .set('X-CSRF-Token', t)
          .send({ stepId: 1, note: 'x' })
      ).status,
    ).toBe(404);
    expect((await trainer.agent.delete('/api/step-links/999999').set('X-CSRF-Token', t)).status).toBe(404);
  });
});

describe('procedures: versions', () => {
  it('publishes a new version by copying steps and leaves the old version readable and unchanged', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const v1 = proc.currentVersionId;
    const before = (await trainer.agent.get(`/api/procedure-versions/${v1}`).expect(200)).body;
    const newSteps = [...steps.slice(0, 2), { text: 'Flame the needle again between jars.' }, steps[2]!];
    const res = await trainer.agent
      .post(`/api/procedures/${proc.id}/versions`)
      .set('X-CSRF-Token', trainer.token())
      .send({ changeNote: 'Flaming between jars made a step of its own.', steps: newSteps });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ version: 2, isCurrent: true, stepCount: 4 });
    expect(res.body.steps.map((s: { text: string }) => s.text)).toEqual(newSteps.map((s) => s.text));

    const after = (await trainer.agent.get(`/api/procedure-versions/${v1}`).expect(200)).body;
    expect(after).toEqual({ ...before, isCurrent: false });
    const oldIds = new Set(before.steps.map((s: { id: number }) => s.id));
    expect(res.body.steps.some((s: { id: number }) => oldIds.has(s.id))).toBe(false);
    expect(await dataSource.manager.countBy(ProcedureStep, { versionId: v1 })).toBe(3);

    const detail = (await trainer.agent.get(`/api/procedures/${proc.id}`).expect(200)).body;
    expect(detail.currentVersion).toBe(2);
    expect(detail.versions.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'procedure',
      recordId: String(proc.id),
      action: 'publish-version',
    });
    expect(audit).toMatchObject({ oldValue: '1', reason: 'Flaming between jars made a step of its own.' });
  });

  it('lists procedures paged with their current version', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const res = await trainer.agent.get('/api/procedures?pageSize=200&sort=-createdAt').expect(200);
    const row = res.body.items.find((p: { id: number }) => p.id === proc.id);
    expect(row).toMatchObject({ currentVersion: 1, currentVersionId: proc.currentVersionId });
    expect(res.body.pageSize).toBe(200);
    expect((await trainer.agent.get('/api/procedures?sort=colour')).status).toBe(400);
  });
});

describe('procedures: incident–step links and step statistics', () => {
  it('links an incident to a step with an audit event on the incident, refuses a repeat, and unlinks', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const [, flame] = await stepsOf(trainer, proc.currentVersionId);
    const jars = await makeJars(1, { inoculatedOn: '2024-03-04' });
    const incident = await makeIncident(jars, { foundOn: '2024-03-10' });

    const res = await trainer.agent
      .post(`/api/incidents/${incident.id}/step-links`)
      .set('X-CSRF-Token', trainer.token())
      .send({ stepId: flame!.id, note: 'Needle not re-flamed between jars.' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      incidentId: incident.id,
      stepId: flame!.id,
      stepPosition: 2,
      version: 1,
      linkedByName: 'Test trainer',
    });
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'incident',
      recordId: String(incident.id),
      action: 'link-step',
    });
    expect(audit?.reason).toBe('Needle not re-flamed between jars.');

    const again = await trainer.agent
      .post(`/api/incidents/${incident.id}/step-links`)
      .set('X-CSRF-Token', trainer.token())
      .send({ stepId: flame!.id, note: 'twice' });
    expect(again.status).toBe(409);
    expect(again.body.error.issues[0].path).toBe('stepId');

    expect((await stepsOf(trainer, proc.currentVersionId))[1]!.incidentsLinked).toBe(1);
    const list = await trainer.agent.get(`/api/incidents/${incident.id}/step-links`).expect(200);
    expect(list.body.items).toHaveLength(1);
    const ofStep = await trainer.agent.get(`/api/procedure-steps/${flame!.id}/links`).expect(200);
    expect(ofStep.body.items.map((l: { incidentId: number }) => l.incidentId)).toEqual([incident.id]);
    expect((await trainer.agent.get('/api/procedure-steps/999999/links')).status).toBe(404);

    expect(
      (await trainer.agent.delete(`/api/step-links/${res.body.id}`).set('X-CSRF-Token', trainer.token())).status,
    ).toBe(204);
    expect((await stepsOf(trainer, proc.currentVersionId))[1]!.incidentsLinked).toBe(0);
    const unlink = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'incident',
      recordId: String(incident.id),
      action: 'unlink-step',
    });
    expect(unlink).not.toBeNull();
  });

  it('finds incidents for the picker by number with or without #, jar label, operator or contaminant', async () => {
    const trainer = await signedIn(app, 'trainer');
    const jars = await makeJars(1, { inoculatedOn: '2024-03-04' });
    const incident = await makeIncident(jars, { foundOn: '2024-03-10', contaminant: 'neurospora' });
    const ids = async (q: string) =>
      (await trainer.agent.get('/api/incidents').query({ q, pageSize: 200 }).expect(200)).body.items.map(
        (i: { id: number }) => i.id,
      );
    expect(await ids(`#${incident.id}`)).toEqual([incident.id]);
    expect(await ids(String(incident.id))).toContain(incident.id);
    expect(await ids(jars[0]!.label)).toEqual([incident.id]);
    expect(await ids('Neurosp')).toContain(incident.id);
    expect(await ids('#999999')).toEqual([]);
  });

  it('answers 400 naming note and stepId for a bad link body', async () => {
    const trainer = await signedIn(app, 'trainer');
    const res = await trainer.agent
      .post('/api/incidents/1/step-links')
      .set('X-CSRF-Token', trainer.token())
      .send({ stepId: 'x', note: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['note', 'stepId']);
  });

  it('compares ticked and not-ticked sessions with Fisher’s exact test', async () => {
    // Fisher R.A., The Design of Experiments (1935), the tea-tasting table [[3,1],[1,3]] as in
    // Agresti, Categorical Data Analysis (2002): two-sided p = 34/70 = 0.485714.
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const [wipe, flame] = await stepsOf(trainer, proc.currentVersionId);
    const old = '2024-03-04';
    const ticked = await makeSession({
      heldOn: old,
      versionId: proc.currentVersionId,
      checks: { [wipe!.id]: true, [flame!.id]: true },
    });
    const skipped = await makeSession({
      heldOn: old,
      versionId: proc.currentVersionId,
      checks: { [wipe!.id]: true, [flame!.id]: false },
    });
    const elsewhere = await makeSession({ heldOn: old });
    const tickedJars = await makeJars(4, { inoculatedOn: old, sessionId: ticked.id });
    const skippedJars = await makeJars(4, { inoculatedOn: old, sessionId: skipped.id });
    const otherJars = await makeJars(2, { inoculatedOn: old, sessionId: elsewhere.id });
    for (const j of tickedJars.slice(0, 3)) await makeIncident([j], { foundOn: '2024-03-12' });
    await makeIncident(skippedJars.slice(0, 1), { foundOn: '2024-03-12' });
    // Neither a ruled-out nor a voided incident makes a jar contaminated (DESIGN.md §3).
    await makeIncident(skippedJars.slice(1, 2), { foundOn: '2024-03-12', verdict: 'ruled-out' });
    await makeIncident(skippedJars.slice(2, 3), { foundOn: '2024-03-12', voided: true });
    await makeIncident(otherJars, { foundOn: '2024-03-12' });

    const res = await trainer.agent.get(`/api/procedure-steps/${flame!.id}/stats`).expect(200);
    expect(res.body.ticked).toEqual({ jars: 4, contaminated: 3, incubating: 0, rate: 0.75 });
    expect(res.body.notTicked).toEqual({ jars: 4, contaminated: 1, incubating: 0, rate: 0.25 });
    expect(res.body.pValue).toBeCloseTo(34 / 70, 6);

    const wipeStats = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats`).expect(200);
    expect(wipeStats.body.ticked).toMatchObject({ jars: 8, contaminated: 4 });
    expect(wipeStats.body.notTicked).toEqual({ jars: 0, contaminated: 0, incubating: 0, rate: null });
    expect(wipeStats.body.pValue).toBeNull();

    const link = await trainer.agent
      .post(`/api/incidents/${(await makeIncident(tickedJars.slice(3), { foundOn: '2024-03-13' })).id}/step-links`)
      .set('X-CSRF-Token', trainer.token())
      .send({ stepId: flame!.id, note: 'Port left wet.' });
    expect(link.status).toBe(201);
    const changed = await trainer.agent.get(`/api/procedure-steps/${flame!.id}/stats`).expect(200);
    expect(changed.body.incidentsLinked).toBe(1);
    expect(changed.body.ticked).toMatchObject({ jars: 4, contaminated: 4, rate: 1 });
    // Table [[4,0],[1,3]], computed here from Fisher's (1935) hypergeometric rule: the tables with these
    // margins have weights 4, 24, 24, 4 over C(8,5) = 56; the two as unlikely as observed give 8/56 = 1/7.
    expect(changed.body.pValue).toBeCloseTo(1 / 7, 9);
  });

  it('counts young clean jars as incubating and filters by inoculation date', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const [wipe] = await stepsOf(trainer, proc.currentVersionId);
    const today = new Date().toISOString().slice(0, 10);
    const recent = await makeSession({ heldOn: today, checks: { [wipe!.id]: false } });
    await makeJars(2, { inoculatedOn: today, sessionId: recent.id });
    const res = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats`).expect(200);
    expect(res.body.notTicked).toEqual({ jars: 2, contaminated: 0, incubating: 2, rate: 0 });
    const none = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats?to=2020-01-01`).expect(200);
    expect(none.body.notTicked.jars).toBe(0);
    const bad = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats?from=2024-02-30x`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('from');
  });
});
