import { contaminatedJarsSql, jarIsYoungSql } from '../incidents/live-incidents';
import { keyOf, placedJarsCte, type JarKey } from './lineage-and-place';

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

/** A query over grouped jars: `cte` (no parameters) must open the statement that wraps `sql`. */
export interface GroupedQuery extends SqlQuery {
  cte: string;
}

export function periodWhere(p: Period, extra: string[] = []): { where: string; params: string[] } {
  const clauses = [...extra];
  const params: string[] = [];
  if (p.from) {
    clauses.push('j.inoculatedOn >= ?');
    params.push(p.from);
  }
  if (p.to) {
    clauses.push('j.inoculatedOn <= ?');
    params.push(p.to);
  }
  return { where: clauses.length ? `WHERE ${clauses.join(' AND ')}` : '', params };
}

/**
 * Jars grouped on their own key columns in set-based parts: every jar (read from the covering analysis
 * index, never the rows), the transferred and moved jars taken out of their own columns' groups and put
 * into their corrected ones (only when a key needs it), and the few contaminated jars, grouped on their
 * corrected keys at once. The caller sums the parts per level: incubating = young − contaminated young,
 * settled = jars − incubating. `detections` lists days:contaminant of contaminated jars.
 *
 * `jarGroupBy` replaces the grouping of the every-jar part: columns in the analysis index's own order
 * let MariaDB group while it reads the index, with no temporary table, when the keys are (functions
 * of) exactly those columns; the outer query then adds up the finer groups.
 */
export function groupedJars(
  keys: JarKey[],
  f: Frame,
  { withDetections = false, jarGroupBy }: { withDetections?: boolean; jarGroupBy?: string } = {},
): GroupedQuery {
  const { where, params } = periodWhere(f);
  const placed = keys.some((k) => k.placed);
  const select = (expr: (k: JarKey) => string) => keys.map((k, i) => `${expr(k)} AS k${i + 1}`).join(', ');
  const groupList = keys.map((_, i) => `k${i + 1}`).join(', ');
  const young = `SUM(${jarIsYoungSql('j.inoculatedOn')})`;
  const bound = [f.windowStart, ...params];
  const detections = withDetections
    ? "GROUP_CONCAT(CONCAT(DATEDIFF(cj.foundOn, j.inoculatedOn), ':', cj.contaminant))"
    : 'NULL';
  const parts = [
    `SELECT ${select((k) => k.raw)}, COUNT(*) AS jars, 0 AS contaminated, ${young} AS young,
        0 AS contaminatedYoung, NULL AS detections
      FROM jars j FORCE INDEX (IDX_jars_analysis) ${where} GROUP BY ${jarGroupBy ?? groupList}`,
  ];
  const partParams: unknown[] = [...bound];
  if (placed) {
    parts.push(
      `SELECT ${select((k) => k.raw)}, -COUNT(*), 0, -${young}, 0, NULL
        FROM placed sp JOIN jars j ON j.id = sp.jarId ${where} GROUP BY ${groupList}`,
      `SELECT ${select((k) => k.placed ?? k.raw)}, COUNT(*), 0, ${young}, 0, NULL
        FROM placed sp JOIN jars j ON j.id = sp.jarId ${where} GROUP BY ${groupList}`,
    );
    partParams.push(...bound, ...bound);
  }
  parts.push(
    `SELECT ${select(keyOf)}, 0, COUNT(*), 0, ${young}, ${detections}
      FROM (${contaminatedJarsSql}) cj JOIN jars j ON j.id = cj.jarId
      ${placed ? 'LEFT JOIN placed sp ON sp.jarId = j.id' : ''} ${where} GROUP BY ${groupList}`,
  );
  partParams.push(...bound);
  return { cte: placed ? placedJarsCte(f.windowDays) : '', sql: parts.join('\n UNION ALL\n '), params: partParams };
}

/** Sums of the parts per outer group. */
export const summedSql = `SUM(k.jars) AS jars, SUM(k.contaminated) AS contaminated,
  SUM(k.young) - SUM(k.contaminatedYoung) AS incubating,
  SUM(k.jars) - SUM(k.young) + SUM(k.contaminatedYoung) AS settled`;
