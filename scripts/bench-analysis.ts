/**
 * npm run bench: seeds invented production (200,000 jars, 8,000 incidents) into a throwaway MariaDB and
 * prints, for the rates, crosstab and causes routes, the route's median time beside the median of the
 * bare SQL aggregation behind it. Prints figures; asserts nothing.
 */
import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import os, { tmpdir } from 'node:os';
import path from 'node:path';
import mysql from 'mysql2/promise';
import { freePort } from './free-port';
import { startMariaDb } from './mariadb';

const JARS = Number(process.env.BENCH_JARS ?? 200_000);
const INCIDENTS = Number(process.env.BENCH_INCIDENTS ?? 8_000);
const RUNS = Number(process.env.BENCH_RUNS ?? 20);
const JARS_PER_SESSION = 40;
const JARS_PER_COOK_RUN = 60;
const JARS_PER_PREP_BATCH = 300;
const SESSIONS_PER_DAY = 10;
const CULTURES = 40;

const database = 'asepta_bench';
const dbUser = { user: 'asepta_bench', password: 'asepta-bench-only' };

const log = (line: string) => process.stdout.write(`${line}\n`);
const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};
/** Nearest-rank percentile. */
const percentile = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.ceil((p / 100) * xs.length) - 1]!;
const loadAverage = () =>
  os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(', ');

/** 0 … 10^6 − 1 from six cross-joined digit sets: no recursion limit, one statement per table. */
const numbers = (limit: number) => `
  (SELECT d0.d + 10 * d1.d + 100 * d2.d + 1000 * d3.d + 10000 * d4.d + 100000 * d5.d AS n
   FROM ${Array.from({ length: 6 }, (_, i) => `(SELECT 0 d UNION ALL SELECT 1 UNION ALL SELECT 2 UNION ALL SELECT 3 UNION ALL SELECT 4 UNION ALL SELECT 5 UNION ALL SELECT 6 UNION ALL SELECT 7 UNION ALL SELECT 8 UNION ALL SELECT 9) d${i}`).join(', ')}
  ) nums WHERE n < ${limit}`;

