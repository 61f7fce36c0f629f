import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { config } from '../core/config';
import { entities } from './entities';
import { migrations } from './migrations';

const c = config();

/** The only DataSource. initialize() is called by entry points, never on import. */
export const dataSource = new DataSource({
  type: 'mariadb',
  host: c.DB_HOST,
  port: c.DB_PORT,
  username: c.DB_USER,
  password: c.DB_PASSWORD,
  database: c.DB_NAME,
  charset: 'utf8mb4_unicode_ci',
  timezone: 'Z',
  entities,
  migrations,
  synchronize: false,
  migrationsTransactionMode: 'each',
  extra: { connectionLimit: 10 },
});
