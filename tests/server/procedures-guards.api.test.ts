import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { create, newProcedure, steps, stepsOf } from './procedures.fixtures';
import { errorOf, issuePath } from '../setup/bodies';

const app = createTestApp();

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
    expect(errorOf(res).issues!.map((i: { path: string }) => i.path)).toContain(path);
  });

  it('answers 409 naming code when the code is taken', async () => {
    const trainer = await signedIn(app, 'trainer');
    const body = newProcedure();
    await create(trainer, body);
    const res = await trainer.agent.post('/api/procedures').set('X-CSRF-Token', trainer.token()).send(body);
    expect(res.status).toBe(409);
    expect(issuePath(res)).toBe('code');
  });

  it('answers 400 naming changeNote when a new version gives no reason', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const res = await trainer.agent
      .post(`/api/procedures/${proc.id}/versions`)
      .set('X-CSRF-Token', trainer.token())
      .send({ steps });
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('changeNote');
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
