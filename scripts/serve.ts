import 'reflect-metadata';
import { config } from '../server/core/config';
import { installProcessGuards } from '../server/core/process-guards';
import { dataSource } from '../server/db/data-source';
import { startServer } from '../server/main';
import { loadDemoLab } from '../server/demo-lab/demo-lab';
import { startLocalDb } from './local-db';
import { startLocalMailFake } from './local-mail';

// npm start: the lab's own MariaDB → migrations → demo lab → app; Ctrl-C or SIGTERM stops all of it.
const c = config();
installProcessGuards();
const db = await startLocalDb();
const mail = await startLocalMailFake();
let stopping = false;
async function stop(code: number) {
  if (stopping) return;
  stopping = true;
  console.log('Stopping Asepta…');
  await running?.close().catch((e: unknown) => console.error(e));
  await mail?.stop();
  await db.stop();
  console.log('Stopped.');
  process.exit(code);
}
process.once('SIGINT', () => void stop(0));
process.once('SIGTERM', () => void stop(0));

let running: Awaited<ReturnType<typeof startServer>> | undefined;
try {
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  if (c.ASEPTA_DEMO) await loadDemoLab();
  running = await startServer({ migrate: false });
  console.log(`\nAsepta is ready at ${running.url}  (QR codes point at ${c.publicUrl})\n`);
} catch (err) {
  console.error(err);
  await stop(1);
}
