import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { jarIsContaminatedSql } from '../../server/incidents/live-incidents';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeJar, makeJpeg, makeProduction } from './incidents-fixtures';

const app = createTestApp();
type Client = Awaited<ReturnType<typeof signedIn>>;

async function newIncident(tech: Client, status: Jar['status'] = 'incubating') {
  const jar = await makeJar(await makeProduction(), { status });
  const res = await tech.agent
    .post('/api/incidents')
    .set('X-CSRF-Token', tech.token())
    .send({
      jarLabels: [jar.label],
      contaminant: 'bacterial',
      severity: 'high',
      stage: 'incubation',
      sealed: true,
      sterilisedBeforeDisposal: false,
    });
  expect(res.status).toBe(201);
  return { id: res.body.id as number, version: res.body.version as number, jar };
}

const send = (c: Client, method: 'post' | 'patch', url: string, body: object) =>
  c.agent[method](url).set('X-CSRF-Token', c.token()).send(body);
const jarStatus = async (id: number) => (await dataSource.manager.findOneByOrFail(Jar, { id })).status;
const isContaminated = async (id: number) =>
  Number(
    (await dataSource.query(`SELECT ${jarIsContaminatedSql('j.id')} AS c FROM jars j WHERE j.id = ?`, [id]))[0].c,
  ) === 1;
const eventsFor = (recordType: string, recordId: number) =>
  dataSource.manager.find(AuditEvent, { where: { recordType, recordId: String(recordId) }, order: { id: 'ASC' } });

describe('roles on every incident route', () => {
  it('refuses each writing route to the roles that may not use it', async () => {
    const tech = await signedIn(app, 'technician');
    const trainer = await signedIn(app, 'trainer');
    const admin = await signedIn(app, 'admin');
    const { id, version } = await newIncident(tech);
    const sup = await signedIn(app, 'supervisor');
    const action = await send(sup, 'post', `/api/incidents/${id}/actions`, {
      what: 'Re-check the gauge',
      ownerName: 'Shift lead',
      dueOn: '2030-01-01',
    });
    const routes: [string, 'post' | 'patch', string, object][] = [
      [
        'create',
        'post',
        '/api/incidents',
        {
          jarLabels: ['X'],
          contaminant: 'yeast',
          severity: 'low',
          stage: 'incubation',
          sealed: true,
          sterilisedBeforeDisposal: true,
        },
      ],
      ['edit', 'patch', `/api/incidents/${id}`, { version, notes: 'x' }],
      ['review', 'post', `/api/incidents/${id}/review`, { verdict: 'confirmed' }],
      ['void', 'post', `/api/incidents/${id}/void`, { reason: 'entered twice' }],
      ['photos', 'post', `/api/incidents/${id}/photos`, { photoIds: [1] }],
      ['action', 'post', `/api/incidents/${id}/actions`, { what: 'Retrain', ownerName: 'A', dueOn: '2030-01-01' }],
      ['action edit', 'patch', `/api/corrective-actions/${action.body.id}`, { what: 'Retrain twice' }],
    ];
    const forbiddenFor: Record<string, Client[]> = {
      create: [trainer],
      edit: [trainer],
      review: [tech, trainer, admin],
      void: [tech, trainer, admin],
      photos: [trainer],
      action: [tech, trainer, admin],
      'action edit': [tech, trainer, admin],
    };
    const seen: string[] = [];
    const expected: string[] = [];
    for (const [name, method, url, body] of routes) {
      // CSRF is checked before the session, so a stranger's write is refused with 403 (DESIGN.md §5).
      seen.push(`${name} anonymous ${(await supertest(app)[method](url).send(body)).status}`);
      expected.push(`${name} anonymous 403`);
      for (const client of forbiddenFor[name] ?? []) {
        seen.push(`${name} ${client.user.role} ${(await send(client, method, url, body)).status}`);
        expected.push(`${name} ${client.user.role} 403`);
      }
    }
    for (const url of ['/api/incidents', `/api/incidents/${id}`, '/api/incidents/export.csv']) {
      seen.push(`GET ${url} ${(await supertest(app).get(url)).status}`);
      expected.push(`GET ${url} 401`);
    }
    expect(seen).toEqual(expected);
    expect((await trainer.agent.get(`/api/incidents/${id}`)).status).toBe(200);
  });

  it('answers 401 to a valid CSRF token without a session', async () => {
    const agent = supertest.agent(app);
    const token = (await agent.get('/api/auth/csrf')).body.token as string;
    expect(
      (await agent.post('/api/incidents/1/review').set('X-CSRF-Token', token).send({ verdict: 'confirmed' })).status,
    ).toBe(401);
  });

  it('lets a technician edit their own open incident only', async () => {
    const tech = await signedIn(app, 'technician');
    const other = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id, version } = await newIncident(tech);
    const own = await send(tech, 'patch', `/api/incidents/${id}`, {
      version,
      signSmell: 'sour',
      reason: 'smelt it on second look',
    });
    expect(own.status).toBe(200);
    expect(own.body).toMatchObject({ signSmell: 'sour', version: version + 1 });
    expect(
      (await send(other, 'patch', `/api/incidents/${id}`, { version: version + 1, signSmell: 'sweet' })).status,
    ).toBe(403);
    await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'in-review' }).expect(200);
    const late = await send(tech, 'patch', `/api/incidents/${id}`, { version: version + 2, signSmell: 'sweet' });
    expect(late.status).toBe(403);
    expect((await send(sup, 'patch', `/api/incidents/${id}`, { version: version + 2, severity: 'low' })).status).toBe(
      200,
    );
  });
});

