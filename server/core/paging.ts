import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { Page, PageQuery } from '../../shared/schemas/common';
import { badRequest } from './errors';

/**
 * The column expression for `field` or `-field`. Own keys only: a plain object also answers
 * `constructor` or `toString` from Object.prototype, which would reach the query as a function.
 */
export function sortColumn(sortable: Record<string, string>, sort: string): { column: string; desc: boolean } {
  const desc = sort.startsWith('-');
  const key = sort.replace(/^-/, '');
  const column = Object.hasOwn(sortable, key) ? sortable[key] : undefined;
  if (typeof column !== 'string') {
    throw badRequest(`sort: cannot sort by "${key}"`, [
      { path: 'sort', message: `must be one of ${Object.keys(sortable).join(', ')} (prefix - for descending)` },
    ]);
  }
  return { column, desc };
}

/**
 * Applies `sort` (field or -field, from a whitelist of column expressions) and page/pageSize,
 * with a stable tie-break so that paging never repeats or skips a row. A column in `unique` needs
 * none, and must go without: MariaDB reads a unique index in order only when ORDER BY names that
 * column alone, and sorts the whole table otherwise.
 */
export function applySortAndPage<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  q: PageQuery,
  sortable: Record<string, string>,
  defaultSort: string,
  tieBreak: string,
  unique: readonly string[] = [],
): SelectQueryBuilder<T> {
  const { column, desc } = sortColumn(sortable, q.sort ?? defaultSort);
  qb.orderBy(column, desc ? 'DESC' : 'ASC');
  if (!unique.includes(column)) qb.addOrderBy(tieBreak, desc ? 'DESC' : 'ASC');
  return qb.offset((q.page - 1) * q.pageSize).limit(q.pageSize);
}

/**
 * Counting stops past this many rows: a register's total then costs a short index walk however large
 * the lab grows, and the answer says the count was cut (the screen shows "more than 10,000").
 */
export const COUNT_CAP = 10_000;

export interface PageTotal {
  total: number;
  totalCapped: boolean;
}

/** How many rows the query's filters match, counted up to the cap; its joins, sort and page are dropped. */
export async function cappedTotal<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  cap = COUNT_CAP,
): Promise<PageTotal> {
  const [sql, params] = qb
    .clone()
    .select('1')
    .orderBy()
    .offset(undefined)
    .limit(cap + 1)
    .getQueryAndParameters();
  const rows: { n: number | string }[] = await qb.connection.query(
    `SELECT COUNT(*) AS n FROM (${sql}) counted`,
    params,
  );
  const n = Number(rows[0]?.n ?? 0);
  return n > cap ? { total: cap, totalCapped: true } : { total: n, totalCapped: false };
}

/** A page answer; a plain number is an exact total, from a list too short to need the cap. */
export function pageResult<T>(items: T[], count: PageTotal | number, q: PageQuery): Page<T> {
  const total = typeof count === 'number' ? { total: count, totalCapped: false } : count;
  return { items, ...total, page: q.page, pageSize: q.pageSize };
}

/** Bounds a date column by the optional from/to of a filter, both ends inclusive. */
export function whereDateRange<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  column: string,
  range: { from?: string; to?: string },
): SelectQueryBuilder<T> {
  if (range.from) qb.andWhere(`${column} >= :from`, { from: range.from });
  if (range.to) qb.andWhere(`${column} <= :to`, { to: range.to });
  return qb;
}

/** A LIKE pattern for values starting with the term, its wildcards taken literally. */
export const likePrefix = (term: string) => `${term.replace(/[\\%_]/g, '\\$&')}%`;

/** Free-text search: the term anywhere in any of the columns. */
export function whereContains<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  columns: string[],
  q: string | undefined,
): SelectQueryBuilder<T> {
  if (q) qb.andWhere(`(${columns.map((c) => `${c} LIKE :q`).join(' OR ')})`, { q: `%${q}%` });
  return qb;
}

export interface SortSpec {
  sortable: Record<string, string>;
  defaultSort: string;
  /** The table's id column: the tie-break, and how a page's rows are fetched once their ids are known. */
  tieBreak: string;
  /** Sort columns unique on their own (codes, labels). */
  unique?: readonly string[];
}

const exportChunk = 1000;

/** Every matching row, sorted as the list is, for a CSV export; read a chunk at a time. */
export async function allSorted<T extends ObjectLiteral>(
  query: () => SelectQueryBuilder<T>,
  sort: string | undefined,
  spec: SortSpec,
): Promise<T[]> {
  const rows: T[] = [];
  for (let page = 1; ; page += 1) {
    const chunk = await applySortAndPage(
      query(),
      { page, pageSize: exportChunk, sort },
      spec.sortable,
      spec.defaultSort,
      spec.tieBreak,
    ).getMany();
    rows.push(...chunk);
    if (chunk.length < exportChunk) return rows;
  }
}

/** The ids of one page, in order, from a query of filters alone (joined only where a filter needs it), and its capped total. */
export async function pageIds<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  q: PageQuery,
  spec: SortSpec,
): Promise<[number[], PageTotal]> {
  const idsQuery = applySortAndPage(
    qb.clone().select(spec.tieBreak, 'id'),
    q,
    spec.sortable,
    spec.defaultSort,
    spec.tieBreak,
    spec.unique,
  );
  const [idRows, total] = await Promise.all([idsQuery.getRawMany<{ id: number | string }>(), cappedTotal(qb)]);
  return [idRows.map((r) => Number(r.id)), total];
}

/** Rows fetched by id, put back in the order of the ids. */
export function inIdOrder<R>(ids: number[], rows: R[], idOf: (r: R) => number): R[] {
  const byId = new Map(rows.map((r) => [idOf(r), r]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/**
 * One page of a register and its capped total. The page's ids come first, read along the sort
 * column's index alone; whole rows are then fetched for those ids only, so a deep page skips index
 * entries rather than whole rows.
 */
export async function pageSorted<T extends ObjectLiteral & { id: number }>(
  qb: SelectQueryBuilder<T>,
  q: PageQuery,
  spec: SortSpec,
): Promise<[T[], PageTotal]> {
  const [ids, total] = await pageIds(qb, q, spec);
  if (ids.length === 0) return [[], total];
  const rows = await qb.clone().andWhere(`${spec.tieBreak} IN (:...pageIds)`, { pageIds: ids }).getMany();
  return [inIdOrder(ids, rows, (r) => r.id), total];
}
