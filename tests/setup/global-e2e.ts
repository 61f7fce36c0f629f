import type { TestProject } from 'vitest/node';
import { freePort } from '../../scripts/free-port';
import { applyTestEnv } from './test-env';
import { startThrowawayDb } from './throwaway-db';

declare module 'vitest' {
  export interface ProvidedContext {
    appUrl: string;
  }
}

/** The built client and the real server over a throwaway MariaDB holding the demo lab. */
export default async function setup(project: TestProject) {
  const database = 'asepta_e2e';
  const db = await startThrowawayDb(database);
  const port = await freePort();
  applyTestEnv(db.port, database, { PORT: String(port), HOST: '127.0.0.1', PUBLIC_URL: `http://127.0.0.1:${port}` });
  const { dataSource } = await import('../../server/db/data-source');
  const { startServer } = await import('../../server/main');
  const { loadDemoLab } = await import('../../server/demo-lab/demo-lab');
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  await loadDemoLab(() => undefined);
  const running = await startServer({ migrate: false });
  project.provide('appUrl', running.url);
  return async () => {
    await running.close();
    await db.stop();
  };
}
