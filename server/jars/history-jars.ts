import type { EntityManager } from 'typeorm';
import { jarsRepository } from './jars.repository';

/** A jar read from a history file: its links resolved to ids, its status worked out by the import. */
export interface HistoryJar {
  label: string;
  grainId: number;
  cookRunId: number;
  sessionId: number;
  cultureId: number;
  status: 'incubating' | 'colonised' | 'contaminated';
  inoculatedAt: Date;
  inoculatedOn: string;
  endedOn: string | null;
}

/** Labels of the list that a stored jar already carries (compared as the label column's collation does). */
export const storedJarLabels = async (m: EntityManager, labels: string[]): Promise<string[]> =>
  (await jarsRepository.findByLabels(m, labels)).map((j) => j.label);

/**
 * Writes imported jars, marked as imported, inside the caller's transaction through the jars
 * repository's bulk insert, and answers each one's id by label.
 */
export async function insertHistoryJars(m: EntityManager, rows: HistoryJar[]): Promise<Map<string, number>> {
  const ids = await jarsRepository.insertMany(
    m,
    rows.map((r) => ({ ...r, imported: true })),
  );
  return new Map(rows.map((r, i) => [r.label, ids[i]!]));
}
