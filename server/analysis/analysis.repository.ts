import type { Factor, LogPlacement } from '../../shared/enums';
import type { ActionSummary } from '../../shared/schemas/analysis-actions';
import { dataSource } from '../db/data-source';
import { contaminatedJarsSql, jarIsSettledSql, jarIsYoungSql, liveIncidentSql } from '../incidents/live-incidents';
import { cookBucketSql, factorSql, isoWeekFromYearWeek } from './analysis.factors';
import { dateText } from '../core/calendar';
import { groupedJars, periodWhere, summedSql, type Frame, type Period, type SqlQuery } from './grouped-jars';
import { cultureKey, keyOf, placedJarsCte, roomKey, transfersKey, transfersLevelSql } from './lineage-and-place';

export type { Frame, Period, SqlQuery } from './grouped-jars';

const num = (v: unknown) => Number(v ?? 0);

/** A factor's level read off each jar (joined LEFT to placed sp where needed), for one level's jars. */
function perJar(factor: Factor, f: Frame, aliasSuffix = '') {
  const key = factorSql(factor, f.edges, '').key;
  const fs = factorSql(factor, f.edges, keyOf(key), aliasSuffix);
  const placed = key.placed !== undefined;
  return {
    ...fs,
    cte: placed ? placedJarsCte(f.windowDays) : '',
    joins: [...(placed ? ['LEFT JOIN placed sp ON sp.jarId = j.id'] : []), ...fs.joins],
  };
}

const countsSql = `COUNT(*) AS jars,
  SUM(cj.jarId IS NOT NULL) AS contaminated,
  SUM(cj.jarId IS NULL AND ${jarIsYoungSql('j.inoculatedOn')}) AS incubating`;

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
    sql: `${inner.cte} SELECT ${fs.level} AS level, ${fs.order} AS sortKey, ${summedSql}
      FROM (${inner.sql}) k ${fs.joins.join(' ')}
      GROUP BY level HAVING SUM(k.jars) > 0 ORDER BY sortKey`,
    params: inner.params,
  };
}

export function crosstabQuery(rows: Factor, cols: Factor, f: Frame): SqlQuery {
  const r = factorSql(rows, f.edges, 'k.k1', '_r');
  const c = factorSql(cols, f.edges, 'k.k2', '_c');
  const inner = groupedJars([r.key, c.key], f);
  return {
    sql: `${inner.cte} SELECT ${r.level} AS rowLevel, ${c.level} AS colLevel, ${r.order} AS rowOrder, ${c.order} AS colOrder, ${summedSql}
      FROM (${inner.sql}) k ${r.joins.join(' ')} ${c.joins.join(' ')}
      GROUP BY rowLevel, colLevel HAVING rowLevel IS NOT NULL AND colLevel IS NOT NULL AND SUM(k.jars) > 0`,
    params: inner.params,
  };
}

/** IDX_jars_analysis's columns in its order: the causes keys are these or functions of them. */
const ANALYSIS_INDEX_COLUMNS =
  'j.inoculatedOn, j.grainId, j.cookRunId, j.sessionId, j.cultureId, j.prepBatchId, j.room';

/**
 * The causes query: jars grouped by the combination of every factor's key, so each row is a level
 * combination, never a jar. Names are joined after grouping, on the far smaller set of combinations.
 */
