import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { meSchema } from '../../shared/schemas/auth';
import { passwordResetSchema } from '../../shared/schemas/users';
import { csrfAgent, createTestApp } from '../setup/test-app';
import { makeUser, sendAs, signedIn, testPassword } from '../setup/factories';
import { bodyOf, errorOf, issuePath } from '../setup/bodies';

const app = createTestApp();

async function signIn(username: string, password: string) {
  const client = await csrfAgent(app);
  const res = await client.agent
    .post('/api/auth/login')
    .set('X-CSRF-Token', client.token())
    .send({ username, password });
  await client.refresh();
  return { client, res };
}

describe('POST /api/users/:id/password-reset', () => {
  it('answers 403 without a CSRF token and 401 without a session', async () => {
    expect((await supertest(app).post('/api/users/1/password-reset').send({})).status).toBe(403);
    const anon = await csrfAgent(app);
    const res = await anon.agent.post('/api/users/1/password-reset').set('X-CSRF-Token', anon.token()).send({});
    expect(res.status).toBe(401);
  });

  it.each(['technician', 'supervisor', 'trainer'] as const)('answers 403 to a %s', async (role) => {
    const client = await signedIn(app, role);
    const target = await makeUser('technician');
    expect((await sendAs(client, 'post', `/api/users/${target.id}/password-reset`, {})).status).toBe(403);
  });

  it('answers 400 naming temporaryPassword when it is too short', async () => {
    const admin = await signedIn(app, 'admin');
    const target = await makeUser('technician');
    const res = await sendAs(admin, 'post', `/api/users/${target.id}/password-reset`, { temporaryPassword: 'short' });
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('temporaryPassword');
  });

  it('answers 404 for a user that does not exist', async () => {
    const admin = await signedIn(app, 'admin');
    expect((await sendAs(admin, 'post', '/api/users/999999/password-reset', {})).status).toBe(404);
  });

  it('generates a password shown once, signs the person out and records an audit event', async () => {
    const admin = await signedIn(app, 'admin');
    const target = await makeUser('technician');
    const before = await signIn(target.username, testPassword);
    const res = await sendAs(admin, 'post', `/api/users/${target.id}/password-reset`, {});
    expect(res.status).toBe(200);
    const reset = bodyOf(res, passwordResetSchema);
    expect(reset.generatedPassword).toMatch(/^[A-Za-z2-9]{14}$/);
    expect(reset.user).toMatchObject({ id: target.id, mustChangePassword: true });
    expect((await before.client.agent.get('/api/auth/me')).status).toBe(401);
    expect((await signIn(target.username, testPassword)).res.status).toBe(401);
    expect((await signIn(target.username, reset.generatedPassword!)).res.status).toBe(200);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'user',
      recordId: String(target.id),
      action: 'reset-password',
    });
    expect(audit?.userName).toBe('Test admin');
    expect(audit?.newValue).not.toContain(reset.generatedPassword!);
  });

  it('holds every other route at 403 password-change-required until the person sets a new password', async () => {
    const admin = await signedIn(app, 'admin');
    const target = await makeUser('technician');
    const temporaryPassword = 'temporary-pass-123';
    const reset = await sendAs(admin, 'post', `/api/users/${target.id}/password-reset`, { temporaryPassword });
    expect(bodyOf(reset, passwordResetSchema).generatedPassword).toBeNull();
    const { client, res } = await signIn(target.username, temporaryPassword);
    expect(bodyOf(res, meSchema).mustChangePassword).toBe(true);
    expect(bodyOf(await client.agent.get('/api/auth/me'), meSchema).mustChangePassword).toBe(true);
    const held = await client.agent.get('/api/jars');
    expect(held.status).toBe(403);
    expect(errorOf(held).code).toBe('password-change-required');
    const same = await sendAs({ ...client, user: target }, 'post', '/api/auth/password', {
      currentPassword: temporaryPassword,
      newPassword: temporaryPassword,
    });
    expect(same.status).toBe(400);
    expect(issuePath(same)).toBe('newPassword');
    const changed = await sendAs({ ...client, user: target }, 'post', '/api/auth/password', {
      currentPassword: temporaryPassword,
      newPassword: 'my-own-new-password',
    });
    expect(changed.status).toBe(204);
    expect(bodyOf(await client.agent.get('/api/auth/me'), meSchema).mustChangePassword).toBe(false);
    expect((await client.agent.get('/api/jars')).status).toBe(200);
    expect((await signIn(target.username, temporaryPassword)).res.status).toBe(401);
  });

  it('refuses an admin resetting their own password, naming the field', async () => {
    const admin = await signedIn(app, 'admin');
    const res = await sendAs(admin, 'post', `/api/users/${admin.user.id}/password-reset`, {});
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('temporaryPassword');
  });
});

describe('PATCH /api/users/:id name and e-mail', () => {
  it('edits the name and e-mail with an audit event per field, and names a bad e-mail', async () => {
    const admin = await signedIn(app, 'admin');
    const target = await makeUser('trainer');
    const bad = await sendAs(admin, 'patch', `/api/users/${target.id}`, { email: 'not-an-address' });
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('email');
    const res = await sendAs(admin, 'patch', `/api/users/${target.id}`, {
      displayName: 'Renamed Person',
      email: 'renamed@example.invalid',
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ displayName: 'Renamed Person', email: 'renamed@example.invalid' });
    const fields = await dataSource.manager.findBy(AuditEvent, { recordType: 'user', recordId: String(target.id) });
    expect(
      fields
        .map((e) => e.field)
        .filter(Boolean)
        .sort(),
    ).toEqual(['displayName', 'email']);
  });
});
