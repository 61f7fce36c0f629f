import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import bcrypt from 'bcryptjs';
import mysql from 'mysql2/promise';
import { freePort } from './free-port';
import { signInOverHttp, type HttpSession } from './http-session';
import { startMariaDb, type MariaDbHandle } from './mariadb';

// npm run faults: flag submissions in flight while the app (run 1) or MariaDB (run 2) is SIGKILLed
// and restarted; then MariaDB stopped for 20 s under load (run 3). Loopback only, bounded.
const submissions = 1000;
const dbUser = { user: 'asepta_faults', password: 'asepta-faults-only' };
const database = 'asepta_faults';
const dataDir = mkdtempSync(path.join(tmpdir(), 'asepta-faults-db-'));
const scratch = mkdtempSync(path.join(tmpdir(), 'asepta-faults-files-'));
const dbPort = await freePort();
const appPort = await freePort();
const base = `http://127.0.0.1:${appPort}`;

const startDb = () => startMariaDb({ dataDir, port: dbPort, database, ...dbUser });

function startApp(): Promise<ChildProcess> {
  // node itself with tsx's loader: the tsx wrapper would take the SIGKILL and leave the server running.
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      HOST: '127.0.0.1',
      PORT: String(appPort),
      DB_PORT: String(dbPort),
      DB_NAME: database,
      DB_USER: dbUser.user,
      DB_PASSWORD: dbUser.password,
      SESSION_SECRET: 'faults-session-secret-0123456789',
      UPLOAD_DIR: path.join(scratch, 'uploads'),
      MAIL_SINK_DIR: path.join(scratch, 'mail'),
      SMTP_PORT: '1',
      STATIC_DIR: path.join(scratch, 'no-client'),
    },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  createInterface({ input: child.stderr }).on('line', () => undefined);
  return waitHealthy().then(() => child);
}

async function waitHealthy(): Promise<number> {
  const from = Date.now();
  for (;;) {
    try {
      if ((await fetch(`${base}/api/health`)).status === 200) return (Date.now() - from) / 1000;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
}

async function seed(tag: string): Promise<string[]> {
  const conn = await mysql.createConnection({ host: '127.0.0.1', port: dbPort, ...dbUser, database });
  try {
    const [grains] = await conn.query<mysql.RowDataPacket[]>("SELECT id FROM grains WHERE name = 'rye'");
    const labels = Array.from({ length: submissions }, (_, i) => `F${tag}${String(i).padStart(5, '0')}`);
    await conn.query('INSERT INTO jars (label, grainId, inoculatedAt, inoculatedOn) VALUES ?', [
      labels.map((l) => [
        l,
        Number(grains[0]!.id),
        new Date(Date.now() - 3 * 86_400_000),
        new Date().toISOString().slice(0, 10),
      ]),
    ]);
    await conn.query(
      "INSERT IGNORE INTO users (username, displayName, email, role, passwordHash) VALUES ('faults', 'Fault Tester', '', 'technician', ?)",
      [bcrypt.hashSync('faults-password', 4)],
    );
    return labels;
  } finally {
    await conn.end();
  }
}

async function flag(session: HttpSession, label: string): Promise<number> {
  try {
    const res = await fetch(`${base}/api/incidents`, {
      method: 'POST',
      headers: { cookie: session.cookie, 'x-csrf-token': session.token, 'content-type': 'application/json' },
      body: JSON.stringify({
        jarLabels: [label],
        contaminant: 'trichoderma',
        severity: 'medium',
        stage: 'incubation',
        sealed: true,
        sterilisedBeforeDisposal: false,
      }),
    });
    await res.arrayBuffer();
    return res.status;
  } catch {
    return 0;
  }
}

async function countsByLabel(labels: string[]): Promise<Map<string, number>> {
  const conn = await mysql.createConnection({ host: '127.0.0.1', port: dbPort, ...dbUser, database });
  try {
    const [rows] = await conn.query<mysql.RowDataPacket[]>(
      'SELECT j.label, COUNT(*) AS n FROM incident_jars ij JOIN jars j ON j.id = ij.jarId JOIN incidents i ON i.id = ij.incidentId WHERE j.label IN (?) AND i.voided = 0 GROUP BY j.label',
      [labels],
    );
    return new Map(rows.map((r) => [r.label as string, Number(r.n)]));
  } finally {
    await conn.end();
  }
}

/** Fires every submission at once and, once `after` have been answered 201, runs `fault`. */
async function flagsThrough(tag: string, fault: () => Promise<void>): Promise<void> {
  const labels = await seed(tag);
  const session = await signInOverHttp(base, 'faults', 'faults-password');
  const answered201: string[] = [];
  const statuses = new Map<number, number>();
  let faulted: Promise<void> | undefined;
  await Promise.all(
    labels.map(async (label) => {
      const status = await flag(session, label);
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
      if (status === 201) answered201.push(label);
      if (answered201.length === 200 && !faulted) faulted = fault();
    }),
  );
  await faulted;
  await waitHealthy();
  const counts = await countsByLabel(labels);
  const missing = answered201.filter((l) => counts.get(l) !== 1);
  const twice = [...counts.values()].filter((n) => n > 1).length;
  const shown = [...statuses.entries()].sort(([a], [b]) => a - b).map(([s, n]) => `${s === 0 ? 'no answer' : s}: ${n}`);
  console.log(`  answers: ${shown.join(', ')}`);
  console.log(
    `  answered 201: ${answered201.length}; stored once: ${answered201.length - missing.length}; missing: ${missing.length}; stored twice: ${twice}`,
  );
  if (missing.length || twice) process.exitCode = 1;
}

let db: MariaDbHandle | undefined;
let app: ChildProcess | undefined;
try {
  db = await startDb();
  app = await startApp();

  console.log(`run 1: ${submissions} flag submissions in flight, the app SIGKILLed and restarted`);
  await flagsThrough('A', async () => {
    app!.kill('SIGKILL');
    await new Promise((r) => app!.once('exit', r));
    app = await startApp();
  });

  console.log(`run 2: ${submissions} flag submissions in flight, MariaDB SIGKILLed and restarted`);
  await flagsThrough('B', async () => {
    await db!.kill();
    db = await startDb();
  });
  console.log(`  the app ${app.exitCode === null ? 'kept running' : `exited (${app.exitCode})`}`);

  console.log('run 3: MariaDB stopped for 20 s under load');
  let load = true;
  const statuses = new Map<number, number>();
  const loader = (async () => {
    while (load) {
      let status = 0;
      try {
        const res = await fetch(`${base}/api/health`);
        status = res.status;
        await res.arrayBuffer();
      } catch {
        status = 0;
      }
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
    }
  })();
  await db.stop();
  await new Promise((r) => setTimeout(r, 20_000));
  db = await startDb();
  const healthyAfter = await waitHealthy();
  load = false;
  await loader;
  const shown = [...statuses.entries()].sort(([a], [b]) => a - b).map(([s, n]) => `${s === 0 ? 'no answer' : s}: ${n}`);
  console.log(`  health answers under load: ${shown.join(', ')}`);
  console.log(
    `  the app ${app.exitCode === null ? 'never exited' : `exited (${app.exitCode})`}; healthy ${healthyAfter.toFixed(1)} s after MariaDB was back`,
  );
  if (app.exitCode !== null || healthyAfter > 10 || statuses.has(0)) process.exitCode = 1;
} finally {
  app?.kill('SIGTERM');
  await db?.stop();
  rmSync(dataDir, { recursive: true, force: true });
  rmSync(scratch, { recursive: true, force: true });
}
