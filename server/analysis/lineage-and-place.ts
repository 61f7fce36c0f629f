import { contaminatedJarsSql } from '../incidents/live-incidents';

/** Deeper lineages than this are cut off: a guard against a cycle, far beyond any real transfer chain. */
const MAX_TRANSFERS = 64;

/**
 * DESIGN.md §3: a jar made from a parent jar counts for the culture at the root of its lineage, with
 * `transfers` grain-to-grain steps (capped at 2, shown `2+`); its room is where it stood when found
 * contaminated, or at the end of its observation window. Only transferred and moved jars differ from
 * their own columns, so this CTE lists just those (`placed`: jarId, rootCultureId, transfers, room) and
 * the counting queries correct the few rows they touch instead of joining every jar.
 *
 * The room at a moment is the room the first later move left (its fromRoom), or the jar's room now
 * when it has not moved since. A move at the very moment of finding counts as after it (quarantine).
 */
export function placedJarsCte(windowDays: number): string {
  if (!Number.isInteger(windowDays) || windowDays < 0) throw new Error('windowDays must be a whole number');
  return `WITH RECURSIVE lineage (jarId, ancestorId, depth) AS (
      SELECT id, parentJarId, 1 FROM jars WHERE parentJarId IS NOT NULL
      UNION ALL
      SELECT l.jarId, p.parentJarId, l.depth + 1 FROM lineage l JOIN jars p ON p.id = l.ancestorId
      WHERE p.parentJarId IS NOT NULL AND l.depth < ${MAX_TRANSFERS}
    ),
    placed AS (
      SELECT pj.id AS jarId, COALESCE(r.rootCultureId, pj.cultureId) AS rootCultureId,
        LEAST(COALESCE(r.depth, 0), 2) AS transfers,
        CASE WHEN EXISTS (SELECT 1 FROM jar_events pm WHERE pm.type = 'moved' AND pm.jarId = pj.id) THEN
          COALESCE((SELECT pm.fromRoom FROM jar_events pm
            WHERE pm.type = 'moved' AND pm.jarId = pj.id
              AND (CASE WHEN pc.jarId IS NOT NULL THEN pm.at >= pc.foundAt
                   ELSE pm.onDate > DATE_ADD(pj.inoculatedOn, INTERVAL ${windowDays} DAY) END)
            ORDER BY pm.at, pm.id LIMIT 1), pj.room)
        ELSE pj.room END AS room
      FROM (SELECT jarId FROM lineage WHERE depth = 1
            UNION SELECT jarId FROM jar_events WHERE type = 'moved') ps
      JOIN jars pj ON pj.id = ps.jarId
      LEFT JOIN (SELECT l.jarId, p.cultureId AS rootCultureId, l.depth FROM lineage l
                 JOIN jars p ON p.id = l.ancestorId WHERE p.parentJarId IS NULL) r ON r.jarId = pj.id
      LEFT JOIN (${contaminatedJarsSql}) pc ON pc.jarId = pj.id
    )`;
}

/** A grouping key read off the jar, and (for the factors above) its corrected value on `placed` alias sp. */
export interface JarKey {
  raw: string;
  placed?: string;
}

export const cultureKey: JarKey = { raw: 'j.cultureId', placed: 'sp.rootCultureId' };
export const transfersKey: JarKey = { raw: '0', placed: 'sp.transfers' };
export const roomKey: JarKey = { raw: 'j.room', placed: 'sp.room' };

/** The key as it stands for a jar joined (LEFT) to placed sp. */
export const keyOf = (k: JarKey) =>
  k.placed ? `CASE WHEN sp.jarId IS NULL THEN ${k.raw} ELSE ${k.placed} END` : k.raw;

/** `0`, `1`, `2+`: the level names of the transfers factor. */
export const transfersLevelSql = (ref: string) =>
  `CASE WHEN ${ref} IS NULL THEN NULL WHEN ${ref} >= 2 THEN '2+' ELSE CAST(${ref} AS CHAR) END`;
