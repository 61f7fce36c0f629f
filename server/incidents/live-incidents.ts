/**
 * DESIGN.md §3: a jar is contaminated when it has an incident that is not voided and whose
 * verdict is not ruled out. Every query that counts contaminated jars uses these fragments,
 * so the register and the analysis never disagree. The aliases are unusual on purpose, so they
 * do not collide with the caller's.
 */
export function liveIncidentJarsSubquery(): string {
  return "SELECT live_ij.jarId FROM incident_jars live_ij JOIN incidents live_i ON live_i.id = live_ij.incidentId WHERE live_i.voided = 0 AND live_i.verdict <> 'ruled-out'";
}

/** `EXISTS (…)` for one jar, e.g. jarIsContaminatedSql('j.id'); pass a column expression, never user input. */
export function jarIsContaminatedSql(jarIdColumn: string): string {
  if (!/^[A-Za-z_][A-Za-z0-9_]*(\.[A-Za-z_][A-Za-z0-9_]*)?$/.test(jarIdColumn)) {
    throw new Error(`jarIsContaminatedSql takes a column such as j.id, not ${jarIdColumn}`);
  }
  return `EXISTS (SELECT 1 FROM incident_jars live_ij JOIN incidents live_i ON live_i.id = live_ij.incidentId WHERE live_ij.jarId = ${jarIdColumn} AND live_i.voided = 0 AND live_i.verdict <> 'ruled-out')`;
}
