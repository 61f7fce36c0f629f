import supertest from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { LoginFailure } from '../../server/auth/login-failure.entity';
import { dataSource } from '../../server/db/data-source';
import { createTestApp, csrfAgent } from '../setup/test-app';
import { makeUser, signedIn, testPassword, uniqueName } from '../setup/factories';
import { bodyOf, errorOf, issuePath } from '../setup/bodies';
import { meSchema } from '../../shared/schemas/auth';

const app = createTestApp();

// The spray test locks out the loopback address for the whole window; later tests start clean.
afterEach(() => dataSource.manager.clear(LoginFailure));

describe('POST /api/auth/login', () => {
  it('signs in with the right password, sets a session cookie and answers the user', async () => {
    const user = await makeUser('technician');
    const { agent, token } = await csrfAgent(app);
    const res = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', token())
      .send({ username: user.username, password: testPassword });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ username: user.username, role: 'technician' });
    expect(res.headers['set-cookie']?.[0]).toMatch(/^asepta\.sid=.*HttpOnly/);
    expect(res.headers['set-cookie']?.[0]).not.toMatch(/Secure/);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(bodyOf(me, meSchema).username).toBe(user.username);
  });

  it('answers 401 with a clear code for a wrong password', async () => {
    const user = await makeUser('technician');
    const { agent, token } = await csrfAgent(app);
    const res = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', token())
      .send({ username: user.username, password: 'wrong-password' });
    expect(res.status).toBe(401);
    expect(errorOf(res).code).toBe('invalid-credentials');
  });

  it('answers 400 naming the field when the username is missing', async () => {
    const { agent, token } = await csrfAgent(app);
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', token()).send({ password: 'x' });
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('username');
  });

  it('refuses a deactivated user', async () => {
    const user = await makeUser('technician');
    const admin = await signedIn(app, 'admin');
    await admin.agent
      .patch(`/api/users/${user.id}`)
      .set('X-CSRF-Token', admin.token())
      .send({ active: false })
      .expect(200);
    const { agent, token } = await csrfAgent(app);
    const res = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', token())
      .send({ username: user.username, password: testPassword });
    expect(res.status).toBe(401);
  });

  it('gives 429 after ten failures for one username while another user still signs in', async () => {
    const victim = await makeUser('supervisor');
    const other = await makeUser('technician');
    const { agent, token } = await csrfAgent(app);
    const statuses: number[] = [];
    for (let i = 0; i < 11; i += 1) {
      const res = await agent
        .post('/api/auth/login')
        .set('X-CSRF-Token', token())
        .send({ username: victim.username, password: `bad-${i}` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(statuses[10]).toBe(429);
    const blockedEvenIfRight = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', token())
      .send({ username: victim.username, password: testPassword });
    expect(blockedEvenIfRight.status).toBe(429);
    const ok = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', token())
      .send({ username: other.username, password: testPassword });
    expect(ok.status).toBe(200);
  });

  it('gives 429 to one address that fails on ten different usernames', async () => {
    const { agent, token } = await csrfAgent(app);
    for (let i = 0; i < 10; i += 1) {
      await agent
        .post('/api/auth/login')
        .set('X-CSRF-Token', token())
        .send({ username: uniqueName('nobody'), password: 'x' })
        .expect(401);
    }
    const res = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', token())
      .send({ username: uniqueName('nobody'), password: 'x' });
    // trust proxy is off, so every request above came from the same loopback address
    expect(res.status).toBe(429);
  });
});

describe('CSRF', () => {
  it('refuses a state-changing request without the token with 403, before authentication', async () => {
    const res = await supertest(app).post('/api/auth/logout');
    expect(res.status).toBe(403);
    expect(errorOf(res).code).toBe('csrf-invalid');
  });

  it('answers 401 to a valid token without a session', async () => {
    const { agent, token } = await csrfAgent(app);
    const res = await agent.post('/api/users').set('X-CSRF-Token', token()).send({});
    expect(res.status).toBe(401);
  });

  it('voids the pre-sign-in token: sign-in regenerates the session', async () => {
    const user = await makeUser('trainer');
    const { agent, token } = await csrfAgent(app);
    const before = token();
    await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', before)
      .send({ username: user.username, password: testPassword })
      .expect(200);
    const res = await agent.post('/api/auth/logout').set('X-CSRF-Token', before);
    expect(res.status).toBe(403);
  });
});

describe('sessions', () => {
  it('answers 401 on /me without a session', async () => {
    const res = await supertest(app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(errorOf(res).code).toBe('unauthenticated');
  });

  it('keeps a session across a new app instance (sessions live in MariaDB)', async () => {
    const { agent } = await signedIn(app, 'technician');
    const cookie = (await agent.get('/api/auth/me')).request.cookies;
    const restarted = createTestApp();
    const res = await supertest(restarted).get('/api/auth/me').set('Cookie', cookie);
    expect(res.status).toBe(200);
  });

  it('signs out and regenerates the session', async () => {
    const client = await signedIn(app, 'technician');
    await client.agent.post('/api/auth/logout').set('X-CSRF-Token', client.token()).expect(204);
    expect((await client.agent.get('/api/auth/me')).status).toBe(401);
  });
});

describe('POST /api/auth/password', () => {
  it('changes the password when the current one is right', async () => {
    const client = await signedIn(app, 'technician');
    await client.agent
      .post('/api/auth/password')
      .set('X-CSRF-Token', client.token())
      .send({ currentPassword: testPassword, newPassword: 'a-brand-new-secret' })
      .expect(204);
    const fresh = await csrfAgent(app);
    const res = await fresh.agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', fresh.token())
      .send({ username: client.user.username, password: 'a-brand-new-secret' });
    expect(res.status).toBe(200);
  });

  it('answers 400 naming currentPassword when it is wrong', async () => {
    const client = await signedIn(app, 'technician');
    const res = await client.agent
      .post('/api/auth/password')
      .set('X-CSRF-Token', client.token())
      .send({ currentPassword: 'not-it', newPassword: 'a-brand-new-secret' });
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('currentPassword');
  });
});
