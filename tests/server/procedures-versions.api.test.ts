import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { ProcedureStep } from '../../server/procedures/procedure-step.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { procedureDetailSchema, procedureVersionSchema } from '../../shared/schemas/procedures';
import { create, procedurePageSchema, steps } from './procedures.fixtures';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();

describe('procedures: versions', () => {
  it('publishes a new version by copying steps and leaves the old version readable and unchanged', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const v1 = proc.currentVersionId;
    const before = bodyOf(await trainer.agent.get(`/api/procedure-versions/${v1}`).expect(200), procedureVersionSchema);
    const newSteps = [...steps.slice(0, 2), { text: 'Flame the needle again between jars.' }, steps[2]!];
    const res = await trainer.agent
      .post(`/api/procedures/${proc.id}/versions`)
      .set('X-CSRF-Token', trainer.token())
      .send({ changeNote: 'Flaming between jars made a step of its own.', steps: newSteps });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ version: 2, isCurrent: true, stepCount: 4 });
    const published = bodyOf(res, procedureVersionSchema);
    expect(published.steps.map((s) => s.text)).toEqual(newSteps.map((s) => s.text));

    const after = bodyOf(await trainer.agent.get(`/api/procedure-versions/${v1}`).expect(200), procedureVersionSchema);
    expect(after).toEqual({ ...before, isCurrent: false });
    const oldIds = new Set(before.steps.map((s) => s.id));
    expect(published.steps.some((s) => oldIds.has(s.id))).toBe(false);
    expect(await dataSource.manager.countBy(ProcedureStep, { versionId: v1 })).toBe(3);

    const detail = bodyOf(await trainer.agent.get(`/api/procedures/${proc.id}`).expect(200), procedureDetailSchema);
    expect(detail.currentVersion).toBe(2);
    expect(detail.versions.map((v) => v.version)).toEqual([2, 1]);
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
    const page = bodyOf(res, procedurePageSchema);
    const row = page.items.find((p) => p.id === proc.id);
    expect(row).toMatchObject({ currentVersion: 1, currentVersionId: proc.currentVersionId });
    expect(page.pageSize).toBe(200);
    expect((await trainer.agent.get('/api/procedures?sort=colour')).status).toBe(400);
  });
});
