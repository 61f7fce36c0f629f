import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { correctiveActionSchema } from '../../shared/schemas/corrective-actions';
import { incidentOf, makeJpeg, photosOf } from './incidents-fixtures';
import { eventsFor, newIncident, send } from './incidents-review.fixtures';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();

describe('audit events on every mutating route', () => {
  it('POST photos attaches new photos once, with an audit event each', async () => {
    const tech = await signedIn(app, 'technician');
    const { id } = await newIncident(tech);
    const up = await tech.agent
      .post('/api/photos')
      .set('X-CSRF-Token', tech.token())
      .attach('photos', await makeJpeg(), 'a.jpg')
      .attach('photos', await makeJpeg(), 'b.jpg');
    const ids = photosOf(up).map((p) => p.id);
    const res = await send(tech, 'post', `/api/incidents/${id}/photos`, { photoIds: ids });
    expect(res.status).toBe(200);
    expect(incidentOf(res).photos.map((p) => p.id)).toEqual(ids);
    await send(tech, 'post', `/api/incidents/${id}/photos`, { photoIds: ids }).expect(200);
    expect(
      (await eventsFor('incident', id)).filter((e) => e.action === 'add-photo').map((e) => Number(e.newValue)),
    ).toEqual(ids);
    const missing = await send(tech, 'post', `/api/incidents/${id}/photos`, { photoIds: [999999] });
    expect(missing.status).toBe(422);
    expect(issuePath(missing)).toBe('photoIds');
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
    const actionId = bodyOf(created, correctiveActionSchema).id;
    const unverified = await send(sup, 'patch', `/api/corrective-actions/${actionId}`, { doneOn: '2020-01-02' });
    expect(unverified.status).toBe(422);
    expect(issuePath(unverified)).toBe('verification');
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
    const { history } = incidentOf(await sup.agent.get(`/api/incidents/${id}`));
    expect(history.filter((h) => h.recordType === 'corrective-action')).toHaveLength(3);
    const badOwner = await send(sup, 'post', `/api/incidents/${id}/actions`, {
      what: 'Retrain',
      ownerId: 999999,
      dueOn: '2030-01-01',
    });
    expect(issuePath(badOwner)).toBe('ownerId');
    const halfFactor = await send(sup, 'post', `/api/incidents/${id}/actions`, {
      what: 'Retrain',
      ownerName: 'A',
      dueOn: '2030-01-01',
      factor: 'operator',
    });
    expect(issuePath(halfFactor)).toBe('level');
    expect((await send(sup, 'patch', '/api/corrective-actions/999999', { what: 'Nothing' })).status).toBe(404);
  });
});
