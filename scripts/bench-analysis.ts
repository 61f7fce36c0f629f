/**
 * npm run bench: seeds invented production into a throwaway MariaDB and prints, for the analysis routes,
 * the route's median time beside the median of its SQL asked of the analysis counts directly; then every register's
 * pages and twenty readers at once. Prints figures; asserts nothing.
 *
 * BENCH_SIZES: jar counts, comma-separated, each up to 2,000,000, run one after the other with a table of
 * how each figure grew (default 200000 alone, about ten minutes; BENCH_SIZES=200000,1000000 takes an hour
 * or more on two cores). Incidents are 4 % of jars unless BENCH_INCIDENTS says otherwise. BENCH_DATA_DIR
 * keeps each size's seeded database there and reuses it next time (migrations still run).
 * BENCH_RUNS (20), BENCH_USERS (20), BENCH_CAUSES_WHOLE=0 skips the every-row causes CSV.
 */
import 'reflect-metadata';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import os, { tmpdir } from 'node:os';
import path from 'node:path';
import mysql from 'mysql2/promise';
import { freePort } from './free-port';
import { appDbEnv, startMariaDb } from './mariadb';
import { INCIDENTS, JARS, MAX_JARS, RUNS, SIZES, USERS, database, dbUser, loadAverage, log } from './bench-config';
import { benchConcurrent, benchRegisters, type Get } from './bench-registers';
import { seed } from './bench-seed';
import { exportCases, screenCases, type BenchCase } from './bench-cases';
import { runSizes } from './bench-sizes';
import { signIn } from './bench-sign-in';
import { formatTable, median, percentile } from './bench-table';

async function time(fn: () => Promise<unknown>): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

/** A data directory kept under BENCH_DATA_DIR is seeded once and reused by later runs of the same size. */
function dataDirFor(size: number): { dir: string; keep: boolean } {
  const root = process.env.BENCH_DATA_DIR;
  if (root) return { dir: path.resolve(root, `jars-${size}`), keep: true };
  return { dir: mkdtempSync(path.join(tmpdir(), 'asepta-bench-db-')), keep: false };
}

/** Each case's route and bare SQL, alternately, RUNS times after two warm-ups; a row of the table per case. */
async function measure(
  cases: BenchCase[],
  get: Get,
  conn: mysql.Connection,
  figures: Record<string, string>,
): Promise<string[][]> {
  const rows: string[][] = [];
  for (const c of cases) {
    let size = 0;
    const route: number[] = [];
    const bare: number[] = [];
    for (let i = 0; i < RUNS + 2; i++) {
      // Alternate the two so that drift on the machine falls on both alike; the first two runs warm caches.
      const r = await time(async () => {
        size = (await get(c.url)).size;
      });
      const b = c.sql ? await time(() => conn.query(c.sql!.sql, c.sql!.params)) : NaN;
      if (i >= 2) {
        route.push(r);
        bare.push(b);
      }
    }
    const [m, s] = [median(route), median(bare)];
    figures[c.name] = m.toFixed(1);
    rows.push([
      c.name,
      m.toFixed(1),
      percentile(route, 95).toFixed(1),
      c.sql ? s.toFixed(1) : '-',
      c.sql ? (m / s).toFixed(2) : '-',
      `${(size / 1024).toFixed(0)} KiB`,
    ]);
  }
  return rows;
}

