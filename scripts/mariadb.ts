import { spawn, execFile, type ChildProcess } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import mysql from 'mysql2/promise';

const run = promisify(execFile);

export interface MariaDbOptions {
  dataDir: string;
  port: number;
  database: string;
  user: string;
  password: string;
  /** Trades durability for speed: for throwaway test servers only. */
  fast?: boolean;
  log?: (line: string) => void;
}

export interface MariaDbHandle {
  port: number;
  socket: string;
  rootQuery(sql: string): Promise<void>;
  stop(): Promise<void>;
  /** SIGKILL, as a crash or an OOM killer would: no clean shutdown. */
  kill(): Promise<void>;
}

const isRoot = process.getuid?.() === 0;

/**
 * A temporary directory of this server's own: installs and servers started at the same moment
 * otherwise share /tmp and clash on their temporary table names.
 */
function privateTmp(dataDir: string): string {
  const dir = path.join(tmpdir(), `asepta-dbtmp-${createHash('sha1').update(dataDir).digest('hex').slice(0, 12)}`);
  mkdirSync(dir, { recursive: true });
  return dir;
}

async function initialise(dataDir: string) {
  mkdirSync(dataDir, { recursive: true });
  if (existsSync(path.join(dataDir, 'mysql'))) return;
  await run('mariadb-install-db', [
    // --no-defaults must come first.
    '--no-defaults',
    `--tmpdir=${privateTmp(dataDir)}`,
    `--datadir=${dataDir}`,
    '--auth-root-authentication-method=normal',
    '--skip-test-db',
    '--skip-name-resolve',
    ...(isRoot ? ['--user=root'] : []),
  ]);
}

function removeStalePid(pidFile: string) {
  if (!existsSync(pidFile)) return;
  const pid = Number(readFileSync(pidFile, 'utf8').trim());
  try {
    if (pid) process.kill(pid, 0);
    throw new Error(`A MariaDB server of ours (pid ${pid}) is still running on this data directory; stop it first.`);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'ESRCH') throw err;
    rmSync(pidFile, { force: true });
  }
}

async function waitForServer(child: ChildProcess, port: number, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`mariadbd exited with code ${child.exitCode} while starting`);
    try {
      const conn = await mysql.createConnection({ host: '127.0.0.1', port, user: 'root' });
      await conn.end();
      return;
    } catch {
      await new Promise((r) => setTimeout(r, 250));
    }
  }
  throw new Error(`mariadbd did not answer on 127.0.0.1:${port} within ${timeoutMs / 1000} s`);
}

/** Starts a private mariadbd on loopback: never a server that merely happens to be running. */
/** The app's DB_* settings for a database this script started: set them before the app's config is read. */
export function appDbEnv(db: Pick<MariaDbHandle, 'port'>, database: string, user: { user: string; password: string }) {
  return {
    DB_HOST: '127.0.0.1',
    DB_PORT: String(db.port),
    DB_NAME: database,
    DB_USER: user.user,
    DB_PASSWORD: user.password,
  };
}

export async function startMariaDb(opts: MariaDbOptions): Promise<MariaDbHandle> {
  const dataDir = path.resolve(opts.dataDir);
  await initialise(dataDir);
  const pidFile = path.join(dataDir, 'asepta-mariadbd.pid');
  removeStalePid(pidFile);
  // Unix socket paths are limited to ~100 bytes, and clones can live deep in the tree.
  const socket = path.join(tmpdir(), `asepta-db-${opts.port}.sock`);
  const args = [
    '--no-defaults',
    `--datadir=${dataDir}`,
    `--port=${opts.port}`,
    '--bind-address=127.0.0.1',
    `--socket=${socket}`,
    `--pid-file=${pidFile}`,
    `--tmpdir=${privateTmp(dataDir)}`,
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--skip-name-resolve',
    '--skip-log-bin',
    '--innodb-buffer-pool-size=256M',
    `--log-error=${path.join(dataDir, 'error.log')}`,
    ...(opts.fast ? ['--innodb-flush-log-at-trx-commit=0', '--innodb-doublewrite=0', '--sync-binlog=0'] : []),
    ...(isRoot ? ['--user=root'] : []),
  ];
  const child = spawn('mariadbd', args, { stdio: 'ignore' });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  await waitForServer(child, opts.port);

  const rootQuery = async (sql: string) => {
    const conn = await mysql.createConnection({
      host: '127.0.0.1',
      port: opts.port,
      user: 'root',
      multipleStatements: true,
    });
    try {
      await conn.query(sql);
    } finally {
      await conn.end();
    }
  };
  const user = mysql.escape(opts.user);
  const pass = mysql.escape(opts.password);
  await rootQuery(
    `CREATE DATABASE IF NOT EXISTS \`${opts.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;` +
      ['127.0.0.1', 'localhost']
        .map(
          (h) =>
            `CREATE USER IF NOT EXISTS ${user}@'${h}' IDENTIFIED BY ${pass}; GRANT ALL ON \`${opts.database}\`.* TO ${user}@'${h}';`,
        )
        .join(''),
  );
  opts.log?.(`MariaDB ${dataDir} on 127.0.0.1:${opts.port}`);

  return {
    port: opts.port,
    socket,
    rootQuery,
    async kill() {
      if (child.exitCode !== null) return;
      child.kill('SIGKILL');
      await exited;
    },
    async stop() {
      if (child.exitCode !== null) return;
      child.kill('SIGTERM');
      const timer = setTimeout(() => child.kill('SIGKILL'), 30_000);
      await exited;
      clearTimeout(timer);
    },
  };
}
