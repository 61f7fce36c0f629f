import type { Factor, LogPlacement } from '../../shared/enums';
import { dataSource } from '../db/data-source';
import { jarIsSettledSql, jarIsYoungSql, liveIncidentSql } from '../incidents/live-incidents';
import { addDays, dateText, mondayOfIsoWeek } from '../core/calendar';
import { periodWhere, type Frame, type Period, type SqlQuery } from './grouped-jars';
import {
  combinationsQuery,
  colonisationQuery,
  crosstabQuery,
  lethalityQuery,
  levelCountsQuery,
  num,
  perJar,
  ratesQuery,
  str,
  toCounts,
  weeklyQuery,
  type CountRow,
} from './analysis.queries';
import {
  actionColumns,
  toAction,
  type ActionRow,
  type ColonisationRow,
  type CombinationRow,
  type LethalityRawRow,
} from './analysis.rows';

export type { Frame, Period, SqlQuery } from './grouped-jars';

type Raw = Record<string, unknown>[];
const run = (q: SqlQuery) => dataSource.query<Raw>(q.sql, q.params);

/** A week level names seven days: the period narrowed to them lets the index on the day find the week's jars. */
function withinWeek(f: Frame, ...levels: ({ factor: Factor; level: string } | undefined)[]): Frame {
  const week = levels.find((l) => l?.factor === 'week');
  const monday = week ? mondayOfIsoWeek(week.level) : null;
  if (!monday) return f;
  const sunday = addDays(monday, 6);
  return { ...f, from: f.from && f.from > monday ? f.from : monday, to: f.to && f.to < sunday ? f.to : sunday };
}

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
    const raw = await run(colonisationQuery(p, today));
    return raw.map((r) => ({
      grain: String(r.grain),
      colonised: num(r.colonised) === 1,
      day: num(r.day),
      jars: num(r.jars),
    }));
  },

  /** Cook runs that have jars inoculated in the period, or were cooked in it, newest first. */
  async lethality(p: Period): Promise<LethalityRawRow[]> {
    const raw = await run(lethalityQuery(p));
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
    const raw = await run(levelCountsQuery(factor, level, f));
    const c = toCounts(raw[0] ?? {});
    return settledOnly ? { jars: num(raw[0]?.settled), contaminated: c.contaminated, incubating: 0 } : c;
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
    // Whether a jar is contaminated, and when and with what it was first found, are on its counted row.
    const young = jarIsYoungSql('tj.inoculatedOn');
    if (only === 'contaminated') extra.push('tj.contaminated = 1');
    if (only === 'incubating') extra.push(`tj.contaminated = 0 AND ${young}`);
    if (only === 'settled') extra.push(jarIsSettledSql('tj.inoculatedOn', 'tj.contaminated = 1'));
    const { where, params } = periodWhere(withinWeek(f, { factor, level }, and), extra, 'tj.inoculatedOn');
    const bound = [
      level,
      ...(and ? [and.level] : []),
      ...(only === 'incubating' || only === 'settled' ? [f.windowStart] : []),
      ...params,
    ];
    const joins = [...new Set([...fs.joins, ...(second?.joins ?? [])])].join(' ');
    const from = `FROM tallied_jars tj ${joins} ${where}`;
    // The jar's first live incident, so the list can link it.
    const incident = `(SELECT MIN(li.id) FROM incident_jars lij JOIN incidents li ON li.id = lij.incidentId
        WHERE lij.jarId = j.id AND ${liveIncidentSql('li')})`;
    const [items, total] = await Promise.all([
      // In the order the jars were made, day by day: the counted row's index gives a page without sorting them all.
      dataSource.query<Raw>(
        `SELECT j.id, j.label, j.inoculatedOn, j.status, tj.contaminated,
            (tj.contaminated = 0 AND ${young}) AS incubating, NULLIF(tj.contaminant, '') AS contaminant,
            IF(tj.contaminated = 1, DATE_ADD(tj.inoculatedOn, INTERVAL tj.foundAfterDays DAY), NULL) AS foundOn,
            ${incident} AS incidentId
          FROM (SELECT tj.* ${from} ORDER BY tj.inoculatedOn, tj.jarId LIMIT ? OFFSET ?) tj
          JOIN jars j ON j.id = tj.jarId
          ORDER BY tj.inoculatedOn, tj.jarId`,
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