async function main() {
  if (SIZES.length > 1) return runSizes();
  if (!(JARS > 0 && JARS <= MAX_JARS)) throw new Error(`BENCH_SIZES: each size must be from 1 to ${MAX_JARS}`);
  const { dir: dataDir, keep } = dataDirFor(JARS);
  const db = await startMariaDb({ dataDir, port: await freePort(), database, ...dbUser, fast: true });
  Object.assign(process.env, {
    NODE_ENV: 'test',
    ...appDbEnv(db, database, dbUser),
    PASSWORD_HASH_ROUNDS: '4',
    // Errors only: a failed request's cause reaches the output beside the table.
    LOG_LEVEL: process.env.BENCH_LOG_LEVEL ?? 'error',
    SESSION_SECRET: 'bench-session-secret-0123456789',
    // Twenty readers sign in at once from one address.
    LOGIN_ADDRESS_FAILURE_LIMIT: '1000',
  });
  // Imported after the environment is set: config() reads it once.
  const { dataSource } = await import('../server/db/data-source');
  const { createApp } = await import('../server/app');
  const { createSessionStore } = await import('../server/auth/session');
  const { createUser } = await import('../server/users/users.service');
  const { todayLocal } = await import('../server/core/local-time');
  const { frameFor } = await import('../server/analysis/analysis.service');
  const { rebuildTallies } = await import('../server/tallies/tallies.service');

  const store = createSessionStore();
  const conn = await mysql.createConnection({ host: '127.0.0.1', port: db.port, ...dbUser, database });
  let server: ReturnType<ReturnType<typeof createApp>['listen']> | undefined;
  try {
    await dataSource.initialize();
    const migrated = Date.now();
    await dataSource.runMigrations({ transaction: 'each' });
    log(`migrations: ${((Date.now() - migrated) / 1000).toFixed(1)} s`);
    const today = todayLocal();
    const count = async (table: string) =>
      Number(((await conn.query(`SELECT COUNT(*) AS n FROM \`${table}\``)) as unknown as [[{ n: number }]])[0][0].n);
    const held = await count('jars');
    if (held === 0) {
      const started = Date.now();
      await seed(conn, today, JARS, INCIDENTS);
      log(`seeded in ${((Date.now() - started) / 1000).toFixed(1)} s`);
      // The seed writes rows straight to the tables, beside the modules: count them as a rebuild would.
      const counted = Date.now();
      await rebuildTallies();
      log(`counted (tallies:rebuild) in ${((Date.now() - counted) / 1000).toFixed(1)} s`);
    } else if (held !== JARS) {
      throw new Error(`${dataDir} holds ${held} jars, not ${JARS}: remove it or choose another BENCH_DATA_DIR`);
    } else {
      log(`reusing the seeded data in ${dataDir}`);
    }
    log(
      `${await count('jars')} jars and ${await count('incidents')} incidents; the analysis counts hold ${await count('tally_counts')} rows`,
    );
    if (process.env.BENCH_HOLD) {
      // For reading query plans by hand: the seeded server stays up until this process gets SIGINT.
      log(`holding: mariadb -h 127.0.0.1 -P ${db.port} -u ${dbUser.user} -p${dbUser.password} ${database}`);
      await new Promise((r) => process.once('SIGINT', r));
      return;
    }

    const [benchUser] = (await conn.query("SELECT id FROM users WHERE username = 'bench'")) as unknown as [unknown[]];
    if (benchUser.length === 0) {
      await createUser(
        { id: null, displayName: 'bench' },
        { username: 'bench', displayName: 'Bench Reader', email: '', role: 'admin', password: 'bench-password' },
      );
    }
    const app = createApp({ sessionStore: store });
    server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server!.once('listening', r));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const cookie = await signIn(base, 'bench', 'bench-password');
    const get: Get = async (url, asCookie = cookie) => {
      const res = await fetch(`${base}${url}`, { headers: { cookie: asCookie } });
      // Read the whole answer: the route's time includes sending every byte of it.
      const body = await res.text();
      if (res.status !== 200) throw new Error(`${url} answered ${res.status}: ${body.slice(0, 200)}`);
      return { size: body.length, body };
    };

    const frame = await frameFor({}, today);
    const queries = await import('../server/analysis/analysis.queries');
    const figures: Record<string, string> = {};
    const loadBefore = loadAverage();
    const answers = await measure(screenCases(queries, frame, today), get, conn, figures);
    const files = await measure(exportCases(queries, frame), get, conn, figures);
    log('');
    log(
      `${RUNS} runs each (after 2 warm-up runs); targets at 1,000,000 jars: rates, crosstab and weekly < 150 ms, causes < 1.5 s, every answer < 300 kB`,
    );
    log(
      `jars: ${JARS}; incidents: ${INCIDENTS}; load average (1, 5, 15 min) before: ${loadBefore}; after: ${loadAverage()}; cores: ${os.cpus().length}`,
    );
    log('tally SQL: the same question asked of the analysis counts directly (the SQL behind the route)');
    const header = ['endpoint', 'route median ms', 'route p95 ms', 'tally SQL median ms', 'ratio', 'answer size'];
    for (const l of formatTable({ header, rows: answers })) log(l);
    log('');
    log('CSV exports: every level or row, a file to download (no page)');
    for (const l of formatTable({ header, rows: files })) log(l);

    const registers = await benchRegisters(get, RUNS);
    for (const r of registers.rows) figures[r[0]!] = r[3]!;
    log('');
    log(`Register pages at ${JARS} jars (${RUNS} runs each); target: each page < 50 ms with its total`);
    for (const l of formatTable(registers)) log(l);

    const cookies = [];
    for (let i = 0; i < USERS; i++) cookies.push(await signIn(base, 'bench', 'bench-password'));
    const together = await benchConcurrent(get, cookies, 10, [
      { name: 'jar register, pages 1–40', url: (i) => `/api/jars?page=${1 + (i % 40)}&pageSize=25` },
      { name: 'weekly table', url: () => '/api/analysis/weekly' },
    ]);
    for (const r of together.rows) figures[`${r[0]!} at once (p97.5)`] = r[4]!;
    log('');
    log(`${USERS} readers at once, 10 requests each; target: p97.5 < 300 ms, no errors`);
    for (const l of formatTable(together)) log(l);
    if (process.env.BENCH_RESULT_FILE) writeFileSync(process.env.BENCH_RESULT_FILE, JSON.stringify(figures));
  } finally {
    await new Promise((r) => (server ? server.close(r) : r(undefined)));
    await conn.end();
    await new Promise((r) => store.close().then(r, r));
    if (dataSource.isInitialized) await dataSource.destroy();
    await db.stop();
    if (!keep) rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exitCode = 1;
});
