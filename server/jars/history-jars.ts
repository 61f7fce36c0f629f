import type { EntityManager } from 'typeorm';
import { chunks, findByValues, insertChunk } from '../db/bulk';
import { Jar } from './jar.entity';

/** A jar read from a history file: its links resolved to ids, its status worked out by the import. */
export interface HistoryJar {
  label: string;
  grainId: number;
  cookRunId: number;
  sessionId: number;
  cultureId: number;
  status: 'incubating' | 'colonised' | 'contaminated';
  inoculatedAt: string;
  inoculatedOn: string;
  endedOn: string | null;
}

const columns = [
  'label',
  'grainId',
  'cookRunId',
  'sessionId',
  'cultureId',
  'status',
  'inoculatedAt',
  'inoculatedOn',
  'endedOn',
  'imported',
] as const;

const columnList = columns.map((c) => `\`${c}\``).join(', ');
const valuesSql = (rowCount: number) =>
  Array.from({ length: rowCount }, () => `(${columns.map(() => '?').join(', ')})`).join(', ');

/** Labels of the list that a stored jar already carries (compared as the label column's collation does). */
export const storedJarLabels = async (m: EntityManager, labels: string[]): Promise<string[]> =>
  (await findByValues(m, Jar, 'label', labels, { id: true, label: true })).map((j) => j.label);

/**
 * Writes imported jars, marked as imported, inside the caller's transaction and answers each one's id
 * by label. A raw multi-row INSERT … RETURNING: the ORM's per-entity path is far too slow for 50,000 rows.
 */
export async function insertHistoryJars(m: EntityManager, rows: HistoryJar[]): Promise<Map<string, number>> {
  const ids = new Map<string, number>();
  for (const chunk of chunks(rows, insertChunk)) {
    const params = chunk.flatMap((r) => [
      r.label,
      r.grainId,
      r.cookRunId,
      r.sessionId,
      r.cultureId,
      r.status,
      r.inoculatedAt,
      r.inoculatedOn,
      r.endedOn,
      true,
    ]);
    const returned = await m.query<{ id: number; label: string }[]>(
      `INSERT INTO \`jars\` (${columnList}) VALUES ${valuesSql(chunk.length)} RETURNING \`id\`, \`label\``,
      params,
    );
    for (const r of returned) ids.set(r.label, Number(r.id));
  }
  return ids;
}
