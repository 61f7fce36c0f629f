import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { batchBody, jarEvent, makeJars } from './jars.fixtures';
import { bodyOf, issuePath } from '../setup/bodies';
import { csrfSchema } from '../../shared/schemas/auth';

const app = createTestApp();

describe('jar routes: sign-in and roles', () => {
  it.each([
    ['get', '/api/jars'],
    ['get', '/api/jars/export.csv'],
    ['get', '/api/jars/1'],
    ['get', '/api/jars/by-label/J-000001'],
    ['get', '/api/jars/1/qr.svg'],
    ['get', '/api/jars/labels?ids=1'],
    ['get', '/api/jars/shelf?room=A&shelf=1'],
  ] as const)('answers 401 to %s %s without a session', async (_m, url) => {
    expect((await supertest(app).get(url)).status).toBe(401);
  });

  it('answers 401 to writes with a CSRF token but no session', async () => {
    const agent = supertest.agent(app);
    const { token } = bodyOf(await agent.get('/api/auth/csrf'), csrfSchema);
    for (const url of ['/api/jars/batch', '/api/jars/1/events', '/api/jars/shelf-walk']) {
      expect((await agent.post(url).set('X-CSRF-Token', token).send({})).status).toBe(401);
    }
  });

  it('refuses every jar write to a trainer with 403, but lets them read', async () => {
    const tech = await signedIn(app, 'technician');
    const [jar] = await makeJars(tech, await batchBody({ count: 1 }));
    const trainer = await signedIn(app, 'trainer');
    const t = trainer.token();
    expect(
      (
        await trainer.agent
          .post('/api/jars/batch')
          .set('X-CSRF-Token', t)
          .send(await batchBody())
      ).status,
    ).toBe(403);
    expect(
      (await trainer.agent.post(`/api/jars/${jar!.id}/events`).set('X-CSRF-Token', t).send({ type: 'shaken' })).status,
    ).toBe(403);
    expect(
      (
        await trainer.agent
          .post('/api/jars/shelf-walk')
          .set('X-CSRF-Token', t)
          .send({ marks: [{ jarId: jar!.id, mark: 'clean' }] })
      ).status,
    ).toBe(403);
    expect((await trainer.agent.get(`/api/jars/${jar!.id}`)).status).toBe(200);
  });

  it('answers 404 for an unknown jar id or label', async () => {
    const tech = await signedIn(app, 'technician');
    expect((await tech.agent.get('/api/jars/99999999')).status).toBe(404);
    expect((await tech.agent.get('/api/jars/by-label/NO-SUCH-JAR')).status).toBe(404);
    expect((await tech.agent.get('/api/jars/99999999/qr.svg')).status).toBe(404);
    expect((await jarEvent(tech, 99999999, { type: 'shaken' })).status).toBe(404);
  });

  it('answers 400 naming the field for bad ids, sorts and filters', async () => {
    const tech = await signedIn(app, 'technician');
    const bad = [
      ['/api/jars/abc', 'id'],
      ['/api/jars?sort=colour', 'sort'],
      ['/api/jars?status=mouldy', 'status.0'],
      ['/api/jars?from=2026-13-01', 'from'],
      ['/api/jars?pageSize=201', 'pageSize'],
      ['/api/jars/shelf?room=A', 'shelf'],
      ['/api/jars/labels', 'ids'],
    ] as const;
    const got = [];
    for (const [url] of bad) {
      const res = await tech.agent.get(url);
      got.push([url, res.status, issuePath(res)]);
    }
    expect(got).toEqual(bad.map(([url, path]) => [url, 400, path]));
  });
});
