import { dataSource } from '../../server/db/data-source';

/** Production record and incident register, each table after every table that points at it. */
const productionTables = [
  'tally_counts',
  'tally_detections',
  'tally_levels',
  'tallied_jars',
  'incident_jars',
  'incident_photos',
  'incident_step_links',
  'corrective_actions',
  'cluster_alerts',
  'incidents',
  'jar_events',
  'jars',
  'cook_run_readings',
  'cook_runs',
  'session_step_checks',
  'inoculation_sessions',
  'agar_tests',
  'cultures',
  'prep_batches',
  'grain_lots',
] as const;
type ProductionTable = (typeof productionTables)[number];

/**
 * Empties the production tables so a file's counts are exact. The foreign keys check row by row, so a
 * parent jar or culture deleted before its child would be refused: the self-references are cut first.
 */
export async function clearProduction(keep: readonly ProductionTable[] = []): Promise<void> {
  await dataSource.query('UPDATE `jars` SET `parentJarId` = NULL WHERE `parentJarId` IS NOT NULL');
  await dataSource.query('UPDATE `cultures` SET `parentCultureId` = NULL WHERE `parentCultureId` IS NOT NULL');
  for (const t of productionTables) if (!keep.includes(t)) await dataSource.query(`DELETE FROM \`${t}\``);
}
