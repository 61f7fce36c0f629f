import mysql from 'mysql2/promise';
import { afterAll, beforeAll, inject } from 'vitest';
import { applyTestEnv } from './test-env';
import { testDbUser } from './throwaway-db';

// Each worker gets its own database, so files running in parallel never see each other's rows.
const port = inject('dbPort');
const database = `asepta_test_${process.env.VITEST_POOL_ID ?? '1'}`;
applyTestEnv(port, database);

const root = await mysql.createConnection({ host: '127.0.0.1', port, user: 'root', multipleStatements: true });
await root.query(
  `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;` +
    ['127.0.0.1', 'localhost'].map((h) => `GRANT ALL ON \`${database}\`.* TO '${testDbUser.user}'@'${h}';`).join(''),
);
await root.end();

const { dataSource } = await import('../../server/db/data-source');

beforeAll(async () => {
  if (!dataSource.isInitialized) await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
});

afterAll(async () => {
  if (dataSource.isInitialized) await dataSource.destroy();
});
