import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeIncident, makeJars } from '../setup/lab-rows';
import { pageOf } from '../../shared/schemas/common';
import { incidentListItemSchema } from '../../shared/schemas/incidents';
import { stepLinkSchema } from '../../shared/schemas/procedures';
import { create, stepsOf } from './procedures.fixtures';
import { bodyOf, errorOf, issuePath, itemsOf } from '../setup/bodies';

const app = createTestApp();
const incidentPageSchema = pageOf(incidentListItemSchema);

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
    expect(issuePath(again)).toBe('stepId');

    expect((await stepsOf(trainer, proc.currentVersionId))[1]!.incidentsLinked).toBe(1);
    const list = await trainer.agent.get(`/api/incidents/${incident.id}/step-links`).expect(200);
    expect(bodyOf(list, itemsOf(stepLinkSchema)).items).toHaveLength(1);
    const ofStep = await trainer.agent.get(`/api/procedure-steps/${flame!.id}/links`).expect(200);
    expect(bodyOf(ofStep, itemsOf(stepLinkSchema)).items.map((l) => l.incidentId)).toEqual([incident.id]);
    expect((await trainer.agent.get('/api/procedure-steps/999999/links')).status).toBe(404);

    expect(
      (
        await trainer.agent
          .delete(`/api/step-links/${bodyOf(res, stepLinkSchema).id}`)
          .set('X-CSRF-Token', trainer.token())
      ).status,
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
      bodyOf(
        await trainer.agent.get('/api/incidents').query({ q, pageSize: 200 }).expect(200),
        incidentPageSchema,
      ).items.map((i) => i.id);
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
    expect(
      errorOf(res)
        .issues!.map((i: { path: string }) => i.path)
        .sort(),
    ).toEqual(['note', 'stepId']);
  });
});
