import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import supertest from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { freePort } from '../../scripts/free-port';
import { startMariaDb, type MariaDbHandle } from '../../scripts/mariadb';
import { startChildApp, type ChildApp } from '../setup/child-app';
import { testDbUser } from '../setup/throwaway-db';
import { bodyOf, errorOf } from '../setup/bodies';
import { csrfSchema } from '../../shared/schemas/auth';

// Its own MariaDB: this file stops and starts it, which the worker's shared database must never see.
const dataDir = mkdtempSync(path.join(tmpdir(), 'asepta-outage-db-'));
const database = 'asepta_outage';
let db: MariaDbHandle | undefined;
let app: ChildApp | undefined;

const startDb = async (port: number) => startMariaDb({ dataDir, port, database, ...testDbUser, fast: true });

afterAll(async () => {
  await app?.stop();
  await db?.stop();
  rmSync(dataDir, { recursive: true, force: true });
});

/** Asks until the answer matches: the database's return is an event, not a time. */
async function healthUntil(url: string, status: number) {
  for (;;) {
    const res = await supertest(url).get('/api/health');
    if (res.status === status) return res;
    await new Promise((r) => setTimeout(r, 200));
  }
}

describe('the database goes away under a running app', () => {
  it('keeps serving: 503 db down while it is away, 200 again once it is back, without a restart', async () => {
    const port = await freePort();
    db = await startDb(port);
    app = await startChildApp({ port, database, ...testDbUser }, { MAINTENANCE_INTERVAL_SECONDS: '1' });

    const agent = supertest.agent(app.url);
    const csrf = async () => bodyOf(await agent.get('/api/auth/csrf'), csrfSchema).token;
    // No accounts in this empty lab: a sign-in that reaches the user table is 401 when all is well.
    expect((await agent.get('/api/health')).body).toEqual({ status: 'ok', db: 'up' });
    const token = await csrf();

    await db.stop();
    const down = await healthUntil(app.url, 503);
    expect(down.body).toEqual({ status: 'error', db: 'down' });
    const login = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ username: 'a', password: 'b' });
    expect(login.status).toBe(503);
    expect(errorOf(login).code).toBe('database-unavailable');
    // The sweep that used to reject unhandled runs every second here: wait until it has failed once.
    await app.waitForLog((l) => l.includes('auth maintenance failed'), 'a failed maintenance sweep');
    expect(app.child.exitCode).toBeNull();

    db = await startDb(port);
    expect((await healthUntil(app.url, 200)).body).toEqual({ status: 'ok', db: 'up' });
    const after = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ username: 'a', password: 'b' });
    expect(after.status).toBe(401);
    expect(app.child.exitCode).toBeNull();
  });
});
