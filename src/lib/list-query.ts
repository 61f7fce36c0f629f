import { keepPreviousData, queryOptions, type QueryKey } from '@tanstack/react-query';
import type { z } from 'zod';
import type { Page } from '../../shared/schemas/common';
import { api, apiUrl } from './api-client';
import type { TableState } from './list-params';

/** One server page of a register; the old page stays on screen while the next one loads. */
export function pagedListQuery<T, K extends QueryKey>(
  queryKey: K,
  path: string,
  schema: z.ZodType<Page<T>>,
  filters: TableState,
) {
  return queryOptions({
    queryKey,
    queryFn: ({ signal }) => api.get(path, { query: { ...filters }, signal, schema }),
    placeholderData: keepPreviousData,
  });
}

/** The export takes the list's filters and sort, but every row. */
export function exportUrl(path: string, { page: _page, pageSize: _size, ...filters }: TableState): string {
  return apiUrl(path, filters);
}

/** A URL value the server's schema accepts, or nothing: a filter the server would refuse is dropped, not sent. */
export function pickParam<Shape extends Record<string, z.ZodType>, K extends keyof Shape & string>(
  shape: Shape,
  params: URLSearchParams,
  key: K,
): z.output<Shape[K]> | undefined {
  const parsed = shape[key]!.safeParse(params.get(key) || undefined);
  return parsed.success ? (parsed.data as z.output<Shape[K]>) : undefined;
}
