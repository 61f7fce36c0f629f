import 'reflect-metadata';
import { dataSource } from '../server/db/data-source';
import { loadDemoLab } from '../server/demo-lab/demo-lab';

// npm run seed: load the demo lab into a database that is already running (DB_* settings).
await dataSource.initialize();
await dataSource.runMigrations({ transaction: 'each' });
await loadDemoLab();
await dataSource.destroy();
