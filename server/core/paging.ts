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
 * with a stable tie-break so that paging never repeats or skips a row.
 */
export function applySortAndPage<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  q: PageQuery,
  sortable: Record<string, string>,
  defaultSort: string,
  tieBreak: string,
): SelectQueryBuilder<T> {
  const { column, desc } = sortColumn(sortable, q.sort ?? defaultSort);
  return qb
    .orderBy(column, desc ? 'DESC' : 'ASC')
    .addOrderBy(tieBreak, desc ? 'DESC' : 'ASC')
    .offset((q.page - 1) * q.pageSize)
    .limit(q.pageSize);
}

export function pageResult<T>(items: T[], total: number, q: PageQuery): Page<T> {
  return { items, total, page: q.page, pageSize: q.pageSize };
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
  tieBreak: string;
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

export const pageSorted = <T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  q: PageQuery,
  spec: SortSpec,
): Promise<[T[], number]> => applySortAndPage(qb, q, spec.sortable, spec.defaultSort, spec.tieBreak).getManyAndCount();
