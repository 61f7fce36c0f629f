import type { Express } from 'express';
import {
  historyColumns,
  importRejectionSchema,
  importResultSchema,
  type ImportError,
} from '../../shared/schemas/imports';
import { dataSource } from '../../server/db/data-source';
import { bodyOf } from '../setup/bodies';
import { signedIn } from '../setup/factories';

export type Row = Record<(typeof historyColumns)[number], string>;

/** One clean rye jar; each test names its own labels and codes so files never clash. */
export function row(tag: string, n: number, over: Partial<Row> = {}): Row {
  return {
    jar_label: `${tag}-J${n}`,
    grain: 'rye',
    cook_run: `${tag}-CR`,
    cook_minutes: '90',
    inoculated_on: '2026-03-02',
    session: `${tag}-S`,
    operator: 'Orla Vance',
    culture: `${tag}-LC`,
    outcome: 'clean',
    contaminant: '',
    found_on: '',
    ...over,
  };
}

export const csv = (rows: Row[], eol = '\n') =>
  [historyColumns.join(','), ...rows.map((r) => historyColumns.map((c) => r[c]).join(','))].join(eol) + eol;

export const tables = [
  'jars',
  'incidents',
  'incident_jars',
  'cook_runs',
  'inoculation_sessions',
  'cultures',
  'audit_events',
];
export async function counts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const t of tables) {
    const [r] = await dataSource.query<{ n: string }[]>(`SELECT COUNT(*) AS n FROM \`${t}\``);
    out[t] = Number(r?.n);
  }
  return out;
}

/** A signed-in supervisor with a poster for the history file. */
export async function importingSupervisor(app: Express) {
  const client = await signedIn(app, 'supervisor');
  const post = (body: string | Buffer, type = 'text/csv') =>
    client.agent.post('/api/imports/history').set('X-CSRF-Token', client.token()).set('Content-Type', type).send(body);
  return { ...client, post };
}

export const errorsOf = (body: { errors: ImportError[] }) => body.errors.map((e) => `${e.line}:${e.column}`);

/** A refused import: every bad line and column, nothing written. */
export const rejectionOf = (res: { body: unknown }) => bodyOf(res, importRejectionSchema);

/** What an accepted import wrote. */
export const resultOf = (res: { body: unknown }) => bodyOf(res, importResultSchema);
