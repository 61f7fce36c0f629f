import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { incidentOf } from './incidents-fixtures';
import { signedIn } from '../setup/factories';
import { eventsFor, newIncident, send } from './incidents-review.fixtures';
import { issuePath } from '../setup/bodies';

const app = createTestApp();

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
    expect(issuePath(stale)).toBe('version');
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
    const review = incidentOf(res).history.filter((h) => h.action === 'review');
    expect(review.map((h) => [h.field, h.oldValue, h.newValue])).toEqual([
      ['status', 'open', 'in-review'],
      ['verdict', 'pending', 'confirmed'],
      ['causeCategory', null, 'machine'],
      ['rootCauseNotes', null, 'gauge read low'],
    ]);
    expect(review[1]).toMatchObject({ userName: 'Test supervisor', reason: 'same run as three others' });
    expect(Date.parse(review[1]!.at)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('POST review enforces open → in review → closed and a verdict before closing', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id } = await newIncident(tech);
    const skip = await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'closed', verdict: 'confirmed' });
    expect(skip.status).toBe(422);
    expect(issuePath(skip)).toBe('status');
    await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'in-review' }).expect(200);
    const pending = await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'closed' });
    expect(pending.status).toBe(422);
    expect(issuePath(pending)).toBe('verdict');
    await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'closed', verdict: 'confirmed' }).expect(200);
    const edit = await send(sup, 'post', `/api/incidents/${id}/review`, { verdict: 'ruled-out' });
    expect(edit.status).toBe(422);
    const noReason = await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'in-review' });
    expect(issuePath(noReason)).toBe('reason');
    await send(sup, 'post', `/api/incidents/${id}/review`, {
      status: 'in-review',
      reason: 'new evidence from the agar test',
    }).expect(200);
    expect((await send(sup, 'post', `/api/incidents/${id}/review`, {})).status).toBe(400);
    expect((await send(sup, 'post', '/api/incidents/999999/review', { verdict: 'confirmed' })).status).toBe(404);
  });
});
