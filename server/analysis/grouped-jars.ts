import { dayKeys, grainKey, keyOn, levelKeys, type JarKey } from './tally-keys';

export interface Period {
  from?: string | undefined;
  to?: string | undefined;
}

/** What every counting query needs besides the period: today and the observation window, as local dates. */
export interface Frame extends Period {
  /** Jars inoculated after this local date are younger than the observation window. */
  windowStart: string;
  windowDays: number;
  edges: readonly number[];
}

export interface SqlQuery {
  sql: string;
  params: unknown[];
}

/** The period as conditions on a date column, joined by AND (none when the period is open). */
export function periodClauses(p: Period, column: string): { clauses: string[]; params: string[] } {
  const clauses: string[] = [];
  const params: string[] = [];
  if (p.from) {
    clauses.push(`${column} >= ?`);
    params.push(p.from);
  }
  if (p.to) {
    clauses.push(`${column} <= ?`);
    params.push(p.to);
  }
  return { clauses, params };
}

export function periodWhere(
  p: Period,
  extra: string[] = [],
  column = 'j.inoculatedOn',
): { where: string; params: string[] } {
  const { clauses, params } = periodClauses(p, column);
  const all = [...extra, ...clauses];
  return { where: all.length ? `WHERE ${all.join(' AND ')}` : '', params };
}

/** The counts' primary-key columns up to the jar's keys, in order (see TallyCount). */
const TALLY_KEY_ORDER =
  't.inoculatedOn, t.grainId, t.cookRunId, t.sessionId, t.cultureId, t.prepBatchId, t.room, t.transfers';

interface Source {
  table: string;
  keys: JarKey[];
  factor: string | null;
  /** A GROUP BY in the table's key order, when the question allows one. */
  keyOrder: string | null;
}

/** Where a question is answered: the one-factor roll-ups when it asks about one factor (and days), else the counts. */
function sourceFor(keys: JarKey[], byKeyOrder: boolean, withDetections: boolean): Source {
  const counts = { table: 'tally_counts', keys, factor: null, keyOrder: byKeyOrder ? TALLY_KEY_ORDER : null };
  const factors = keys.filter((k) => !dayKeys.has(k));
  const level =
    factors.length === 0 ? levelKeys.get(grainKey) : factors.length === 1 ? levelKeys.get(factors[0]!) : undefined;
  // Detections are kept per combination only, beside tally_counts.
  if (byKeyOrder || withDetections || !level) return counts;
  return {
    table: 'tally_levels',
    keys: keys.map((k) => (dayKeys.has(k) ? k : level.key)),
    factor: level.factor,
    // Levels alone: read level by level in the key's order (factor, levelId, room, day).
    keyOrder: factors.length === keys.length ? 't.levelId, t.room' : null,
  };
}

/**
 * The counts (server/tallies, kept current with every write) summed per key: jars, contaminated jars,
 * young jars (inoculated after the window start) and the contaminated among them; the caller sums them
 * per level with summedSql: incubating = young − contaminated young, settled = jars − incubating.
 * A question about one factor reads tally_levels; the rest, and every question `byKeyOrder`, read
 * tally_counts. `withDetections` adds rows from tally_detections whose `detections` list
 * days:contaminant:jars of the contaminated jars (and count nothing else), for the caller to concatenate.
 *
 * `byKeyOrder` groups in tally_counts' primary-key order instead, so MariaDB groups while it reads the
 * key with no temporary table; for keys that are (functions of) those columns the outer query then adds
 * up the finer groups.
 */
export function groupedJars(
  keys: JarKey[],
  f: Frame,
  { withDetections = false, byKeyOrder = false }: { withDetections?: boolean; byKeyOrder?: boolean } = {},
): SqlQuery {
  const source = sourceFor(keys, byKeyOrder, withDetections);
  const { where, params } = periodWhere(f, source.factor ? ['t.factor = ?'] : [], 't.inoculatedOn');
  const select = source.keys.map((k, i) => `${keyOn(k, 't')} AS k${i + 1}`).join(', ');
  const groupBy = source.keyOrder ?? keys.map((_, i) => `k${i + 1}`).join(', ');
  const counted = `SELECT ${select}, SUM(t.jars) AS jars, SUM(t.contaminated) AS contaminated,
        SUM(IF(t.inoculatedOn > ?, t.jars, 0)) AS young, SUM(IF(t.inoculatedOn > ?, t.contaminated, 0)) AS contaminatedYoung,
        NULL AS detections
      FROM ${source.table} t ${where} GROUP BY ${groupBy} HAVING SUM(t.jars) > 0`;
  const countedParams = [f.windowStart, f.windowStart, ...(source.factor ? [source.factor] : []), ...params];
  if (!withDetections) return { sql: counted, params: countedParams };
  const found = periodWhere(f, ['t.jars > 0'], 't.inoculatedOn');
  return {
    sql: `${counted}
      UNION ALL
      SELECT ${select}, 0, 0, 0, 0, GROUP_CONCAT(CONCAT(t.foundAfterDays, ':', t.contaminant, ':', t.jars))
      FROM tally_detections t ${found.where} GROUP BY ${groupBy}`,
    params: [...countedParams, ...found.params],
  };
}

/** Sums of the grouped counts per outer group. */
export const summedSql = `SUM(k.jars) AS jars, SUM(k.contaminated) AS contaminated,
  SUM(k.young) - SUM(k.contaminatedYoung) AS incubating,
  SUM(k.jars) - SUM(k.young) + SUM(k.contaminatedYoung) AS settled`;
