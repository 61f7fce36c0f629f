import { mkdtempSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/core/config';

const scratch = () => mkdtempSync(path.join(tmpdir(), 'asepta-config-'));

describe('session secret', () => {
  it('generates a long random secret once under the data folder and reuses it', () => {
    const file = path.join(scratch(), 'data', 'session-secret');
    const first = loadConfig({ SESSION_SECRET_FILE: file }).SESSION_SECRET;
    expect(first).toMatch(/^[A-Za-z0-9_-]{64}$/);
    expect(readFileSync(file, 'utf8').trim()).toBe(first);
    expect(statSync(file).mode & 0o077).toBe(0);
    expect(loadConfig({ SESSION_SECRET_FILE: file }).SESSION_SECRET).toBe(first);
    expect(loadConfig({ SESSION_SECRET_FILE: path.join(scratch(), 'other') }).SESSION_SECRET).not.toBe(first);
  });

  it.each(['asepta-development-session-secret', 'change-me-to-a-long-random-value'])(
    'refuses to start with the published value %s',
    (secret) => {
      expect(() => loadConfig({ SESSION_SECRET: secret })).toThrow(/SESSION_SECRET: .*published/);
    },
  );

  it('takes a secret given in the environment as it is', () => {
    expect(loadConfig({ SESSION_SECRET: 'a-lab-own-secret-0123456789' }).SESSION_SECRET).toBe(
      'a-lab-own-secret-0123456789',
    );
  });
});
