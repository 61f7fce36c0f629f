import { spawn } from 'node:child_process';
import { readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { SIZES, log } from './bench-config';
import { formatTable } from './bench-table';

/** Each size in a process of its own (the app's config and DataSource are read once per process); then how each figure grew. */
export async function runSizes(): Promise<void> {
  const results: Record<string, string>[] = [];
  for (const size of SIZES) {
    const resultFile = path.join(tmpdir(), `asepta-bench-${process.pid}-${size}.json`);
    const code = await new Promise<number | null>((resolve) => {
      const child = spawn(process.execPath, [...process.execArgv, process.argv[1]!], {
        stdio: 'inherit',
        env: { ...process.env, BENCH_SIZES: String(size), BENCH_INCIDENTS: '', BENCH_RESULT_FILE: resultFile },
      });
      child.once('exit', resolve);
    });
    if (code !== 0) throw new Error(`the bench at ${size} jars ended with ${code}`);
    results.push(JSON.parse(readFileSync(resultFile, 'utf8')) as Record<string, string>);
    rmSync(resultFile, { force: true });
  }
  const names = Object.keys(results[0]!);
  const first = SIZES[0]!;
  const last = SIZES.at(-1)!;
  log('');
  log(`How the median grew from ${first} to ${last} jars (the jars grew ${(last / first).toFixed(1)}×)`);
  const rows = names.map((n) => {
    const a = Number(results[0]![n]);
    const b = Number(results.at(-1)![n]);
    return [n, ...results.map((r) => r[n] ?? '-'), Number.isFinite(a) && a > 0 ? `${(b / a).toFixed(2)}×` : '-'];
  });
  for (const l of formatTable({ header: ['figure (median ms)', ...SIZES.map((s) => `${s} jars`), 'grew'], rows }))
    log(l);
}
