import supertest from 'supertest';
import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { pageOf } from '../../shared/schemas/common';
import { personSchema, userSchema } from '../../shared/schemas/users';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();
const newUser = () => ({
  username: uniqueName('new'),
  displayName: 'New Person',
  role: 'technician',
  password: 'long-enough-pass',
});

describe('/api/users', () => {
  it('answers 401 without a session', async () => {
    expect((await supertest(app).get('/api/users')).status).toBe(401);
  });

  it.each(['technician', 'supervisor', 'trainer'] as const)('answers 403 to a %s', async (role) => {
    const client = await signedIn(app, role);
    expect((await client.agent.get('/api/users')).status).toBe(403);
    const post = await client.agent.post('/api/users').set('X-CSRF-Token', client.token()).send(newUser());
    expect(post.status).toBe(403);
  });

  it('creates a user and writes an audit event', async () => {
    const admin = await signedIn(app, 'admin');
    const body = newUser();
    const res = await admin.agent.post('/api/users').set('X-CSRF-Token', admin.token()).send(body);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ username: body.username, role: 'technician', active: true });
    expect(res.body).not.toHaveProperty('passwordHash');
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'user',
      recordId: String(bodyOf(res, userSchema).id),
      action: 'create',
    });
    expect(audit?.userName).toBe('Test admin');
  });

  it('answers 409 naming username when it is taken', async () => {
    const admin = await signedIn(app, 'admin');
    const body = newUser();
    await admin.agent.post('/api/users').set('X-CSRF-Token', admin.token()).send(body).expect(201);
    const res = await admin.agent.post('/api/users').set('X-CSRF-Token', admin.token()).send(body);
    expect(res.status).toBe(409);
    expect(issuePath(res)).toBe('username');
  });

  it('answers 400 naming the field for a bad role', async () => {
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent
      .post('/api/users')
      .set('X-CSRF-Token', admin.token())
      .send({ ...newUser(), role: 'owner' });
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('role');
  });

  it('answers 404 for an unknown user id', async () => {
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent
      .patch('/api/users/999999')
      .set('X-CSRF-Token', admin.token())
      .send({ role: 'trainer' });
    expect(res.status).toBe(404);
  });

  it('changes the role with an audit event holding old and new value', async () => {
    const admin = await signedIn(app, 'admin');
    const created = await admin.agent.post('/api/users').set('X-CSRF-Token', admin.token()).send(newUser());
    const { id } = bodyOf(created, userSchema);
    const res = await admin.agent
      .patch(`/api/users/${id}`)
      .set('X-CSRF-Token', admin.token())
      .send({ role: 'supervisor' });
    expect(bodyOf(res, userSchema).role).toBe('supervisor');
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'user',
      recordId: String(id),
      field: 'role',
    });
    expect(audit).toMatchObject({ oldValue: 'technician', newValue: 'supervisor' });
  });

  it('pages and sorts on the server', async () => {
    const admin = await signedIn(app, 'admin');
    for (let i = 0; i < 3; i += 1)
      await admin.agent.post('/api/users').set('X-CSRF-Token', admin.token()).send(newUser());
    const res = await admin.agent.get('/api/users?page=1&pageSize=2&sort=-username');
    expect(res.status).toBe(200);
    const page = bodyOf(res, pageOf(userSchema));
    expect(page.items).toHaveLength(2);
    expect(page.total).toBeGreaterThanOrEqual(4);
    const names = page.items.map((u) => u.username);
    expect([...names].sort().reverse()).toEqual(names);
    expect((await admin.agent.get('/api/users?pageSize=500')).status).toBe(400);
  });

  it('will not let an admin deactivate their own account', async () => {
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent
      .patch(`/api/users/${admin.user.id}`)
      .set('X-CSRF-Token', admin.token())
      .send({ active: false });
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('active');
  });
});

describe('GET /api/users/people', () => {
  it('gives any signed-in person the names and roles of active users, without addresses', async () => {
    const tech = await signedIn(app, 'technician');
    const res = await tech.agent.get('/api/users/people');
    expect(res.status).toBe(200);
    const me = bodyOf(res, z.array(personSchema)).find((p) => p.id === tech.user.id);
    expect(me).toEqual({ id: tech.user.id, displayName: 'Test technician', role: 'technician' });
    expect(JSON.stringify(res.body)).not.toContain('@');
  });
});
