import type { Factor } from '../../shared/enums';
import type { CausesDto } from '../../shared/schemas/analysis-causes';
import type { CrosstabDto, RatesPageDto } from '../../shared/schemas/analysis-rates';
import type { JarsBehindDto } from '../../shared/schemas/analysis-jars-behind';
import type { JarsBehindQuery } from '../../shared/schemas/analysis';
import { analysisRepository, type Period } from './analysis.repository';
import { buildCauses, byStanding } from './causes';
import { pageOf } from './level-pages';

export { compareRates } from './comparison';
export { frameFor, tally } from './frame';
import { frameFor, sum, tally } from './frame';
export { beforeAfter, actionVerdicts } from './before-after';

/** A page of levels (every level without `page`); intervals are worked out for the page's levels alone. */
export async function rates(
  by: Factor,
  p: Period & { page?: number | undefined; pageSize: number },
): Promise<RatesPageDto> {
  const rows = await analysisRepository.rates(by, await frameFor(p));
  const recorded = rows.filter((r): r is typeof r & { level: string } => r.level !== null);
  const [shown, at] = pageOf(recorded, p.page, p.pageSize);
  return {
    by,
    from: p.from ?? null,
    to: p.to ?? null,
    overall: tally(sum(rows)),
    notRecorded: sum(rows.filter((r) => r.level === null)).jars,
    rows: shown.map((r) => ({ level: r.level, ...tally(r) })),
    ...at,
  };
}

function orderedLevels(entries: { level: string; order: string | number }[]): string[] {
  const first = new Map<string, string | number>();
  for (const e of entries) {
    const had = first.get(e.level);
    if (had === undefined || e.order < had) first.set(e.level, e.order);
  }
  return [...first.entries()]
    .sort(([la, a], [lb, b]) =>
      typeof a === 'number' && typeof b === 'number'
        ? a - b || (la < lb ? -1 : 1)
        : String(a).localeCompare(String(b), 'en', { sensitivity: 'base' }) || (la < lb ? -1 : 1),
    )
    .map(([level]) => level);
}

export async function crosstab(rowFactor: Factor, colFactor: Factor, p: Period): Promise<CrosstabDto> {
  const cells = await analysisRepository.crosstab(rowFactor, colFactor, await frameFor(p));
  const rows = orderedLevels(cells.map((c) => ({ level: c.row, order: c.rowOrder })));
  const cols = orderedLevels(cells.map((c) => ({ level: c.col, order: c.colOrder })));
  const rowIndex = new Map(rows.map((r, i) => [r, i]));
  const colIndex = new Map(cols.map((c, i) => [c, i]));
  return {
    rowFactor,
    colFactor,
    rows,
    cols,
    cells: cells
      .map((c) => ({ row: c.row, col: c.col, ...tally(c) }))
      .sort(
        (a, b) =>
          (rowIndex.get(a.row) ?? 0) - (rowIndex.get(b.row) ?? 0) ||
          (colIndex.get(a.col) ?? 0) - (colIndex.get(b.col) ?? 0),
      ),
  };
}

export async function causes(
  p: Period,
  minJars: number,
  paging: { page?: number | undefined; pageSize: number; order?: 'rank' | 'standing' } = { pageSize: 25 },
): Promise<CausesDto> {
  const combos = await analysisRepository.combinations(await frameFor(p));
  const { leads, rows, describe } = buildCauses(combos, minJars);
  if (paging.order === 'standing') rows.sort(byStanding);
  const page = paging.page ?? null;
  const shown = page === null ? rows : rows.slice((page - 1) * paging.pageSize, page * paging.pageSize);
  describe([...shown, ...leads.map((l) => l.row)]);
  return {
    from: p.from ?? null,
    to: p.to ?? null,
    minJars,
    leads,
    causes: shown,
    total: rows.length,
    page,
    pageSize: page === null ? null : paging.pageSize,
  };
}
export async function jarsBehind(q: JarsBehindQuery): Promise<JarsBehindDto> {
  const f = await frameFor(q);
  const and = q.factor2 && q.level2 ? { factor: q.factor2, level: q.level2 } : undefined;
  const page = { offset: (q.page - 1) * q.pageSize, limit: q.pageSize };
  const { items, total } = await analysisRepository.jarsBehind(q.factor, q.level, q.only, f, page, and);
  return {
    factor: q.factor,
    level: q.level,
    factor2: and?.factor ?? null,
    level2: and?.level ?? null,
    items,
    total,
    page: q.page,
    pageSize: q.pageSize,
  };
}
