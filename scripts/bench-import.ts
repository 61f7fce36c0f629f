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
import { historyColumns } from '../shared/schemas/imports';
import { database, dbUser, loadAverage, log } from './bench-config';
import { median } from './bench-table';
import { freePort } from './free-port';
import { startMariaDb } from './mariadb';

const ROWS = Number(process.env.BENCH_IMPORT_ROWS ?? 50_000);
const RUNS = Number(process.env.BENCH_IMPORT_RUNS ?? 3);

/** Every 25th jar contaminated; runs, sessions and cultures shared by many rows, as a lab's history has them. */
function historyFile(tag: string, rows: number): Buffer {
  const lines = [historyColumns.join(',')];
  for (let i = 0; i < rows; i += 1) {
    const day = String(1 + (i % 28)).padStart(2, '0');
    const bad = i % 25 === 0;
    lines.push(
      [
        `${tag}-${i}`,
        'rye',
        `${tag}-CR${i % 200}`,
        '90',
        `2026-02-${day}`,
        `${tag}-S${i % 28}-${Math.floor(i / 2000)}`,
        'Orla Vance',
        `${tag}-LC${i % 7}`,
        bad ? 'contaminated' : 'clean',
        bad ? 'yeast' : '',
        bad ? '2026-03-03' : '',
      ].join(','),
    );
  }
  return Buffer.from(lines.join('\n'));
}

async function main() {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'asepta-bench-import-'));
  const db = await startMariaDb({ dataDir, port: await freePort(), database, ...dbUser, fast: true });
  Object.assign(process.env, {
    NODE_ENV: 'test',
    DB_HOST: '127.0.0.1',
    DB_PORT: String(db.port),
    DB_NAME: database,
    DB_USER: dbUser.user,
    DB_PASSWORD: dbUser.password,
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
