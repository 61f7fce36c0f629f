import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/** Values printed in this repository's files: anyone could sign a session cookie with them. */
export const publishedSecrets = ['asepta-development-session-secret', 'change-me-to-a-long-random-value'];

const readSecret = (file: string) => readFileSync(file, 'utf8').trim();

/**
 * The secret kept in `file`, made on first use: 48 random bytes, readable by the owner only, so
 * sessions survive restarts without anyone choosing (or publishing) a secret.
 */
export function readOrCreateSecret(file: string): string {
  try {
    return readSecret(file);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err;
  }
  mkdirSync(path.dirname(file), { recursive: true });
  try {
    // 'wx': when two processes start at once, the second reads the first one's secret.
    writeFileSync(file, `${randomBytes(48).toString('base64url')}\n`, { mode: 0o600, flag: 'wx' });
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
  }
  return readSecret(file);
}
