import type { Express } from 'express';
import pmf from '@stdlib/stats-base-dists-hypergeometric-pmf';
import { expect } from 'vitest';
import type { Factor } from '../../shared/enums';
import { localDate } from '../../server/core/local-time';
import { signedIn } from '../setup/factories';
import {
  clearProduction,
  historyCsv,
  isoWeekLabel,
  plantedHistory,
  recentJars,
  type HistoryJar,
} from './analysis-planted.fixture';
import { resultOf } from './imports.fixtures';

export const today = localDate(new Date());
export const RECENT_DAYS_AGO = 3;
export const RECENT_CLEAN = 10;
export const history = plantedHistory();
const recent = recentJars(today, RECENT_DAYS_AGO, RECENT_CLEAN);
export const all = [...history, ...recent];
const WINDOW_DAYS = 21;

const daysOld = (j: HistoryJar) =>
  Math.round((Date.parse(`${today}T00:00:00Z`) - Date.parse(`${j.inoculatedOn}T00:00:00Z`)) / 86_400_000);
export const isIncubating = (j: HistoryJar) => !j.contaminant && daysOld(j) < WINDOW_DAYS;
export const bucket = (m: number) =>
  m < 60 ? '<60' : m < 90 ? '60-89' : m < 120 ? '90-119' : m < 180 ? '120-179' : '180+';

/** The level of each factor an imported jar records; imported history has no prep batch, workspace or room. */
export const levelOf: Partial<Record<Factor, (j: HistoryJar) => string>> = {
  grain: (j) => j.grain,
  cookRun: (j) => j.cookRun,
  cookMinutes: (j) => bucket(j.cookMinutes),
  session: (j) => j.session,
  operator: (j) => j.operator,
  culture: (j) => j.culture,
  week: (j) => isoWeekLabel(j.inoculatedOn),
};

export function countBy(jars: HistoryJar[], key: (j: HistoryJar) => string) {
  const out = new Map<string, { jars: number; contaminated: number; incubating: number }>();
  for (const j of jars) {
    const t = out.get(key(j)) ?? { jars: 0, contaminated: 0, incubating: 0 };
    t.jars++;
    if (j.contaminant) t.contaminated++;
    if (isIncubating(j)) t.incubating++;
    out.set(key(j), t);
  }
  return out;
}

/**
 * Fisher's exact test, two-sided (Fisher, The Design of Experiments, 1935; Agresti, Categorical Data
 * Analysis, 2002, §3.5): the sum of hypergeometric probabilities of every table with the observed margins
 * no likelier than the observed one, with R's relative tolerance 1 + 1e-7. Summed by brute force over
 * the whole support with @stdlib's pmf, independently of shared/stats/fisher.ts.
 */
export function bruteFisher(a: number, b: number, c: number, d: number): number {
  const N = a + b + c + d;
  const K = a + b;
  const n = a + c;
  const observed = pmf(a, N, K, n);
  let p = 0;
  for (let x = Math.max(0, n - (N - K)); x <= Math.min(K, n); x++) {
    const px = pmf(x, N, K, n);
    if (px <= observed * (1 + 1e-7)) p += px;
  }
  return Math.min(1, p);
}

/** Katz et al., Biometrics 34:469–474 (1978): log-method interval, 0.5 added to every cell when one is zero. */
export function katz(a: number, n1: number, c: number, n2: number) {
  const zero = [a, n1 - a, c, n2 - c].includes(0) ? 0.5 : 0;
  const [x1, m1, x2, m2] = [a + zero, n1 + 2 * zero, c + zero, n2 + 2 * zero];
  const rr = x1 / m1 / (x2 / m2);
  const se = Math.sqrt(1 / x1 - 1 / m1 + 1 / x2 - 1 / m2);
  return { rr, lo: rr * Math.exp(-1.959963984540054 * se), hi: rr * Math.exp(1.959963984540054 * se) };
}

export const expectClose = (actual: number, expected: number, rel = 1e-9) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.max(Math.abs(expected), 1e-300));

/** Clears production, imports the planted history as a supervisor and signs a technician in to read it. */
export async function plantHistory(app: Express) {
  await clearProduction();
  const supervisor = await signedIn(app, 'supervisor');
  const res = await supervisor.agent
    .post('/api/imports/history')
    .set('X-CSRF-Token', supervisor.token())
    .set('Content-Type', 'text/csv')
    .send(historyCsv(all));
  if (res.status !== 200) throw new Error(`import failed: ${JSON.stringify(res.body).slice(0, 500)}`);
  const { imported } = resultOf(res);
  const reader = await signedIn(app, 'technician');
  return { imported, reader };
}
