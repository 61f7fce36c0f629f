import type { EntityManager } from 'typeorm';
import type { Contaminant } from '../../shared/enums';
import { chunks, insertChunk } from '../db/bulk';
import { incidentsRepository } from './incidents.repository';

/** A contaminated jar of a history file: found, confirmed and closed long ago. */
export interface HistoryIncident {
  jarId: number;
  foundAt: Date;
  foundOn: string;
  foundById: number | null;
  foundByName: string;
  contaminant: Contaminant;
  createdById: number | null;
}

/**
 * Writes one closed, confirmed incident per imported contaminated jar, with its jar link, inside the
 * caller's transaction through the incidents repository's bulk insert; the ids come back in the rows'
 * order, which pairs each incident with its jar.
 */
export async function insertHistoryIncidents(m: EntityManager, rows: HistoryIncident[]): Promise<number> {
  const ids = await incidentsRepository.insertMany(
    m,
    rows.map(({ jarId: _jarId, ...r }) => ({
      ...r,
      stage: 'incubation',
      status: 'closed',
      verdict: 'confirmed',
      imported: true,
    })),
  );
  const links = rows.map((r, i) => ({ incidentId: ids[i]!, jarId: r.jarId }));
  for (const chunk of chunks(links, insertChunk)) await incidentsRepository.insertJarLinks(m, chunk);
  return rows.length;
}
