/** What a server-paged table needs from the URL: 1-based page, page size and `field` or `-field`. */
export interface TableState {
  page: number;
  pageSize: number;
  sort: string | undefined;
}

export const pageSizes = [10, 25, 50, 100] as const;
const defaultPageSize = 25;

function positiveInt(value: string | null, fallback: number, max = Number.MAX_SAFE_INTEGER): number {
  const n = Number(value);
  return Number.isInteger(n) && n >= 1 ? Math.min(n, max) : fallback;
}

/** Page, size and sort as kept in the URL; unknown sort fields are dropped rather than sent. */
export function readTableState(params: URLSearchParams, sortFields: readonly string[]): TableState {
  const sort = params.get('sort') ?? undefined;
  const field = sort?.replace(/^-/, '');
  return {
    page: positiveInt(params.get('page'), 1),
    pageSize: positiveInt(params.get('pageSize'), defaultPageSize, 200),
    sort: field && sortFields.includes(field) ? sort : undefined,
  };
}

/**
 * Applies a patch to the search params. Changing anything but the page sends the user back to page 1,
 * since the old page number means nothing under new filters.
 */
export function patchParams(
  params: URLSearchParams,
  patch: Record<string, string | number | undefined>,
): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const [key, value] of Object.entries(patch)) {
    if (value === undefined || value === '') next.delete(key);
    else next.set(key, String(value));
  }
  if (!('page' in patch)) next.delete('page');
  if (next.get('page') === '1') next.delete('page');
  if (next.get('pageSize') === String(defaultPageSize)) next.delete('pageSize');
  return next;
}

export type ParamPatch = Record<string, string | number | undefined>;

/** A patch that removes every named filter from the URL. */
export const clearedPatch = <K extends string>(keys: readonly K[]) =>
  Object.fromEntries(keys.map((k) => [k, undefined])) as Record<K, undefined>;

export const hasAnyFilter = <F extends object>(filters: F, keys: readonly (keyof F)[]): boolean =>
  keys.some((k) => filters[k] !== undefined && filters[k] !== '');
