import type { Factor } from '../../shared/enums';
import type { LogPlacement } from '../../shared/stats/cook-verdict';
import { dataSource } from '../db/data-source';
import { cookBucketSql, factorSql, isoWeekFromYearWeek } from './analysis.factors';
import { dateText } from './dates';

export interface Period {
  from?: string | undefined;
  to?: string | undefined;
}

/** What every counting query needs besides the period: today and the observation window, as local dates. */
export interface Frame extends Period {
  /** Jars inoculated after this local date are younger than the observation window. */
  windowStart: string;
  edges: readonly number[];
}

/**
 * One row per jar that is contaminated (DESIGN.md §3): it has an incident that is not voided and whose
 * verdict is not ruled out. The earliest such incident gives the detection day and contaminant.
 */
export const contaminatedJarsSql = `
  SELECT ij.jarId, MIN(i.foundOn) AS foundOn,
         SUBSTRING(MIN(CONCAT(i.foundOn, i.contaminant)), 11) AS contaminant
  FROM incident_jars ij
  JOIN incidents i ON i.id = ij.incidentId
  WHERE i.voided = 0 AND i.verdict <> 'ruled-out'
  GROUP BY ij.jarId`;

const countsSql = `COUNT(*) AS jars,
  SUM(cj.jarId IS NOT NULL) AS contaminated,
  SUM(cj.jarId IS NULL AND j.inoculatedOn > ?) AS incubating`;

export interface SqlQuery {
  sql: string;
  params: unknown[];
}