async function seed(conn: mysql.Connection, today: string) {
  const sessions = Math.ceil(JARS / JARS_PER_SESSION);
  const cookRuns = Math.ceil(JARS / JARS_PER_COOK_RUN);
  const prepBatches = Math.ceil(JARS / JARS_PER_PREP_BATCH);
  const started = Date.now();
  await conn.query(
    `INSERT INTO cultures (code, state) SELECT CONCAT('BLC-', LPAD(n, 3, '0')), 'released' FROM ${numbers(CULTURES)}`,
  );
  await conn.query(
    `INSERT INTO cook_runs (code, minutesAtPressure, gaugeKPa, altitudeM, cookedOn)
     SELECT CONCAT('BCR-', LPAD(n, 5, '0')), ELT(1 + n MOD 7, 45, 60, 90, 90, 90, 120, 150), 103.4, 0,
            DATE_SUB(?, INTERVAL FLOOR(n * ${JARS_PER_COOK_RUN} / ${JARS_PER_SESSION} / ${SESSIONS_PER_DAY}) + 1 DAY)
     FROM ${numbers(cookRuns)}`,
    [today],
  );
  await conn.query(
    `INSERT INTO inoculation_sessions (code, heldOn, operatorName, workspace)
     SELECT CONCAT('BS-', LPAD(n, 5, '0')), DATE_SUB(?, INTERVAL n DIV ${SESSIONS_PER_DAY} DAY),
            ELT(1 + n MOD 12, 'Ines Marlow', 'Tobin Reyes', 'Uma Castell', 'Viggo Lantz', 'Wren Odell', 'Yara Pell',
                'Zeno Hart', 'Alba Quist', 'Bo Ferrand', 'Cato Wilde', 'Dana Koss', 'Eli Varga'),
            ELT(1 + n MOD 3, 'still-air-box', 'flow-hood', 'open-bench')
     FROM ${numbers(sessions)}`,
    [today],
  );
  await conn.query(
    `INSERT INTO prep_batches (code, grainLotId, preparedOn) SELECT CONCAT('BPB-', LPAD(n, 4, '0')), 1, ? FROM ${numbers(prepBatches)}`,
    [today],
  );
  // Ids start at 1 in the fresh tables, so each jar's attributes follow from its number n.
  await conn.query(
    `INSERT INTO jars (label, grainId, prepBatchId, cookRunId, sessionId, cultureId, room, shelf, status, inoculatedAt, inoculatedOn, imported)
     SELECT CONCAT('BJ-', LPAD(n, 7, '0')), 1 + (n DIV ${JARS_PER_COOK_RUN}) MOD 7, 1 + n DIV ${JARS_PER_PREP_BATCH},
            1 + n DIV ${JARS_PER_COOK_RUN}, 1 + n DIV ${JARS_PER_SESSION}, 1 + (n DIV ${JARS_PER_SESSION} + n MOD 2) MOD ${CULTURES},
            ELT(1 + (n DIV ${JARS_PER_SESSION}) MOD 4, 'Room A', 'Room B', 'Room C', 'Room D'), CONCAT('S', n MOD 20),
            'colonised', TIMESTAMP(DATE_SUB(?, INTERVAL n DIV ${JARS_PER_SESSION * SESSIONS_PER_DAY} DAY), '12:00:00'),
            DATE_SUB(?, INTERVAL n DIV ${JARS_PER_SESSION * SESSIONS_PER_DAY} DAY), 1
     FROM ${numbers(JARS)}`,
    [today, today],
  );
  const step = Math.floor(JARS / INCIDENTS);
  await conn.query(
    `INSERT INTO incidents (foundAt, foundOn, foundByName, contaminant, status, verdict, imported, version)
     SELECT TIMESTAMP(DATE_ADD(j.inoculatedOn, INTERVAL 3 + j.id MOD 11 DAY), '12:00:00'),
            DATE_ADD(j.inoculatedOn, INTERVAL 3 + j.id MOD 11 DAY), 'Bench finder',
            ELT(1 + j.id MOD 9, 'bacterial', 'trichoderma', 'penicillium', 'aspergillus', 'pin-mould', 'neurospora', 'cobweb', 'yeast', 'unknown'),
            'closed', 'confirmed', 1, 1
     FROM jars j WHERE j.id MOD ${step} = 1 ORDER BY j.id LIMIT ${INCIDENTS}`,
  );
  await conn.query(
    `INSERT INTO incident_jars (incidentId, jarId)
     SELECT (j.id - 1) DIV ${step} + 1, j.id FROM jars j WHERE j.id MOD ${step} = 1 ORDER BY j.id LIMIT ${INCIDENTS}`,
  );
  await conn.query(`UPDATE jars j JOIN incident_jars ij ON ij.jarId = j.id SET j.status = 'contaminated'`);
  for (const t of [
    'jars',
    'incidents',
    'incident_jars',
    'cook_runs',
    'inoculation_sessions',
    'cultures',
    'prep_batches',
  ]) {
    await conn.query(`ANALYZE TABLE \`${t}\``);
  }
  const [[counts]] = (await conn.query(
    'SELECT (SELECT COUNT(*) FROM jars) AS jars, (SELECT COUNT(*) FROM incidents) AS incidents',
  )) as unknown as [[{ jars: number; incidents: number }]];
  log(
    `seeded ${counts.jars} jars and ${counts.incidents} incidents in ${((Date.now() - started) / 1000).toFixed(1)} s`,
  );
}

/** Signs in over HTTP as a browser would and returns the session cookie. */
async function signIn(base: string, username: string, password: string): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const first = csrfRes.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { token } = (await csrfRes.json()) as { token: string };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { cookie: first, 'content-type': 'application/json', 'x-csrf-token': token },
    body: JSON.stringify({ username, password }),
  });
  if (login.status !== 200) throw new Error(`bench sign-in answered ${login.status}`);
  return (
    login.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ') || first
  );
}

async function time(fn: () => Promise<unknown>): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

