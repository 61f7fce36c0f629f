import 'reflect-metadata';
import { dataSource } from '../db/data-source';
import { sendWeeklyDigest } from './digest.service';
import { closeMailTransport } from './mail-transport';

// npm run digest: send this week's digest now, against the database named by the DB_* settings.
await dataSource.initialize();
try {
  const result = await sendWeeklyDigest({ trigger: 'manual' });
  console.log(`Weekly digest for ${result.week}: ${result.sent} sent, ${result.failed} failed.`);
  process.exitCode = result.failed > 0 ? 1 : 0;
} finally {
  closeMailTransport();
  await dataSource.destroy();
}