function periodWhere(p: Period, extra: string[] = []): { where: string; params: string[] } {
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
 * Jars grouped on their own key columns, in two set-based halves: every jar (read from the covering
 * analysis index, never the rows) and the few contaminated ones. The caller sums them per level:
 * incubating = young − young and contaminated. `detections` lists days:contaminant of contaminated jars.
 */
function groupedJars(keys: string[], f: Frame, withDetections = false): SqlQuery {
  const { where, params } = periodWhere(f);
  const keyList = keys.map((k, i) => `${k} AS k${i + 1}`).join(', ');
  const groupList = keys.map((_, i) => `k${i + 1}`).join(', ');
  const detections = withDetections
    ? "GROUP_CONCAT(CONCAT(DATEDIFF(cj.foundOn, j.inoculatedOn), ':', cj.contaminant))"
    : 'NULL';
  return {
    sql: `SELECT ${keyList}, COUNT(*) AS jars, 0 AS contaminated, SUM(j.inoculatedOn > ?) AS young,
          0 AS contaminatedYoung, NULL AS detections
        FROM jars j FORCE INDEX (IDX_jars_analysis) ${where} GROUP BY ${groupList}
      UNION ALL
        SELECT ${keyList}, 0, COUNT(*), 0, SUM(j.inoculatedOn > ?), ${detections}
        FROM (${contaminatedJarsSql}) cj JOIN jars j ON j.id = cj.jarId ${where} GROUP BY ${groupList}`,
    params: [f.windowStart, ...params, f.windowStart, ...params],
  };
}

const summedSql = `SUM(k.jars) AS jars, SUM(k.contaminated) AS contaminated,
  SUM(k.young) - SUM(k.contaminatedYoung) AS incubating`;

const num = (v: unknown) => Number(v ?? 0);

/** A factor's level read off each jar, for the queries that pick out one level's jars. */
const perJar = (factor: Factor, edges: readonly number[]) => factorSql(factor, edges, factorSql(factor, edges, '').key);

export interface CountRow {
  jars: number;
  contaminated: number;
  incubating: number;
}

const toCounts = (r: Record<string, unknown>): CountRow => ({
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
      GROUP BY level ORDER BY sortKey`,
    params: inner.params,
  };
}

export function crosstabQuery(rows: Factor, cols: Factor, f: Frame): SqlQuery {
  const r = factorSql(rows, f.edges, 'k.k1', '_r');
  const c = factorSql(cols, f.edges, 'k.k2', '_c');
  const inner = groupedJars([r.key, c.key], f);
  return {
    sql: `SELECT ${r.level} AS rowLevel, ${c.level} AS colLevel, ${r.order} AS rowOrder, ${c.order} AS colOrder, ${summedSql}
      FROM (${inner.sql}) k ${r.joins.join(' ')} ${c.joins.join(' ')}
      GROUP BY rowLevel, colLevel HAVING rowLevel IS NOT NULL AND colLevel IS NOT NULL`,
    params: inner.params,
  };
}

/**
 * The causes query: jars grouped by the combination of every factor's key, so each row is a level
 * combination, never a jar. Names are joined after grouping, on the far smaller set of combinations.
 */
export function combinationsQuery(f: Frame): SqlQuery {
  const inner = groupedJars(
    [
      'j.grainId',
      'j.cookRunId',
      'j.sessionId',
      'j.cultureId',
      'j.prepBatchId',
      'j.room',
      'YEARWEEK(j.inoculatedOn, 3)',
    ],
    f,
    true,
  );
  return {
    sql: `SELECT g.name AS grain, cr.code AS cookRun, ${cookBucketSql(f.edges, 'cr.minutesAtPressure')} AS cookMinutes,
        s.code AS session, NULLIF(COALESCE(s.operatorName, ou.displayName), '') AS operator, c.code AS culture,
        ${isoWeekFromYearWeek('k.k7')} AS week, pb.code AS prepBatch, s.workspace AS workspace, NULLIF(k.k6, '') AS room,
        ${summedSql}, GROUP_CONCAT(k.detections) AS detections
      FROM (${inner.sql}) k
      JOIN grains g ON g.id = k.k1
      LEFT JOIN cook_runs cr ON cr.id = k.k2
      LEFT JOIN inoculation_sessions s ON s.id = k.k3
      LEFT JOIN users ou ON ou.id = s.operatorId
      LEFT JOIN cultures c ON c.id = k.k4
      LEFT JOIN prep_batches pb ON pb.id = k.k5
      GROUP BY k.k1, k.k2, k.k3, k.k4, k.k5, k.k6, k.k7`,
    params: inner.params,
  };
}

export function weeklyQuery(f: Frame): SqlQuery {
  const inner = groupedJars(['YEARWEEK(j.inoculatedOn, 3)', 'j.grainId'], f);
  return {
    sql: `SELECT ${isoWeekFromYearWeek('k.k1')} AS week, g.name AS grain, ${summedSql}
      FROM (${inner.sql}) k JOIN grains g ON g.id = k.k2
      GROUP BY k.k1, k.k2 ORDER BY k.k1, g.name`,
    params: inner.params,
  };
}

export type CombinationRow = Record<Factor, string | null> & CountRow & { detections: string | null };

export interface ColonisationRow {
  grain: string;
  colonised: boolean;
  day: number;
  jars: number;
}

export interface LethalityRawRow {
  code: string;
  cookedOn: string | null;
  container: string | null;
  minutesAtPressure: number;
  gaugeKPa: number | null;
  altitudeM: number;
  f0: number | null;
  f0Source: 'log' | 'estimate' | null;
  logPlacement: LogPlacement | null;
  jars: number;
  contaminated: number;
}

export interface ActionRow {
  id: number;
  factor: Factor | null;
  level: string | null;
  doneOn: string | null;
  createdAt: Date;
}

type Raw = Record<string, unknown>[];
const run = (q: SqlQuery) => dataSource.query<Raw>(q.sql, q.params);
const str = (v: unknown): string | null =>
  v === null || v === undefined ? null : typeof v === 'string' ? v : JSON.stringify(v);

export const analysisRepository = {
  async rates(by: Factor, f: Frame) {
    const rows = await run(ratesQuery(by, f));
    return rows.map((r) => ({ level: str(r.level), ...toCounts(r) }));
  },

  async crosstab(rows: Factor, cols: Factor, f: Frame) {
    const raw = await run(crosstabQuery(rows, cols, f));
    return raw.map((r) => ({
      row: String(r.rowLevel),
      col: String(r.colLevel),
      rowOrder: r.rowOrder as string | number,
      colOrder: r.colOrder as string | number,
      ...toCounts(r),
    }));
  },

  async combinations(f: Frame): Promise<CombinationRow[]> {
    const raw = await run(combinationsQuery(f));
    return raw.map((r) => ({
      grain: str(r.grain),
      cookRun: str(r.cookRun),
      cookMinutes: str(r.cookMinutes),
      session: str(r.session),
      operator: str(r.operator),
      culture: str(r.culture),
      week: str(r.week),
      prepBatch: str(r.prepBatch),
      workspace: str(r.workspace),
      room: str(r.room),
      ...toCounts(r),
      detections: str(r.detections),
    }));
  },

  async weekly(f: Frame) {
    const raw = await run(weeklyQuery(f));
    return raw.map((r) => ({ week: String(r.week), grain: String(r.grain), ...toCounts(r) }));
  },

  /** Days to colonisation per grain; jars that did not colonise are censored at their last known day. */
  async colonisation(p: Period, today: string): Promise<ColonisationRow[]> {
    // A jar marked colonised or released without a colonisation date (imported history) has no known day.
    const { where, params } = periodWhere(p, ["NOT (j.colonisedOn IS NULL AND j.status IN ('colonised', 'released'))"]);
    const colonised = 'j.colonisedOn IS NOT NULL AND (cj.foundOn IS NULL OR j.colonisedOn <= cj.foundOn)';
    const raw = await dataSource.query<Raw>(
      `SELECT g.name AS grain, (${colonised}) AS colonised,
          GREATEST(0, CASE WHEN ${colonised} THEN DATEDIFF(j.colonisedOn, j.inoculatedOn)
            ELSE DATEDIFF(LEAST(COALESCE(cj.foundOn, j.endedOn, ?), ?), j.inoculatedOn) END) AS day,
          COUNT(*) AS jars
        FROM jars j JOIN grains g ON g.id = j.grainId
        LEFT JOIN (${contaminatedJarsSql}) cj ON cj.jarId = j.id
        ${where}
        GROUP BY grain, colonised, day ORDER BY grain, day`,
      [today, today, ...params],
    );
    return raw.map((r) => ({
      grain: String(r.grain),
      colonised: num(r.colonised) === 1,
      day: num(r.day),
      jars: num(r.jars),
    }));
  },

  /** Cook runs that have jars inoculated in the period, or were cooked in it. */
  async lethality(p: Period): Promise<LethalityRawRow[]> {
    const on: string[] = [];
    const onParams: string[] = [];
    const cooked: string[] = [];
    if (p.from) {
      on.push('j.inoculatedOn >= ?');
      onParams.push(p.from);
      cooked.push('cr.cookedOn >= ?');
    }
    if (p.to) {
      on.push('j.inoculatedOn <= ?');
      onParams.push(p.to);
      cooked.push('cr.cookedOn <= ?');
    }
    const jarFilter = on.length ? `AND ${on.join(' AND ')}` : '';
    const having = on.length ? `HAVING COUNT(j.id) > 0 OR (${cooked.join(' AND ')})` : '';
    const raw = await dataSource.query<Raw>(
      `SELECT cr.code, cr.cookedOn, cr.container, cr.minutesAtPressure, cr.gaugeKPa, cr.altitudeM, cr.f0, cr.f0Source, cr.logPlacement,
          COUNT(j.id) AS jars, SUM(cj.jarId IS NOT NULL) AS contaminated
        FROM cook_runs cr
        LEFT JOIN jars j ON j.cookRunId = cr.id ${jarFilter}
        LEFT JOIN (${contaminatedJarsSql}) cj ON cj.jarId = j.id
        GROUP BY cr.id ${having}
        ORDER BY cr.cookedOn IS NULL, cr.cookedOn, cr.code`,
      [...onParams, ...onParams],
    );
    return raw.map((r) => ({
      code: String(r.code),
      cookedOn: dateText(r.cookedOn),
      container: str(r.container),
      minutesAtPressure: num(r.minutesAtPressure),
      gaugeKPa: r.gaugeKPa === null ? null : num(r.gaugeKPa),
      altitudeM: num(r.altitudeM),
      f0: r.f0 === null ? null : num(r.f0),
      f0Source: (r.f0Source as LethalityRawRow['f0Source']) ?? null,
      logPlacement: (r.logPlacement as LogPlacement | null) ?? null,
      jars: num(r.jars),
      contaminated: num(r.contaminated),
    }));
  },

  async action(id: number): Promise<ActionRow | null> {
    const raw = await dataSource.query<Raw>(
      'SELECT id, factor, level, doneOn, createdAt FROM corrective_actions WHERE id = ?',
      [id],
    );
    const r = raw[0];
    if (!r) return null;
    return {
      id: num(r.id),
      factor: (r.factor as Factor | null) ?? null,
      level: str(r.level),
      doneOn: dateText(r.doneOn),
      createdAt: r.createdAt instanceof Date ? r.createdAt : new Date(String(r.createdAt)),
    };
  },

  /** Counts of one factor level's jars in a period. */
  async levelCounts(factor: Factor, level: string, f: Frame): Promise<CountRow> {
    const fs = perJar(factor, f.edges);
    const { where, params } = periodWhere(f, [`${fs.level} = ?`]);
    const raw = await run({
      sql: `SELECT ${countsSql} FROM jars j ${fs.joins.join(' ')}
        LEFT JOIN (${contaminatedJarsSql}) cj ON cj.jarId = j.id ${where}`,
      params: [f.windowStart, level, ...params],
    });
    return toCounts(raw[0] ?? {});
  },

  async jarsBehind(
    factor: Factor,
    level: string,
    only: 'all' | 'contaminated' | 'incubating',
    f: Frame,
    page: { offset: number; limit: number },
    and?: { factor: Factor; level: string },
  ) {
    const fs = perJar(factor, f.edges);
    const second = and ? factorSql(and.factor, f.edges, factorSql(and.factor, f.edges, '').key, '2') : null;
    const extra = [`${fs.level} = ?`, ...(second ? [`${second.level} = ?`] : [])];
    if (only === 'contaminated') extra.push('cj.jarId IS NOT NULL');
    if (only === 'incubating') extra.push('cj.jarId IS NULL AND j.inoculatedOn > ?');
    const { where, params } = periodWhere(f, extra);
    const bound = [level, ...(and ? [and.level] : []), ...(only === 'incubating' ? [f.windowStart] : []), ...params];
    const joins = [...fs.joins, ...(second?.joins ?? [])].join(' ');
    const from = `FROM jars j ${joins} LEFT JOIN (${contaminatedJarsSql}) cj ON cj.jarId = j.id ${where}`;
    // The jar's first live incident, so the list can link it (DESIGN §3: not voided, not ruled out).
    const incident = `(SELECT MIN(li.id) FROM incident_jars lij JOIN incidents li ON li.id = lij.incidentId
        WHERE lij.jarId = j.id AND li.voided = 0 AND li.verdict <> 'ruled-out')`;
    const [items, total] = await Promise.all([
      dataSource.query<Raw>(
        `SELECT j.id, j.label, j.inoculatedOn, j.status, cj.jarId IS NOT NULL AS contaminated,
            (cj.jarId IS NULL AND j.inoculatedOn > ?) AS incubating, cj.contaminant, cj.foundOn,
            ${incident} AS incidentId
          ${from} ORDER BY j.inoculatedOn, j.label LIMIT ? OFFSET ?`,
        [f.windowStart, ...bound, page.limit, page.offset],
      ),
      dataSource.query<{ n: string | number }[]>(`SELECT COUNT(*) AS n ${from}`, bound),
    ]);
    return {
      items: items.map((r) => ({
        id: num(r.id),
        label: String(r.label),
        inoculatedOn: dateText(r.inoculatedOn) ?? '',
        status: String(r.status),
        contaminated: num(r.contaminated) === 1,
        incubating: num(r.incubating) === 1,
        contaminant: str(r.contaminant),
        foundOn: dateText(r.foundOn),
        incidentId: r.incidentId === null ? null : num(r.incidentId),
      })),
      total: num(total[0]?.n),
    };
  },
};
