import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { createTestApp, csrfAgent } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { counts, csv, importingSupervisor, row } from './imports.fixtures';
import { issuePath } from '../setup/bodies';

const app = createTestApp();
const supervisor = () => importingSupervisor(app);

describe('POST /api/imports/history — access', () => {
  it('answers 401 with a CSRF token but no session', async () => {
    const client = await csrfAgent(app);
    const res = await client.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', client.token())
      .set('Content-Type', 'text/csv')
      .send(csv([row(uniqueName('A'), 1)]));
    expect(res.status).toBe(401);
  });

  it('answers 403 without a CSRF token, before looking at the session', async () => {
    const res = await supertest(app).post('/api/imports/history').set('Content-Type', 'text/csv').send('jar_label\n');
    expect(res.status).toBe(403);
  });

  it.each(['technician', 'trainer'] as const)('answers 403 to a %s and writes nothing', async (role) => {
    const client = await signedIn(app, role);
    const before = await counts();
    const res = await client.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', client.token())
      .set('Content-Type', 'text/csv')
      .send(csv([row(uniqueName('B'), 1)]));
    expect(res.status).toBe(403);
    expect(await counts()).toEqual(before);
  });

  it('lets an admin import', async () => {
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', admin.token())
      .set('Content-Type', 'text/csv')
      .send(csv([row(uniqueName('C'), 1)]));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ imported: { jars: 1, incidents: 0 }, ignoredColumns: [] });
  });

  it('answers 400 naming file when there is no body', async () => {
    const sup = await supervisor();
    const res = await sup.agent.post('/api/imports/history').set('X-CSRF-Token', sup.token()).send({ rows: [] });
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('file');
  });
});
