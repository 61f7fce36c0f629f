import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startMailFake } from '../../scripts/mail-fake';

/** One SMTP fake for the run; every worker's app sends to it and tests read its sink. */
export default async function setup(project: TestProject) {
  const sinkDir = mkdtempSync(path.join(tmpdir(), 'asepta-test-mail-'));
  const fake = await startMailFake({ port: 0, sinkDir });
  // The e2e server starts in this process, so it reads the port from the environment.
  process.env.SMTP_HOST = '127.0.0.1';
  process.env.SMTP_PORT = String(fake.port);
  project.provide('mailSinkDir', sinkDir);
  project.provide('mailPort', fake.port);
  return async () => {
    await fake.stop();
    rmSync(sinkDir, { recursive: true, force: true });
  };
}
