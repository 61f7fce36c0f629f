import bcrypt from 'bcryptjs';
import supertest from 'supertest';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { startAuthMaintenance } from '../../server/auth/auth-maintenance';
import { LoginFailure } from '../../server/auth/login-failure.entity';
import { SessionRecord } from '../../server/auth/session-record.entity';
import { config } from '../../server/core/config';
import { dataSource } from '../../server/db/data-source';
import { createTestApp, csrfAgent } from '../setup/test-app';
import { makeUser, signedIn, testPassword, uniqueName } from '../setup/factories';
import { errorOf } from '../setup/bodies';

const app = createTestApp();

// Every request here comes from the loopback address: start each test with no failures counted.
afterEach(async () => {
  vi.restoreAllMocks();
  await dataSource.manager.clear(LoginFailure);
});

const login = async (username: string, password: string) => {
  const { agent, token } = await csrfAgent(app);
  return agent.post('/api/auth/login').set('X-CSRF-Token', token()).send({ username, password });
};

describe('login limit under concurrency', () => {
  it('answers at most ten 401s to twenty wrong passwords for one username sent at once', async () => {
    const user = await makeUser('technician');
    const statuses = (await Promise.all(Array.from({ length: 20 }, (_, i) => login(user.username, `bad-${i}`)))).map(
      (r) => r.status,
    );
    expect(statuses.filter((s) => s === 401)).toHaveLength(10);
    expect(statuses.filter((s) => s === 429)).toHaveLength(10);
  });

  it('answers 429 after fifty failures from one address on a few usernames', async () => {
    const names = Array.from({ length: 5 }, () => uniqueName('guess'));
    for (let i = 0; i < 50; i += 1) {
      expect((await login(names[i % 5]!, `bad-${i}`)).status).toBe(401);
    }
    expect((await login(names[0]!, 'bad-again')).status).toBe(429);
    // A colleague on the same address is held too: the address has spent its failures.
    const colleague = await makeUser('technician');
    expect((await login(colleague.username, testPassword)).status).toBe(429);
  });

  it('does not count a successful sign-in', async () => {
    const user = await makeUser('technician');
    for (let i = 0; i < 12; i += 1) expect((await login(user.username, testPassword)).status).toBe(200);
    expect(await dataSource.manager.countBy(LoginFailure, { username: user.username })).toBe(0);
  });

  it('compares an unknown username against a decoy hash of the configured cost', async () => {
    const known = await makeUser('technician');
    const compare = vi.spyOn(bcrypt, 'compare');
    await login(known.username, 'wrong');
    await login(uniqueName('nobody'), 'wrong');
    const [knownHash, decoy] = compare.mock.calls.map((c) => c[1]);
    expect(bcrypt.getRounds(knownHash!)).toBe(config().PASSWORD_HASH_ROUNDS);
    expect(bcrypt.getRounds(decoy!)).toBe(config().PASSWORD_HASH_ROUNDS);
  });
});

describe('password change', () => {
  const change = (client: Awaited<ReturnType<typeof signedIn>>, currentPassword: string) =>
    client.agent
      .post('/api/auth/password')
      .set('X-CSRF-Token', client.token())
      .send({ currentPassword, newPassword: 'a-brand-new-secret' });

  it("ends the user's other sessions and keeps the one that changed it", async () => {
    const here = await signedIn(app, 'technician');
    const there = await csrfAgent(app);
    await there.agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', there.token())
      .send({ username: here.user.username, password: testPassword })
      .expect(200);
    const bystander = await signedIn(app, 'technician');
    expect((await there.agent.get('/api/auth/me')).status).toBe(200);

    expect((await change(here, testPassword)).status).toBe(204);
    expect((await here.agent.get('/api/auth/me')).status).toBe(200);
    expect((await there.agent.get('/api/auth/me')).status).toBe(401);
    expect((await bystander.agent.get('/api/auth/me')).status).toBe(200);
  });

  it('counts wrong current passwords like failed logins: the eleventh guess answers 429', async () => {
    const client = await signedIn(app, 'technician');
    for (let i = 0; i < 10; i += 1) expect((await change(client, `guess-${i}`)).status).toBe(400);
    expect((await change(client, `guess-10`)).status).toBe(429);
    expect((await change(client, testPassword)).status).toBe(429);
  });
});

describe('anonymous traffic', () => {
  it('stores no session row for anonymous CSRF token requests', async () => {
    const before = await dataSource.manager.count(SessionRecord);
    for (let i = 0; i < 30; i += 1) await supertest(app).get('/api/auth/csrf').expect(200);
    expect(await dataSource.manager.count(SessionRecord)).toBe(before);
  });

  it('still refuses a token from another browser', async () => {
    const mine = await csrfAgent(app);
    const theirs = await csrfAgent(app);
    const res = await mine.agent.post('/api/auth/login').set('X-CSRF-Token', theirs.token()).send({
      username: 'x',
      password: 'y',
    });
    expect(res.status).toBe(403);
    expect(errorOf(res).code).toBe('csrf-invalid');
  });
});

describe('auth maintenance', () => {
  it('prunes sign-in failures older than a day and expired sessions, and keeps the rest', async () => {
    const m = dataSource.manager;
    const tag = uniqueName('old');
    await m.insert(LoginFailure, [
      { username: `${tag}-stale`, address: '192.0.2.1', failedAt: new Date(Date.now() - 2 * 86_400_000) },
      { username: `${tag}-recent`, address: '192.0.2.1', failedAt: new Date() },
    ]);
    await m.insert(SessionRecord, [
      { sessionId: `${tag}-expired`, expires: Math.floor(Date.now() / 1000) - 60, data: '{}' },
      { sessionId: `${tag}-live`, expires: Math.floor(Date.now() / 1000) + 3600, data: '{}' },
    ]);
    const maintenance = startAuthMaintenance();
    await maintenance.run();
    maintenance.stop();
    expect(await m.countBy(LoginFailure, { username: `${tag}-stale` })).toBe(0);
    expect(await m.countBy(LoginFailure, { username: `${tag}-recent` })).toBe(1);
    expect(await m.countBy(SessionRecord, { sessionId: `${tag}-expired` })).toBe(0);
    expect(await m.countBy(SessionRecord, { sessionId: `${tag}-live` })).toBe(1);
  });
});