describe('audit events on every mutating route', () => {
  it('PATCH /api/incidents/:id writes one event per changed field with old, new and reason', async () => {
    const tech = await signedIn(app, 'technician');
    const { id, version } = await newIncident(tech);
    await send(tech, 'patch', `/api/incidents/${id}`, {
      version,
      severity: 'low',
      signColour: 'cream',
      reason: 'looked again',
    }).expect(200);
    const events = (await eventsFor('incident', id)).filter((e) => e.action === 'update');
    expect(events.map((e) => [e.field, e.oldValue, e.newValue, e.reason])).toEqual([
      ['signColour', null, 'cream', 'looked again'],
      ['severity', 'high', 'low', 'looked again'],
    ]);
  });

  it('answers 409 on a stale version and writes nothing', async () => {
    const tech = await signedIn(app, 'technician');
    const { id, version } = await newIncident(tech);
    await send(tech, 'patch', `/api/incidents/${id}`, { version, notes: 'first' }).expect(200);
    const stale = await send(tech, 'patch', `/api/incidents/${id}`, { version, notes: 'second' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.issues[0].path).toBe('version');
    expect((await eventsFor('incident', id)).filter((e) => e.action === 'update')).toHaveLength(1);
  });

  it('POST review sets in review then confirmed, each audited, and shown as history with who and when', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id } = await newIncident(tech);
    await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'in-review' }).expect(200);
    const res = await send(sup, 'post', `/api/incidents/${id}/review`, {
      verdict: 'confirmed',
      causeCategory: 'machine',
      rootCauseNotes: 'gauge read low',
      reason: 'same run as three others',
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'in-review', verdict: 'confirmed', causeCategory: 'machine' });
    const review = res.body.history.filter((h: { action: string }) => h.action === 'review');
    expect(
      review.map((h: { field: string; oldValue: string; newValue: string }) => [h.field, h.oldValue, h.newValue]),
    ).toEqual([
      ['status', 'open', 'in-review'],
      ['verdict', 'pending', 'confirmed'],
      ['causeCategory', null, 'machine'],
      ['rootCauseNotes', null, 'gauge read low'],
    ]);
    expect(review[1]).toMatchObject({ userName: 'Test supervisor', reason: 'same run as three others' });
    expect(Date.parse(review[1].at)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('POST review enforces open → in review → closed and a verdict before closing', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id } = await newIncident(tech);
    const skip = await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'closed', verdict: 'confirmed' });
    expect(skip.status).toBe(422);
    expect(skip.body.error.issues[0].path).toBe('status');
    await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'in-review' }).expect(200);
    const pending = await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'closed' });
    expect(pending.status).toBe(422);
    expect(pending.body.error.issues[0].path).toBe('verdict');
    await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'closed', verdict: 'confirmed' }).expect(200);
    const edit = await send(sup, 'post', `/api/incidents/${id}/review`, { verdict: 'ruled-out' });
    expect(edit.status).toBe(422);
    const noReason = await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'in-review' });
    expect(noReason.body.error.issues[0].path).toBe('reason');
    await send(sup, 'post', `/api/incidents/${id}/review`, {
      status: 'in-review',
      reason: 'new evidence from the agar test',
    }).expect(200);
    expect((await send(sup, 'post', `/api/incidents/${id}/review`, {})).status).toBe(400);
    expect((await send(sup, 'post', '/api/incidents/999999/review', { verdict: 'confirmed' })).status).toBe(404);
  });

  it('POST void needs a reason, audits it, keeps the incident listed, and frees its jars', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id, jar } = await newIncident(tech, 'colonised');
    expect(await jarStatus(jar.id)).toBe('contaminated');
    expect(await isContaminated(jar.id)).toBe(true);
    const bad = await send(sup, 'post', `/api/incidents/${id}/void`, {});
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('reason');
    const res = await send(sup, 'post', `/api/incidents/${id}/void`, { reason: 'wrong jar scanned' });
    expect(res.body).toMatchObject({ voided: true, voidReason: 'wrong jar scanned' });
    expect(res.body.history.at(-1)).toMatchObject({
      action: 'void',
      field: 'voided',
      oldValue: 'false',
      newValue: 'true',
      reason: 'wrong jar scanned',
    });
    expect(await jarStatus(jar.id)).toBe('colonised');
    expect(await isContaminated(jar.id)).toBe(false);
    expect((await eventsFor('jar', jar.id)).map((e) => e.newValue)).toEqual(['contaminated', 'colonised']);
    const listed = await sup.agent.get(`/api/incidents?cookRunId=${jar.cookRunId}&voided=true`);
    expect(listed.body.items.map((i: { id: number }) => i.id)).toEqual([id]);
    expect((await sup.agent.get(`/api/incidents?cookRunId=${jar.cookRunId}&voided=false`)).body.total).toBe(0);
    expect((await send(sup, 'post', `/api/incidents/${id}/void`, { reason: 'again' })).status).toBe(409);
    expect((await send(sup, 'post', `/api/incidents/${id}/review`, { verdict: 'confirmed' })).status).toBe(409);
  });

  it('keeps a jar contaminated while another live incident covers it', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id, jar } = await newIncident(tech);
    const second = await send(tech, 'post', '/api/incidents', {
      jarIds: [jar.id],
      contaminant: 'yeast',
      severity: 'low',
      stage: 'after-shaking',
      sealed: true,
      sterilisedBeforeDisposal: true,
    });
    expect(second.status).toBe(201);
    await send(sup, 'post', `/api/incidents/${id}/void`, { reason: 'duplicate of the later report' }).expect(200);
    expect(await jarStatus(jar.id)).toBe('contaminated');
    await send(sup, 'post', `/api/incidents/${second.body.id}/review`, {
      verdict: 'ruled-out',
      reason: 'condensation, not yeast',
    }).expect(200);
    expect(await jarStatus(jar.id)).toBe('incubating');
    expect(await isContaminated(jar.id)).toBe(false);
    await send(sup, 'post', `/api/incidents/${second.body.id}/review`, {
      verdict: 'confirmed',
      reason: 'yeast grew on the agar',
    }).expect(200);
    expect(await jarStatus(jar.id)).toBe('contaminated');
  });

  it('POST photos attaches new photos once, with an audit event each', async () => {
    const tech = await signedIn(app, 'technician');
    const { id } = await newIncident(tech);
    const up = await tech.agent
      .post('/api/photos')
      .set('X-CSRF-Token', tech.token())
      .attach('photos', await makeJpeg(), 'a.jpg')
      .attach('photos', await makeJpeg(), 'b.jpg');
    const ids = up.body.map((p: { id: number }) => p.id);
    const res = await send(tech, 'post', `/api/incidents/${id}/photos`, { photoIds: ids });
    expect(res.status).toBe(200);
    expect(res.body.photos.map((p: { id: number }) => p.id)).toEqual(ids);
    await send(tech, 'post', `/api/incidents/${id}/photos`, { photoIds: ids }).expect(200);
    expect(
      (await eventsFor('incident', id)).filter((e) => e.action === 'add-photo').map((e) => Number(e.newValue)),
    ).toEqual(ids);
    const missing = await send(tech, 'post', `/api/incidents/${id}/photos`, { photoIds: [999999] });
    expect(missing.status).toBe(422);
    expect(missing.body.error.issues[0].path).toBe('photoIds');
  });

  it('corrective actions: create and complete with verification, each audited and in the history', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id } = await newIncident(tech);
    const created = await send(sup, 'post', `/api/incidents/${id}/actions`, {
      what: 'Have the gauge of cooker 2 checked',
      ownerId: sup.user.id,
      dueOn: '2020-01-01',
      factor: 'cookRun',
      level: 'CR-1',
    });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ ownerName: 'Test supervisor', overdue: true, doneOn: null });
    const actionId = created.body.id as number;
    const unverified = await send(sup, 'patch', `/api/corrective-actions/${actionId}`, { doneOn: '2020-01-02' });
    expect(unverified.status).toBe(422);
    expect(unverified.body.error.issues[0].path).toBe('verification');
    const done = await send(sup, 'patch', `/api/corrective-actions/${actionId}`, {
      doneOn: '2020-01-02',
      verification: 'gauge read 103 kPa against the reference',
      reason: 'calibration certificate filed',
    });
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ doneOn: '2020-01-02', overdue: false });
    const events = await eventsFor('corrective-action', actionId);
    expect(events.map((e) => [e.action, e.field])).toEqual([
      ['create', null],
      ['update', 'doneOn'],
      ['update', 'verification'],
    ]);
    const history = (await sup.agent.get(`/api/incidents/${id}`)).body.history;
    expect(history.filter((h: { recordType: string }) => h.recordType === 'corrective-action')).toHaveLength(3);
    const badOwner = await send(sup, 'post', `/api/incidents/${id}/actions`, {
      what: 'Retrain',
      ownerId: 999999,
      dueOn: '2030-01-01',
    });
    expect(badOwner.body.error.issues[0].path).toBe('ownerId');
    const halfFactor = await send(sup, 'post', `/api/incidents/${id}/actions`, {
      what: 'Retrain',
      ownerName: 'A',
      dueOn: '2030-01-01',
      factor: 'operator',
    });
    expect(halfFactor.body.error.issues[0].path).toBe('level');
    expect((await send(sup, 'patch', '/api/corrective-actions/999999', { what: 'Nothing' })).status).toBe(404);
  });
});
