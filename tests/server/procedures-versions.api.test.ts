import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { ProcedureStep } from '../../server/procedures/procedure-step.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { create, steps } from './procedures.fixtures';

const app = createTestApp();

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
