import 'reflect-metadata';
import { dataSource } from '../db/data-source';
import { rebuildTallies } from './tallies.service';

// npm run tallies:rebuild: recount every jar into the analysis counts, against the database named by the
// DB_* settings. Writers wait while it runs; readers keep the old counts until it commits.
await dataSource.initialize();
try {
  const started = Date.now();
  await rebuildTallies();
  const [row] = await dataSource.query<{ jars: string | number; rows: string | number }[]>(
    'SELECT (SELECT COUNT(*) FROM tallied_jars) AS jars, (SELECT COUNT(*) FROM tally_counts) AS `rows`',
  );
  console.log(
    `Counted ${Number(row?.jars ?? 0)} jars into ${Number(row?.rows ?? 0)} rows in ${((Date.now() - started) / 1000).toFixed(1)} s.`,
  );
} finally {
  await dataSource.destroy();
}
