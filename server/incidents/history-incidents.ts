import type { EntityManager } from 'typeorm';
import { chunks, insertChunk } from '../db/bulk';

/** A contaminated jar of a history file: found, confirmed and closed long ago. */
export interface HistoryIncident {
  jarId: number;
  foundAt: string;
  foundOn: string;
  foundById: number | null;
  foundByName: string;
  contaminant: string;
  createdById: number | null;
}

const columns = [
  'foundAt',
  'foundOn',
  'foundById',
  'foundByName',
  'stage',
  'contaminant',
  'status',
  'verdict',
  'imported',
  'createdById',
  'version',
] as const;

const columnList = columns.map((c) => `\`${c}\``).join(', ');
const valuesSql = (columnCount: number, rowCount: number) =>
  Array.from({ length: rowCount }, () => `(${Array.from({ length: columnCount }, () => '?').join(', ')})`).join(', ');

/**
 * Writes one closed, confirmed incident per imported contaminated jar, with its jar link, inside the
 * caller's transaction. RETURNING lists the rows in VALUES order, which pairs each incident with its jar.
 */
export async function insertHistoryIncidents(m: EntityManager, rows: HistoryIncident[]): Promise<number> {
  for (const chunk of chunks(rows, insertChunk)) {
    const params = chunk.flatMap((r) => [
      r.foundAt,
      r.foundOn,
      r.foundById,
      r.foundByName,
      'incubation',
      r.contaminant,
      'closed',
      'confirmed',
      true,
      r.createdById,
      1,
    ]);
    const returned = await m.query<{ id: number }[]>(
      `INSERT INTO \`incidents\` (${columnList}) VALUES ${valuesSql(columns.length, chunk.length)} RETURNING \`id\``,
      params,
    );
    if (returned.length !== chunk.length) throw new Error('incident insert returned a different number of rows');
    await m.query(
      `INSERT INTO \`incident_jars\` (\`incidentId\`, \`jarId\`) VALUES ${valuesSql(2, chunk.length)}`,
      chunk.flatMap((r, i) => [Number(returned[i]!.id), r.jarId]),
    );
  }
  return rows.length;
}
