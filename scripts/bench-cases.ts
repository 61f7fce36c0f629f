// The analysis questions the bench asks: as the screens ask them (JSON, a page), then the CSV exports.
import type { Frame, SqlQuery } from '../server/analysis/grouped-jars';
import { addDays, isoWeekOf } from '../server/core/calendar';
import type * as Queries from '../server/analysis/analysis.queries';

export interface BenchCase {
  name: string;
  url: string;
  /** The same question asked of the analysis counts directly; none where the route reads the records. */
  sql?: SqlQuery;
}

type QueryBuilders = Pick<
  typeof Queries,
  'ratesQuery' | 'crosstabQuery' | 'combinationsQuery' | 'weeklyQuery' | 'lethalityQuery' | 'colonisationQuery'
>;

/** JSON answers: each is one page, so its size must not grow with the lab. */
export function screenCases(q: QueryBuilders, frame: Frame, today: string): BenchCase[] {
  // Four weeks back: a settled week, as the weekly table's drill-down asks.
  const week = isoWeekOf(addDays(today, -28));
  return [
    { name: 'rates (by=grain)', url: '/api/analysis/rates?by=grain', sql: q.ratesQuery('grain', frame) },
    { name: 'rates (by=operator)', url: '/api/analysis/rates?by=operator', sql: q.ratesQuery('operator', frame) },
    { name: 'rates (by=session)', url: '/api/analysis/rates?by=session', sql: q.ratesQuery('session', frame) },
    {
      name: 'crosstab (grain × cookMinutes)',
      url: '/api/analysis/crosstab?rows=grain&cols=cookMinutes',
      sql: q.crosstabQuery('grain', 'cookMinutes', frame),
    },
    {
      name: 'crosstab (operator × week)',
      url: '/api/analysis/crosstab?rows=operator&cols=week',
      sql: q.crosstabQuery('operator', 'week', frame),
    },
    { name: 'weekly table', url: '/api/analysis/weekly', sql: q.weeklyQuery(frame) },
    {
      name: 'causes (as the screen asks)',
      url: '/api/analysis/causes?page=1&pageSize=20&order=standing',
      sql: q.combinationsQuery(frame),
    },
    { name: 'cook lethality', url: '/api/analysis/lethality', sql: q.lethalityQuery(frame) },
    { name: 'colonisation', url: '/api/analysis/colonisation', sql: q.colonisationQuery(frame, today) },
    // The jars behind a figure: a page of the records themselves, for a small level and a large one.
    { name: 'jars behind a session', url: '/api/analysis/jars?factor=session&level=BS-000123' },
    { name: 'jars behind a grain', url: '/api/analysis/jars?factor=grain&level=rye' },
    {
      name: "jars behind a week's grain",
      url: `/api/analysis/jars?factor=week&level=${week}&factor2=grain&level2=rye`,
    },
  ];
}

/** The CSV files: every level or row, for a spreadsheet, not a screen. BENCH_CAUSES_WHOLE=0 skips causes. */
export function exportCases(q: QueryBuilders, frame: Frame): BenchCase[] {
  return [
    {
      name: 'rates (by=session) CSV',
      url: '/api/analysis/rates?by=session&format=csv',
      sql: q.ratesQuery('session', frame),
    },
    {
      name: 'crosstab (operator × week) CSV',
      url: '/api/analysis/crosstab?rows=operator&cols=week&format=csv',
      sql: q.crosstabQuery('operator', 'week', frame),
    },
    { name: 'cook lethality CSV', url: '/api/analysis/lethality?format=csv', sql: q.lethalityQuery(frame) },
    ...(process.env.BENCH_CAUSES_WHOLE === '0'
      ? []
      : [{ name: 'causes CSV (every row)', url: '/api/analysis/causes?format=csv', sql: q.combinationsQuery(frame) }]),
  ];
}
