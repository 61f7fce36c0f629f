/**
 * A history file of 50,000 rows (2,000 of them contaminated) imported into a throwaway MariaDB, as a
 * supervisor's upload imports it: prints how long each run took; asserts nothing.
 * BENCH_IMPORT_ROWS (50000) and BENCH_IMPORT_RUNS (3) change the size and how many files are imported.
 *   PATH=/usr/sbin:$PATH npx tsx scripts/bench-import.ts
 */
import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { database, dbUser, loadAverage, log } from './bench-config';
import { median } from './bench-table';
import { freePort } from './free-port';
import { historyFile } from './history-file';
import { appDbEnv, startMariaDb } from './mariadb';

const ROWS = Number(process.env.BENCH_IMPORT_ROWS ?? 50_000);
const RUNS = Number(process.env.BENCH_IMPORT_RUNS ?? 3);

async function main() {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'asepta-bench-import-'));
  const db = await startMariaDb({ dataDir, port: await freePort(), database, ...dbUser, fast: true });
  Object.assign(process.env, {
    NODE_ENV: 'test',
    ...appDbEnv(db, database, dbUser),
    LOG_LEVEL: 'error',
    SESSION_SECRET: 'bench-session-secret-0123456789',
  });
  // Imported after the environment is set: config() reads it once.
  const { dataSource } = await import('../server/db/data-source');
  const { importHistory } = await import('../server/imports/imports.service');
  try {
    await dataSource.initialize();
    await dataSource.runMigrations({ transaction: 'each' });
    const actor = { id: null, displayName: 'Bench supervisor' };
    const times: number[] = [];
    // Wall time swings with what else the machine runs; the app's own CPU time is steadier.
    const cpuTimes: number[] = [];
    for (let run = 0; run < RUNS; run += 1) {
      const file = historyFile(`BI${run}`, ROWS);
      const t0 = performance.now();
      const cpu0 = process.cpuUsage();
      const outcome = await importHistory(actor, file);
      const ms = performance.now() - t0;
      const cpu = process.cpuUsage(cpu0);
      if (!outcome.ok) throw new Error(`the import was refused: ${JSON.stringify(outcome.errors.slice(0, 3))}`);
      times.push(ms);
      cpuTimes.push((cpu.user + cpu.system) / 1000);
      log(
        `import ${run + 1}: ${ROWS} rows, ${outcome.result.imported.incidents} incidents in ${(ms / 1000).toFixed(2)} s ` +
          `(this process's CPU ${(cpuTimes.at(-1)! / 1000).toFixed(2)} s)`,
      );
    }
    const seconds = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
    log(
      `median of ${RUNS}: ${seconds(median(times))}, this process's CPU ${seconds(median(cpuTimes))} ` +
        `(load average ${loadAverage()})`,
    );
  } finally {
    if (dataSource.isInitialized) await dataSource.destroy();
    await db.stop();
    rmSync(dataDir, { recursive: true, force: true });
  }
}

await main();
