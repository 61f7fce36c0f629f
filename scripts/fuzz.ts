import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { freePort } from './free-port';
import { appDbEnv, startMariaDb } from './mariadb';
import { malformedRequests } from './fuzz-cases';
import type { Probe } from './fuzz-routes';
import { signInOverHttp, type HttpSession } from './http-session';

// npm run fuzz: malformed requests against every route of an app on a throwaway MariaDB, loopback
// only, bounded in count; prints the status counts and fails on any 5xx.
const total = Number(process.env.FUZZ_REQUESTS ?? 10_000);
const concurrency = 8;
const database = 'asepta_fuzz';
const dbUser = { user: 'asepta_fuzz', password: 'asepta-fuzz-only' };

async function main() {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'asepta-fuzz-db-'));
  const scratch = mkdtempSync(path.join(tmpdir(), 'asepta-fuzz-files-'));
  const db = await startMariaDb({ dataDir, port: await freePort(), database, ...dbUser, fast: true });
  Object.assign(process.env, {
    NODE_ENV: 'test',
    HOST: '127.0.0.1',
    PORT: '0',
    ...appDbEnv(db, database, dbUser),
    PASSWORD_HASH_ROUNDS: '4',
    LOG_LEVEL: 'silent',
    SESSION_SECRET: 'fuzz-session-secret-0123456789',
    UPLOAD_DIR: path.join(scratch, 'uploads'),
    MAIL_SINK_DIR: path.join(scratch, 'mail'),
    SMTP_PORT: '1',
  });
  const { startServer } = await import('../server/main');
  const { createUser } = await import('../server/users/users.service');
  const running = await startServer({ migrate: true, digest: false });
  const counts = new Map<number, number>();
  const failures: string[] = [];
  try {
    const sessions: Record<string, HttpSession | undefined> = { anonymous: undefined };
    for (const role of ['technician', 'supervisor', 'trainer', 'admin'] as const) {
      await createUser(
        { id: null, displayName: 'fuzz' },
        { username: `fuzz-${role}`, displayName: `Fuzz ${role}`, email: '', role, password: 'fuzz-password-1' },
      );
      sessions[role] = await signInOverHttp(running.url, `fuzz-${role}`, 'fuzz-password-1');
    }
    const probes = malformedRequests(total, 20261202);
    let next = 0;
    const worker = async () => {
      for (let i = next++; i < probes.length; i = next++) {
        const probe = probes[i]!;
        const status = await send(running.url, probe, sessions[probe.as]);
        counts.set(status, (counts.get(status) ?? 0) + 1);
        if (status >= 500 || status === 0) failures.push(`${status} ${probe.method} ${probe.path} (${probe.what})`);
      }
    };
    const started = Date.now();
    await Promise.all(Array.from({ length: concurrency }, worker));
    const byClass = [...counts.entries()].sort(([a], [b]) => a - b);
    console.log(`${probes.length} malformed requests in ${((Date.now() - started) / 1000).toFixed(1)} s`);
    for (const [status, n] of byClass) console.log(`  ${status === 0 ? 'no answer' : status}: ${n}`);
    if (failures.length) {
      console.log(`\n${failures.length} answers were 5xx or missing, for example:`);
      for (const f of failures.slice(0, 20)) console.log(`  ${f}`);
      process.exitCode = 1;
    } else console.log('no 5xx');
  } finally {
    await running.close();
    await db.stop();
    rmSync(dataDir, { recursive: true, force: true });
    rmSync(scratch, { recursive: true, force: true });
  }
}

async function send(base: string, probe: Probe, session: HttpSession | undefined): Promise<number> {
  const headers: Record<string, string> = { ...probe.headers };
  if (session) {
    headers.cookie = session.cookie;
    if (probe.method !== 'GET' && !probe.badToken) headers['x-csrf-token'] = session.token;
  }
  try {
    const res = await fetch(`${base}${probe.path}`, {
      method: probe.method,
      headers,
      body: probe.body as BodyInit | undefined,
    });
    await res.arrayBuffer();
    return res.status;
  } catch {
    return 0;
  }
}

await main();
