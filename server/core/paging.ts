import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { Page, PageQuery } from '../../shared/schemas/common';
import { badRequest } from './errors';

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
  const sort = q.sort ?? defaultSort;
  const desc = sort.startsWith('-');
  const key = sort.replace(/^-/, '');
  const column = sortable[key];
  if (!column) {
    throw badRequest(`sort: cannot sort by "${key}"`, [
      { path: 'sort', message: `must be one of ${Object.keys(sortable).join(', ')} (prefix - for descending)` },
    ]);
  }
  return qb
    .orderBy(column, desc ? 'DESC' : 'ASC')
    .addOrderBy(tieBreak, desc ? 'DESC' : 'ASC')
    .offset((q.page - 1) * q.pageSize)
    .limit(q.pageSize);
}

export function pageResult<T>(items: T[], total: number, q: PageQuery): Page<T> {
  return { items, total, page: q.page, pageSize: q.pageSize };
}
