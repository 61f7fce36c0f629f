import { contaminatedJarsAmong } from '../incidents/live-incidents';

/** Deeper lineages than this are cut off: a guard against a cycle, far beyond any real transfer chain. */
const MAX_TRANSFERS = 64;

/** The combination a jar is counted under: tally_counts' primary key. */
const comboKeyColumns = [
  'inoculatedOn',
  'grainId',
  'cookRunId',
  'sessionId',
  'cultureId',
  'prepBatchId',
  'room',
  'transfers',
] as const;

/** The columns a jar is counted under (tallied_jars): its combination, then how it was found. */
const tallyKeyColumns = [...comboKeyColumns, 'contaminated', 'foundAfterDays', 'contaminant'] as const;

/** The one-factor roll-ups kept in tally_levels: the factor's name there, and its column of tallied_jars. */
export const tallyLevelFactors = [
  ['grain', 'grainId'],
  ['cookRun', 'cookRunId'],
  ['session', 'sessionId'],
  ['culture', 'cultureId'],
  ['prepBatch', 'prepBatchId'],
  ['room', 'room'],
  ['transfers', 'transfers'],
] as const;

export type TallyLevelFactor = (typeof tallyLevelFactors)[number][0];

/** tallied_jars rows (those `where` chooses) summed per day and factor level, as tally_levels rows times `sign`. */
export function levelRollupSql(sign: 1 | -1, where: string): string {
  return tallyLevelFactors
    .map(
      ([factor, column]) =>
        `SELECT '${factor}', inoculatedOn, ${column === 'room' ? '0' : column}, ${column === 'room' ? 'room' : "''"},
          ${sign} * COUNT(*), ${sign} * SUM(contaminated)
        FROM tallied_jars WHERE ${where} GROUP BY inoculatedOn, ${column}`,
    )
    .join(' UNION ALL ');
}

const listOf = (columns: readonly string[]) => columns.map((c) => `\`${c}\``).join(', ');

export const tallyKeyList = listOf(tallyKeyColumns);

/** tally_counts' primary key: the combination of every factor's key, per day. */
export const comboKeyList = listOf(comboKeyColumns);

/** tally_detections' primary key: the combination, then days to finding and the contaminant. */
export const detectionKeyList = listOf([...comboKeyColumns, 'foundAfterDays', 'contaminant']);

export interface JarChoice {
  /** A condition on a jar-id column (`1` for every jar). */
  on: (column: string) => string;
  /** Its parameters, bound once per use of `on`. */
  params: unknown[];
}

export const everyJar: JarChoice = { on: () => '1', params: [] };

export function theseJars(ids: readonly number[]): JarChoice {
  // An empty list would read as every jar.
  if (ids.length === 0) throw new Error('theseJars takes at least one jar id');
  if (!ids.every((id) => Number.isSafeInteger(id) && id > 0)) throw new Error('jar ids must be positive integers');
  const marks = ids.map(() => '?').join(', ');
  return { on: (column) => `${column} IN (${marks})`, params: [...ids] };
}

/**
 * Each chosen jar's keys (tallyKeyColumns, after `jarId`), by DESIGN.md §3:
 * - a jar made from a parent jar counts for the culture at the root of its lineage, with `transfers`
 *   grain-to-grain steps (capped at 2);
 * - its room is where it stood when found contaminated, or at the end of its observation window: the room
 *   the first later move left (its fromRoom), or its room now when it has not moved since. A move at the
 *   very moment of finding counts as after it (quarantine);
 * - contaminated is a live incident on it (server/incidents/live-incidents.ts), found after
 *   `foundAfterDays` with the first incident's contaminant.
 * Missing keys are 0 or '' (see TallyCount).
 */
export function jarKeysSql(windowDays: number, jars: JarChoice): { sql: string; params: unknown[] } {
  if (!Number.isInteger(windowDays) || windowDays < 0) throw new Error('windowDays must be a whole number');
  const sql = `WITH RECURSIVE lineage (jarId, ancestorId, depth) AS (
      SELECT id, parentJarId, 1 FROM jars WHERE parentJarId IS NOT NULL AND ${jars.on('id')}
      UNION ALL
      SELECT l.jarId, p.parentJarId, l.depth + 1 FROM lineage l JOIN jars p ON p.id = l.ancestorId
      WHERE p.parentJarId IS NOT NULL AND l.depth < ${MAX_TRANSFERS}
    ),
    roots AS (
      SELECT l.jarId, p.cultureId AS rootCultureId, l.depth FROM lineage l
      JOIN jars p ON p.id = l.ancestorId WHERE p.parentJarId IS NULL
    )
    SELECT j.id AS jarId, j.inoculatedOn, j.grainId, COALESCE(j.cookRunId, 0), COALESCE(j.sessionId, 0),
      COALESCE(r.rootCultureId, j.cultureId, 0), COALESCE(j.prepBatchId, 0),
      COALESCE(CASE WHEN EXISTS (SELECT 1 FROM jar_events pm WHERE pm.type = 'moved' AND pm.jarId = j.id) THEN
        COALESCE((SELECT pm.fromRoom FROM jar_events pm
          WHERE pm.type = 'moved' AND pm.jarId = j.id
            AND (CASE WHEN cj.jarId IS NOT NULL THEN pm.at >= cj.foundAt
                 ELSE pm.onDate > DATE_ADD(j.inoculatedOn, INTERVAL ${windowDays} DAY) END)
          ORDER BY pm.at, pm.id LIMIT 1), j.room)
      ELSE j.room END, ''),
      LEAST(COALESCE(r.depth, 0), 2),
      cj.jarId IS NOT NULL,
      COALESCE(DATEDIFF(cj.foundOn, j.inoculatedOn), 0),
      COALESCE(cj.contaminant, '')
    FROM jars j
    LEFT JOIN roots r ON r.jarId = j.id
    LEFT JOIN (${contaminatedJarsAmong(jars.on('live_ij.jarId'))}) cj ON cj.jarId = j.id
    WHERE ${jars.on('j.id')}`;
  // `on` is used three times above: in the lineage, the contaminated jars and the jars themselves.
  return { sql, params: [...jars.params, ...jars.params, ...jars.params] };
}
