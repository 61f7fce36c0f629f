import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { freePort } from '../../scripts/free-port';
import { startMariaDb, type MariaDbHandle } from '../../scripts/mariadb';

export const testDbUser = { user: 'asepta_test', password: 'asepta-test-only' };

/** A MariaDB in a fresh temporary directory on a free port, removed again by stop(). */
export async function startThrowawayDb(database: string): Promise<MariaDbHandle & { dataDir: string }> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'asepta-test-db-'));
  const db = await startMariaDb({ dataDir, port: await freePort(), database, ...testDbUser, fast: true });
  return {
    ...db,
    dataDir,
    async stop() {
      await db.stop();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