export function combinationsQuery(f: Frame): SqlQuery {
  const inner = groupedJars(
    [
      { raw: 'j.grainId' },
      { raw: 'j.cookRunId' },
      { raw: 'j.sessionId' },
      cultureKey,
      { raw: 'j.prepBatchId' },
      roomKey,
      { raw: 'YEARWEEK(j.inoculatedOn, 3)' },
      transfersKey,
    ],
    f,
    { withDetections: true, jarGroupBy: ANALYSIS_INDEX_COLUMNS },
  );
  // Summed per combination first, then named: the joins run once per combination, not once per part.
  return {
    sql: `${inner.cte} SELECT g.name AS grain, cr.code AS cookRun, ${cookBucketSql(f.edges, 'cr.minutesAtPressure')} AS cookMinutes,
        s.code AS session, NULLIF(COALESCE(s.operatorName, ou.displayName), '') AS operator, c.code AS culture,
        ${isoWeekFromYearWeek('t.k7')} AS week, ${transfersLevelSql('t.k8')} AS transfers, pb.code AS prepBatch,
        s.workspace AS workspace, NULLIF(t.k6, '') AS room,
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
  const inner = groupedJars([{ raw: 'YEARWEEK(j.inoculatedOn, 3)' }, { raw: 'j.grainId' }], f);
  return {
    sql: `${inner.cte} SELECT ${isoWeekFromYearWeek('k.k1')} AS week, g.name AS grain, ${summedSql}
      FROM (${inner.sql}) k JOIN grains g ON g.id = k.k2
      GROUP BY k.k1, k.k2 ORDER BY k.k1, g.name`,
    params: inner.params,
  };
}

export type CombinationRow = Record<Factor, string | null> &
  CountRow & {
    /** Contaminated jars, and clean ones at least the observation window old (DESIGN.md §3). */
    settled: number;
    detections: string | null;
  };

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
  summary: ActionSummary;
}

const actionColumns = 'id, incidentId, what, ownerName, dueOn, doneOn, factor, level';

function toAction(r: Record<string, unknown>): ActionRow {
  const summary: ActionSummary = {
    id: num(r.id),
    incidentId: num(r.incidentId),
    what: String(r.what),
    ownerName: String(r.ownerName),
    dueOn: dateText(r.dueOn) ?? '',
    doneOn: dateText(r.doneOn),
    factor: (r.factor as Factor | null) ?? null,
    level: str(r.level),
  };
  return { id: summary.id, factor: summary.factor, level: summary.level, doneOn: summary.doneOn, summary };
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
    const q = combinationsQuery(f);
    const raw = await dataSource.query<CombinationRow[]>(q.sql, q.params);
    // Counts arrive as DECIMAL text and are made numbers in place: at 200 k jars this is some 13 k rows,
    // and a converted copy of each would double the garbage every causes request leaves behind.
    for (const r of raw) {
      r.jars = num(r.jars);
      r.contaminated = num(r.contaminated);
      r.incubating = num(r.incubating);
      r.settled = num(r.settled);
    }
    return raw;
  },

  async weekly(f: Frame) {
    const raw = await run(weeklyQuery(f));
    return raw.map((r) => ({ week: String(r.week), grain: String(r.grain), ...toCounts(r) }));
  },

  /** Days to colonisation per grain; jars that did not colonise are censored at their last known day. */
  async colonisation(p: Period, today: string): Promise<ColonisationRow[]> {
    // A jar marked colonised or released without a colonisation date (imported history) has no known day.
    // Imported history has no colonisation days, and its contaminated jars no censoring day worth
    // trusting: leaving only one kind out would bias the curve, so all imported jars stay out.
    const { where, params } = periodWhere(p, [
      'j.imported = 0',
      "NOT (j.colonisedOn IS NULL AND j.status IN ('colonised', 'released'))",
    ]);
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
    const raw = await dataSource.query<Raw>(`SELECT ${actionColumns} FROM corrective_actions WHERE id = ?`, [id]);
    return raw[0] ? toAction(raw[0]) : null;
  },

  /** Corrective actions, the most recently done first and those not done yet last. */
  async actions(page: { offset: number; limit: number }): Promise<{ items: ActionRow[]; total: number }> {
    const [raw, count] = await Promise.all([
      dataSource.query<Raw>(
        `SELECT ${actionColumns} FROM corrective_actions ORDER BY doneOn IS NULL, doneOn DESC, id DESC LIMIT ? OFFSET ?`,
        [page.limit, page.offset],
      ),
      dataSource.query<{ n: string | number }[]>('SELECT COUNT(*) AS n FROM corrective_actions'),
    ]);
    return { items: raw.map(toAction), total: num(count[0]?.n) };
  },

  /** Counts of one factor level's jars in a period; `settledOnly` leaves incubating jars out (before/after). */
  async levelCounts(factor: Factor, level: string, f: Frame, settledOnly = false): Promise<CountRow> {
    const fs = perJar(factor, f);
    const extra = [
      `${fs.level} = ?`,
      ...(settledOnly ? [jarIsSettledSql('j.inoculatedOn', 'cj.jarId IS NOT NULL')] : []),
    ];
    const { where, params } = periodWhere(f, extra);
    const raw = await run({
      sql: `${fs.cte} SELECT ${countsSql} FROM jars j ${fs.joins.join(' ')}
        LEFT JOIN (${contaminatedJarsSql}) cj ON cj.jarId = j.id ${where}`,
      params: [f.windowStart, level, ...(settledOnly ? [f.windowStart] : []), ...params],
    });
    return toCounts(raw[0] ?? {});
  },

  async jarsBehind(
    factor: Factor,
    level: string,
    only: 'all' | 'settled' | 'contaminated' | 'incubating',
    f: Frame,
    page: { offset: number; limit: number },
    and?: { factor: Factor; level: string },
  ) {
    const fs = perJar(factor, f);
    const second = and ? perJar(and.factor, f, '2') : null;
    const extra = [`${fs.level} = ?`, ...(second ? [`${second.level} = ?`] : [])];
    const young = jarIsYoungSql('j.inoculatedOn');
    if (only === 'contaminated') extra.push('cj.jarId IS NOT NULL');
    if (only === 'incubating') extra.push(`cj.jarId IS NULL AND ${young}`);
    if (only === 'settled') extra.push(jarIsSettledSql('j.inoculatedOn', 'cj.jarId IS NOT NULL'));
    const { where, params } = periodWhere(f, extra);
    const bound = [
      level,
      ...(and ? [and.level] : []),
      ...(only === 'incubating' || only === 'settled' ? [f.windowStart] : []),
      ...params,
    ];
    const cte = fs.cte || second?.cte || '';
    // Both factors may need the placed CTE: join it once.
    const joins = [...new Set([...fs.joins, ...(second?.joins ?? [])])].join(' ');
    const from = `FROM jars j ${joins} LEFT JOIN (${contaminatedJarsSql}) cj ON cj.jarId = j.id ${where}`;
    // The jar's first live incident, so the list can link it.
    const incident = `(SELECT MIN(li.id) FROM incident_jars lij JOIN incidents li ON li.id = lij.incidentId
        WHERE lij.jarId = j.id AND ${liveIncidentSql('li')})`;
    const [items, total] = await Promise.all([
      dataSource.query<Raw>(
        `${cte} SELECT j.id, j.label, j.inoculatedOn, j.status, cj.jarId IS NOT NULL AS contaminated,
            (cj.jarId IS NULL AND ${young}) AS incubating, cj.contaminant, cj.foundOn,
            ${incident} AS incidentId
          ${from} ORDER BY j.inoculatedOn, j.label LIMIT ? OFFSET ?`,
        [f.windowStart, ...bound, page.limit, page.offset],
      ),
      dataSource.query<{ n: string | number }[]>(`${cte} SELECT COUNT(*) AS n ${from}`, bound),
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
