// The bench's sizes and settings, read once from the environment (see bench-analysis.ts).
import os from 'node:os';

export const SIZES = (process.env.BENCH_SIZES ?? process.env.BENCH_JARS ?? '200000').split(',').map(Number);
export const JARS = SIZES[0]!;
// 4 % of jars contaminated: 8,000 incidents at 200,000 jars, 40,000 at 1,000,000.
export const INCIDENTS = Number(process.env.BENCH_INCIDENTS || Math.round(JARS * 0.04));
export const RUNS = Number(process.env.BENCH_RUNS ?? 20);
export const USERS = Number(process.env.BENCH_USERS ?? 20);
export const MAX_JARS = 2_000_000;

export const database = 'asepta_bench';
export const dbUser = { user: 'asepta_bench', password: 'asepta-bench-only' };

export const log = (line: string) => process.stdout.write(`${line}\n`);
export const loadAverage = () =>
  os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(', ');
