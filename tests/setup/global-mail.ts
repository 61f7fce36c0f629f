import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createInterface } from 'node:readline';
import type { TestProject } from 'vitest/node';

/** Starts the SMTP fake in its own process and answers its port once it listens. */
function startMailFakeProcess(sinkDir: string) {
  const child = spawn(path.resolve('node_modules/.bin/tsx'), ['tests/setup/mail-fake-process.ts', sinkDir], {
    stdio: ['pipe', 'pipe', 'inherit'],
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const port = new Promise<number>((resolve, reject) => {
    createInterface({ input: child.stdout }).once('line', (line) =>
      resolve((JSON.parse(line) as { port: number }).port),
    );
    void exited.then(() => reject(new Error('the mail fake exited before it listened')));
  });
  return {
    port,
    async stop() {
      if (child.exitCode === null) child.kill('SIGTERM');
      await exited;
    },
  };
}

/** One SMTP fake for the run; every worker's app sends to it and tests read its sink. */
export default async function setup(project: TestProject) {
  const sinkDir = mkdtempSync(path.join(tmpdir(), 'asepta-test-mail-'));
  const fake = startMailFakeProcess(sinkDir);
  const port = await fake.port;
  // The e2e server starts in this process, so it reads the port from the environment.
  process.env.SMTP_HOST = '127.0.0.1';
  process.env.SMTP_PORT = String(port);
  project.provide('mailSinkDir', sinkDir);
  project.provide('mailPort', port);
  return async () => {
    await fake.stop();
    rmSync(sinkDir, { recursive: true, force: true });
  };
}
