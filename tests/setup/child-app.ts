import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { freePort } from '../../scripts/free-port';

export interface ChildApp {
  url: string;
  child: ChildProcess;
  /** Resolves with the first log line (now or later) that matches; rejects if the app exits first. */
  waitForLog(match: (line: string) => boolean, what: string, capMs?: number): Promise<string>;
  stop(signal?: NodeJS.Signals): Promise<number | null>;
}

/**
 * `tsx server/main.ts` in its own process against the given MariaDB, logging JSON lines: for tests
 * that stop its database or kill it, which an app inside the test worker could not survive.
 */
export async function startChildApp(
  db: { port: number; database: string; user: string; password: string },
  extra: Record<string, string> = {},
): Promise<ChildApp> {
  const port = await freePort();
  const scratch = mkdtempSync(path.join(tmpdir(), 'asepta-child-'));
  const child = spawn(path.resolve('node_modules/.bin/tsx'), ['server/main.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      LOG_LEVEL: 'info',
      HOST: '127.0.0.1',
      PORT: String(port),
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      DB_HOST: '127.0.0.1',
      DB_PORT: String(db.port),
      DB_NAME: db.database,
      DB_USER: db.user,
      DB_PASSWORD: db.password,
      PASSWORD_HASH_ROUNDS: '4',
      SESSION_SECRET: 'child-app-session-secret-0123456789',
      UPLOAD_DIR: path.join(scratch, 'uploads'),
      MAIL_SINK_DIR: path.join(scratch, 'mail'),
      STATIC_DIR: path.join(scratch, 'no-client'),
      ...extra,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const lines: string[] = [];
  const waiters = new Set<{ match: (l: string) => boolean; resolve: (l: string) => void }>();
  for (const stream of [child.stdout, child.stderr]) {
    createInterface({ input: stream }).on('line', (line) => {
      lines.push(line);
      for (const w of waiters) {
        if (!w.match(line)) continue;
        waiters.delete(w);
        w.resolve(line);
      }
    });
  }
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));

  const waitForLog = (match: (l: string) => boolean, what: string, capMs = 60_000) =>
    new Promise<string>((resolve, reject) => {
      const seen = lines.find(match);
      if (seen) return resolve(seen);
      // The cap only turns a hang into a readable failure; the test waits on the line itself.
      const cap = setTimeout(
        () => reject(new Error(`no log line for ${what}:\n${lines.slice(-20).join('\n')}`)),
        capMs,
      );
      const waiter = {
        match,
        resolve: (l: string) => (clearTimeout(cap), resolve(l)),
      };
      waiters.add(waiter);
      void exited.then((code) => {
        if (!waiters.has(waiter)) return;
        clearTimeout(cap);
        reject(new Error(`the app exited (${code}) before ${what}:\n${lines.slice(-20).join('\n')}`));
      });
    });

  await waitForLog((l) => l.includes('Asepta is serving'), 'start-up');
  return {
    url: `http://127.0.0.1:${port}`,
    child,
    waitForLog,
    async stop(signal = 'SIGTERM') {
      if (child.exitCode === null) child.kill(signal);
      return exited;
    },
  };
}
