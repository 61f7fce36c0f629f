import type { Factor } from '../../shared/enums';
import { cookBucketSql, factorSql, isoWeekFromYearWeek } from './analysis.factors';
import {
  groupedJars,
  periodClauses,
  periodWhere,
  summedSql,
  type Frame,
  type Period,
  type SqlQuery,
} from './grouped-jars';
import {
  cookRunKey,
  cultureKey,
  grainKey,
  bareColumnOf,
  keyOn,
  prepBatchKey,
  roomKey,
  sessionKey,
  transfersKey,
  transfersLevelSql,
  yearWeekKey,
} from './tally-keys';

export const num = (v: unknown) => Number(v ?? 0);
export const str = (v: unknown): string | null =>
  v === null || v === undefined ? null : typeof v === 'string' ? v : JSON.stringify(v);

/**
 * A factor's level read off each jar's own row in the counts (tallied_jars tj), for one level's jars. The
 * level is matched on the bare column, so that the row's index on it finds the level's jars.
 */
export function perJar(factor: Factor, f: Frame, aliasSuffix = '') {
  const key = factorSql(factor, f.edges, '').key;
  return factorSql(factor, f.edges, keyOn(bareColumnOf(key), 'tj'), aliasSuffix);
}

export interface CountRow {
  jars: number;
  contaminated: number;
  incubating: number;
}
export const toCounts = (r: Record<string, unknown>): CountRow => ({
  jars: num(r.jars),
  contaminated: num(r.contaminated),
  incubating: num(r.incubating),
});

/** Rates by one factor; the NULL level collects the jars that do not record it. */
export function ratesQuery(by: Factor, f: Frame): SqlQuery {
  const fs = factorSql(by, f.edges, 'k.k1');
  const inner = groupedJars([fs.key], f);
  return {
    sql: `SELECT ${fs.level} AS level, ${fs.order} AS sortKey, ${summedSql}
      FROM (${inner.sql}) k ${fs.joins.join(' ')}
      GROUP BY level HAVING SUM(k.jars) > 0 ORDER BY sortKey`,
    params: inner.params,
  };
}

/** One level's counts: a rates row asked for by name. */
export function levelCountsQuery(by: Factor, level: string, f: Frame): SqlQuery {
  const fs = factorSql(by, f.edges, 'k.k1');
  const inner = groupedJars([fs.key], f);
  return {
    sql: `SELECT ${summedSql} FROM (${inner.sql}) k ${fs.joins.join(' ')} WHERE ${fs.level} = ?`,
    params: [...inner.params, level],
  };
}

export function crosstabQuery(rows: Factor, cols: Factor, f: Frame): SqlQuery {
  const r = factorSql(rows, f.edges, 'k.k1', '_r');
  const c = factorSql(cols, f.edges, 'k.k2', '_c');
  const inner = groupedJars([r.key, c.key], f);
  return {
    sql: `SELECT ${r.level} AS rowLevel, ${c.level} AS colLevel, ${r.order} AS rowOrder, ${c.order} AS colOrder, ${summedSql}
      FROM (${inner.sql}) k ${r.joins.join(' ')} ${c.joins.join(' ')}
      GROUP BY rowLevel, colLevel HAVING rowLevel IS NOT NULL AND colLevel IS NOT NULL AND SUM(k.jars) > 0`,
    params: inner.params,
  };
}

/**
 * The causes query: jars grouped by the combination of every factor's key, so each row is a level
 * combination, never a jar. Names are joined after grouping, on the far smaller set of combinations.
 */
