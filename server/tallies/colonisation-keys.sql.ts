import { contaminatedJarsAmong } from '../incidents/live-incidents';
import type { JarChoice } from './jar-keys.sql';

/** tally_colonisation's primary key: each jar's grain, day, how its colonisation time ends, and the days. */
export const colonisationKeyList = '`grainId`, `inoculatedOn`, `ending`, `days`';

/**
 * How each chosen jar's time to colonisation ends (server/analysis/colonisation.ts reads it as Kaplan–Meier
 * times), for jars that can have one:
 * - `colonised` after `days`: colonised before it was found contaminated, if ever;
 * - `ended` after `days`: found contaminated (first live incident) or discarded or released uncolonised;
 * - `open`: still colonising, censored at today, so its days are worked out when read.
 * Imported jars are left out (imported history has no colonisation days, and leaving out only some of its
 * jars would bias the curve), and so are jars marked colonised or released without a day.
 */
export function colonisationKeysSql(jars: JarChoice): { sql: string; params: unknown[] } {
  const colonised = 'j.colonisedOn IS NOT NULL AND (cj.foundOn IS NULL OR j.colonisedOn <= cj.foundOn)';
  const ended = 'COALESCE(cj.foundOn, j.endedOn)';
  const sql = `SELECT j.id, j.grainId, j.inoculatedOn,
      CASE WHEN ${colonised} THEN 'colonised' WHEN ${ended} IS NOT NULL THEN 'ended' ELSE 'open' END,
      CASE WHEN ${colonised} THEN DATEDIFF(j.colonisedOn, j.inoculatedOn)
        WHEN ${ended} IS NOT NULL THEN DATEDIFF(${ended}, j.inoculatedOn) ELSE 0 END
    FROM jars j
    LEFT JOIN (${contaminatedJarsAmong(jars.on('live_ij.jarId'))}) cj ON cj.jarId = j.id
    WHERE ${jars.on('j.id')} AND j.imported = 0
      AND NOT (j.colonisedOn IS NULL AND j.status IN ('colonised', 'released'))`;
  return { sql, params: [...jars.params, ...jars.params] };
}

/** tallied_colonisation rows (those `where` chooses) summed into tally_colonisation rows, times `sign`. */
export function colonisationRollupSql(sign: 1 | -1, where: string): string {
  return `SELECT ${colonisationKeyList}, ${sign} * COUNT(*) FROM tallied_colonisation WHERE ${where}
    GROUP BY ${colonisationKeyList} ORDER BY ${colonisationKeyList}`;
}
