import { describe, expect, it } from 'vitest';
import { pageOf } from '../../shared/schemas/common';
import { incidentListItemSchema } from '../../shared/schemas/incidents';
import { createTestApp } from '../setup/test-app';
import { incidentOf } from './incidents-fixtures';
import { signedIn } from '../setup/factories';
import { eventsFor, isContaminated, jarStatus, newIncident, send } from './incidents-review.fixtures';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();

describe('audit events on every mutating route', () => {
  it('POST void needs a reason, audits it, keeps the incident listed, and frees its jars', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id, jar } = await newIncident(tech, 'colonised');
    expect(await jarStatus(jar.id)).toBe('contaminated');
    expect(await isContaminated(jar.id)).toBe(true);
    const bad = await send(sup, 'post', `/api/incidents/${id}/void`, {});
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('reason');
    const res = await send(sup, 'post', `/api/incidents/${id}/void`, { reason: 'wrong jar scanned' });
    expect(res.body).toMatchObject({ voided: true, voidReason: 'wrong jar scanned' });
    expect(incidentOf(res).history.at(-1)).toMatchObject({
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
    expect(bodyOf(listed, pageOf(incidentListItemSchema)).items.map((i) => i.id)).toEqual([id]);
    expect(
      bodyOf(
        await sup.agent.get(`/api/incidents?cookRunId=${jar.cookRunId}&voided=false`),
        pageOf(incidentListItemSchema),
      ).total,
    ).toBe(0);
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
    await send(sup, 'post', `/api/incidents/${incidentOf(second).id}/review`, {
      verdict: 'ruled-out',
      reason: 'condensation, not yeast',
    }).expect(200);
    expect(await jarStatus(jar.id)).toBe('incubating');
    expect(await isContaminated(jar.id)).toBe(false);
    await send(sup, 'post', `/api/incidents/${incidentOf(second).id}/review`, {
      verdict: 'confirmed',
      reason: 'yeast grew on the agar',
    }).expect(200);
    expect(await jarStatus(jar.id)).toBe('contaminated');
  });
});