export function combinationsQuery(f: Frame): SqlQuery {
  const inner = groupedJars(
    [grainKey, cookRunKey, sessionKey, cultureKey, prepBatchKey, roomKey, yearWeekKey, transfersKey],
    f,
    { withDetections: true, byKeyOrder: true },
  );
  // Summed per combination first, then named: the joins run once per combination, not once per part.
  return {
    sql: `SELECT g.name AS grain, cr.code AS cookRun, ${cookBucketSql(f.edges, 'cr.minutesAtPressure')} AS cookMinutes,
        s.code AS session, NULLIF(COALESCE(s.operatorName, ou.displayName), '') AS operator, c.code AS culture,
        ${isoWeekFromYearWeek('t.k7')} AS week, ${transfersLevelSql('t.k8')} AS transfers, pb.code AS prepBatch,
        s.workspace AS workspace, t.k6 AS room,
        t.jars, t.contaminated, t.incubating, t.settled, t.detections
      FROM (SELECT k.k1, k.k2, k.k3, k.k4, k.k5, k.k6, k.k7, k.k8, ${summedSql}, GROUP_CONCAT(k.detections) AS detections
        FROM (${inner.sql}) k
        GROUP BY k.k1, k.k2, k.k3, k.k4, k.k5, k.k6, k.k7, k.k8 HAVING SUM(k.jars) > 0) t
      JOIN grains g ON g.id = t.k1
      LEFT JOIN cook_runs cr ON cr.id = t.k2
      LEFT JOIN inoculation_sessions s ON s.id = t.k3
      LEFT JOIN users ou ON ou.id = s.operatorId
      LEFT JOIN cultures c ON c.id = t.k4
      LEFT JOIN prep_batches pb ON pb.id = t.k5`,
    params: inner.params,
  };
}

export function weeklyQuery(f: Frame): SqlQuery {
  const inner = groupedJars([yearWeekKey, grainKey], f);
  return {
    sql: `SELECT ${isoWeekFromYearWeek('k.k1')} AS week, g.name AS grain, ${summedSql}
      FROM (${inner.sql}) k JOIN grains g ON g.id = k.k2
      GROUP BY k.k1, k.k2 ORDER BY k.k1, g.name`,
    params: inner.params,
  };
}

/**
 * Cook runs that have jars inoculated in the period, or were cooked in it, newest first, with their jars.
 * The jars come from the counts per cook run and day (tally_levels), so the answer does not re-read every jar.
 */
export function lethalityQuery(p: Period): SqlQuery {
  const inPeriod = periodWhere(p, ["t.factor = 'cookRun'"], 't.inoculatedOn');
  const cooked = periodClauses(p, 'cr.cookedOn');
  const where = cooked.clauses.length ? `WHERE counted.jars > 0 OR (${cooked.clauses.join(' AND ')})` : '';
  return {
    sql: `SELECT cr.code, cr.cookedOn, cr.container, cr.minutesAtPressure, cr.gaugeKPa, cr.altitudeM, cr.f0, cr.f0Source,
        cr.logPlacement, COALESCE(counted.jars, 0) AS jars, COALESCE(counted.contaminated, 0) AS contaminated
      FROM cook_runs cr
      LEFT JOIN (
        SELECT t.levelId, SUM(t.jars) AS jars, SUM(t.contaminated) AS contaminated
        FROM tally_levels t ${inPeriod.where} GROUP BY t.levelId
      ) counted ON counted.levelId = cr.id
      ${where}
      ORDER BY cr.cookedOn IS NULL, cr.cookedOn DESC, cr.code DESC`,
    params: [...inPeriod.params, ...cooked.params],
  };
}

/**
 * Jars per grain, outcome and day for the colonisation curves, from the counts of how each jar's time
 * ends (server/tallies/colonisation-keys.sql.ts): a jar still colonising is censored at today, a jar that
 * ended uncolonised at its end or today, whichever is sooner.
 */
export function colonisationQuery(p: Period, today: string): SqlQuery {
  const { where, params } = periodWhere(p, ['t.jars <> 0'], 't.inoculatedOn');
  return {
    sql: `SELECT g.name AS grain, t.ending = 'colonised' AS colonised,
        GREATEST(0, CASE t.ending WHEN 'colonised' THEN t.days
          WHEN 'ended' THEN LEAST(t.days, DATEDIFF(?, t.inoculatedOn))
          ELSE DATEDIFF(?, t.inoculatedOn) END) AS day,
        SUM(t.jars) AS jars
      FROM tally_colonisation t JOIN grains g ON g.id = t.grainId
      ${where}
      GROUP BY grain, colonised, day ORDER BY grain, day`,
    params: [today, today, ...params],
  };
}
