import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { testDbUser } from './throwaway-db';

/** Environment for an app under test; set before anything reads config(). */
export function applyTestEnv(port: number, database: string, extra: Record<string, string> = {}) {
  const scratch = mkdtempSync(path.join(tmpdir(), 'asepta-test-files-'));
  Object.assign(process.env, {
    NODE_ENV: 'test',
    // Fixed here: workers inherit the browser-test server's PORT and PUBLIC_URL from the main process.
    HOST: '127.0.0.1',
    PORT: '5180',
    PUBLIC_URL: 'http://127.0.0.1:5180',
    DB_HOST: '127.0.0.1',
    DB_PORT: String(port),
    DB_NAME: database,
    DB_USER: testDbUser.user,
    DB_PASSWORD: testDbUser.password,
    PASSWORD_HASH_ROUNDS: '4',
    LOG_LEVEL: 'silent',
    UPLOAD_DIR: path.join(scratch, 'uploads'),
    MAIL_SINK_DIR: path.join(scratch, 'mail'),
    SESSION_SECRET: 'test-session-secret-0123456789',
    ...extra,
  });
}