async function main() {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'asepta-bench-db-'));
  const db = await startMariaDb({ dataDir, port: await freePort(), database, ...dbUser, fast: true });
  Object.assign(process.env, {
    NODE_ENV: 'test',
    DB_HOST: '127.0.0.1',
    DB_PORT: String(db.port),
    DB_NAME: database,
    DB_USER: dbUser.user,
    DB_PASSWORD: dbUser.password,
    PASSWORD_HASH_ROUNDS: '4',
    // Errors only: a failed request's cause reaches the output beside the table.
    LOG_LEVEL: process.env.BENCH_LOG_LEVEL ?? 'error',
    SESSION_SECRET: 'bench-session-secret-0123456789',
  });
  // Imported after the environment is set: config() reads it once.
  const { dataSource } = await import('../server/db/data-source');
  const { createApp } = await import('../server/app');
  const { createSessionStore } = await import('../server/auth/session');
  const { createUser } = await import('../server/users/users.service');
  const { todayLocal } = await import('../server/core/local-time');
  const { frameFor } = await import('../server/analysis/analysis.service');
  const { ratesQuery, crosstabQuery, combinationsQuery } = await import('../server/analysis/analysis.repository');

  const store = createSessionStore();
  const conn = await mysql.createConnection({ host: '127.0.0.1', port: db.port, ...dbUser, database });
  let server: ReturnType<ReturnType<typeof createApp>['listen']> | undefined;
  try {
    await dataSource.initialize();
    await dataSource.runMigrations({ transaction: 'each' });
    const today = todayLocal();
    await seed(conn, today);
    if (process.env.BENCH_HOLD) {
      // For reading query plans by hand: the seeded server stays up until this process gets SIGINT.
      log(`holding: mariadb -h 127.0.0.1 -P ${db.port} -u ${dbUser.user} -p${dbUser.password} ${database}`);
      await new Promise((r) => process.once('SIGINT', r));
      return;
    }

    await createUser(
      { id: null, displayName: 'bench' },
      { username: 'bench', displayName: 'Bench Reader', email: '', role: 'supervisor', password: 'bench-password' },
    );
    const app = createApp({ sessionStore: store });
    server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server!.once('listening', r));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const cookie = await signIn(base, 'bench', 'bench-password');
    const get = async (url: string) => {
      const res = await fetch(`${base}${url}`, { headers: { cookie } });
      // Read the whole answer: the route's time includes sending every byte of it.
      const text = await res.text();
      if (res.status !== 200) throw new Error(`${url} answered ${res.status}: ${text.slice(0, 200)}`);
      return text.length;
    };

    const frame = await frameFor({}, today);
    const cases = [
      { name: 'rates (by=grain)', url: '/api/analysis/rates?by=grain', sql: ratesQuery('grain', frame) },
      { name: 'rates (by=operator)', url: '/api/analysis/rates?by=operator', sql: ratesQuery('operator', frame) },
      { name: 'rates (by=session)', url: '/api/analysis/rates?by=session', sql: ratesQuery('session', frame) },
      {
        name: 'crosstab (grain × cookMinutes)',
        url: '/api/analysis/crosstab?rows=grain&cols=cookMinutes',
        sql: crosstabQuery('grain', 'cookMinutes', frame),
      },
      {
        name: 'crosstab (operator × week)',
        url: '/api/analysis/crosstab?rows=operator&cols=week',
        sql: crosstabQuery('operator', 'week', frame),
      },
      {
        name: 'causes, a page (as the screen asks)',
        url: '/api/analysis/causes?page=1&pageSize=25&order=standing',
        sql: combinationsQuery(frame),
      },
      { name: 'causes, every row (CSV-sized)', url: '/api/analysis/causes', sql: combinationsQuery(frame) },
    ];

    const rows: string[][] = [];
    const loadBefore = loadAverage();
    for (const c of cases) {
      let size = 0;
      const route: number[] = [];
      const bare: number[] = [];
      for (let i = 0; i < RUNS + 2; i++) {
        // Alternate the two so that drift on the machine falls on both alike; the first two runs warm caches.
        const r = await time(async () => {
          size = await get(c.url);
        });
        const b = await time(() => conn.query(c.sql.sql, c.sql.params));
        if (i >= 2) {
          route.push(r);
          bare.push(b);
        }
      }
      const [m, s] = [median(route), median(bare)];
      rows.push([
        c.name,
        m.toFixed(1),
        percentile(route, 95).toFixed(1),
        s.toFixed(1),
        (m / s).toFixed(2),
        `${(size / 1024).toFixed(0)} KiB`,
      ]);
    }
    const header = ['endpoint', 'route median ms', 'route p95 ms', 'bare SQL median ms', 'ratio', 'answer size'];
    const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
    const line = (cells: string[]) =>
      cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
    log('');
    log(
      `${RUNS} runs each (after 2 warm-up runs); targets: rates and crosstab < 250 ms, causes < 1000 ms, ratio < 1.5, a causes page < 200 kB`,
    );
    log(
      `jars: ${JARS}; load average (1, 5, 15 min) before: ${loadBefore}; after: ${loadAverage()}; cores: ${os.cpus().length}`,
    );
    log(line(header));
    log(widths.map((w) => '-'.repeat(w)).join('  '));
    for (const r of rows) log(line(r));
  } finally {
    await new Promise((r) => (server ? server.close(r) : r(undefined)));
    await conn.end();
    await new Promise((r) => store.close().then(r, r));
    if (dataSource.isInitialized) await dataSource.destroy();
    await db.stop();
    rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exitCode = 1;
});
