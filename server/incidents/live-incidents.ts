/**
 * DESIGN.md §3: a jar is contaminated when it has an incident that is not voided and whose verdict is
 * not ruled out; a jar is settled when it is contaminated or was inoculated at least the observation
 * window before today. Every query that counts contaminated or settled jars builds on these fragments,
 * so the register, the mails, the training figures and the analysis never disagree.
 */

const COLUMN = /^[A-Za-z_][A-Za-z0-9_]*(\.[A-Za-z_][A-Za-z0-9_]*)?$/;

function checked(kind: string, sql: string): string {
  if (!COLUMN.test(sql)) throw new Error(`${kind} takes an alias or a column such as j.id, not ${sql}`);
  return sql;
}

/** The rule itself, on an incidents alias: `i` in `JOIN incidents i`. */
export function liveIncidentSql(incidentAlias: string): string {
  const i = checked('liveIncidentSql', incidentAlias);
  return `${i}.voided = 0 AND ${i}.verdict <> 'ruled-out'`;
}

/** The same rule on a loaded incident, for code that already holds the row. */
export function isLiveIncident(incident: { voided: boolean; verdict: string }): boolean {
  return !incident.voided && incident.verdict !== 'ruled-out';
}

/** Pairs (jarId, incidentId) of live incidents; a jar may appear once per incident. */
export const liveIncidentJarPairsSql = `SELECT live_ij.jarId AS jarId, live_ij.incidentId AS incidentId
  FROM incident_jars live_ij JOIN incidents live_i ON live_i.id = live_ij.incidentId WHERE ${liveIncidentSql('live_i')}`;

/** One row per contaminated jar (`jarId`). */
export function liveIncidentJarsSubquery(): string {
  return `SELECT DISTINCT live_ij.jarId AS jarId
    FROM incident_jars live_ij JOIN incidents live_i ON live_i.id = live_ij.incidentId WHERE ${liveIncidentSql('live_i')}`;
}

/**
 * One row per contaminated jar with the day (and moment) it was first found and that incident's
 * contaminant (`jarId`, `foundOn`, `foundAt`, `contaminant`): the earliest live incident gives them.
 * `jarFilter` chooses the jars, a condition on live_ij.jarId such as `live_ij.jarId IN (?, ?)`.
 */
export function contaminatedJarsAmong(jarFilter: string): string {
  return `SELECT live_ij.jarId, MIN(live_i.foundOn) AS foundOn, MIN(live_i.foundAt) AS foundAt,
    SUBSTRING(MIN(CONCAT(live_i.foundOn, live_i.contaminant)), 11) AS contaminant
  FROM incident_jars live_ij JOIN incidents live_i ON live_i.id = live_ij.incidentId
  WHERE ${liveIncidentSql('live_i')} ${jarFilter ? `AND ${jarFilter}` : ''} GROUP BY live_ij.jarId`;
}

/** `EXISTS (…)` for one jar, e.g. jarIsContaminatedSql('j.id'); pass a column expression, never user input. */
export function jarIsContaminatedSql(jarIdColumn: string): string {
  const col = checked('jarIsContaminatedSql', jarIdColumn);
  return `EXISTS (SELECT 1 FROM incident_jars live_ij JOIN incidents live_i ON live_i.id = live_ij.incidentId WHERE live_ij.jarId = ${col} AND ${liveIncidentSql('live_i')})`;
}

/**
 * Younger than the observation window: binds one parameter, the window start (today − window, a
 * local date). A young jar that is not contaminated is incubating, still at risk.
 */
export function jarIsYoungSql(inoculatedOnColumn: string): string {
  return `${checked('jarIsYoungSql', inoculatedOnColumn)} > ?`;
}

/** Settled: already lost, or old enough. Binds the window start once; `contaminated` is a SQL boolean. */
export function jarIsSettledSql(inoculatedOnColumn: string, contaminated: string): string {
  return `(${contaminated} OR NOT ${jarIsYoungSql(inoculatedOnColumn)})`;
}
