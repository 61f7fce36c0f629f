import type { CrosstabDto, CrosstabPageDto } from '../../shared/schemas/analysis-rates';
import type { LevelPage } from '../../shared/schemas/analysis';

/** Rows of one page, or all of them when no page is asked for (the CSV keeps every row). */
export function pageOf<T>(all: T[], page: number | undefined, pageSize: number): [T[], LevelPage] {
  if (page === undefined) return [all, { total: all.length, page: null, pageSize: null }];
  return [all.slice((page - 1) * pageSize, page * pageSize), { total: all.length, page, pageSize }];
}

/** A window of a crosstab: a page of row levels against a page of column levels, and their cells alone. */
export function crosstabPage(
  dto: CrosstabDto,
  q: { page?: number | undefined; pageSize: number; colPage?: number | undefined; colPageSize: number },
): CrosstabPageDto {
  const [rows, rowPage] = pageOf(dto.rows, q.page, q.pageSize);
  const [cols, colPage] = pageOf(dto.cols, q.colPage, q.colPageSize);
  const [keepRows, keepCols] = [new Set(rows), new Set(cols)];
  const cells = dto.cells.filter((c) => keepRows.has(c.row) && keepCols.has(c.col));
  return { ...dto, rows, cols, cells, rowPage, colPage };
}
