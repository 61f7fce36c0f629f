import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/schemas/common';
import {
  cookRunDetailSchema,
  cookRunFiltersSchema,
  cookRunReadingsSchema,
  cookRunSchema,
  cookRunSortFields,
} from '../../../../shared/schemas/cook-runs';
import { api, apiUrl } from '../../../lib/api-client';
import { readTableState, type TableState } from '../../../lib/list-params';

export interface CookRunListFilters extends TableState {
  q: string | undefined;
  container: string | undefined;
  from: string | undefined;
  to: string | undefined;
  lowLethality: 'true' | undefined;
}

/** The URL is the list's source of truth; a filter the server would refuse is dropped, not sent. */
export function readCookRunFilters(params: URLSearchParams): CookRunListFilters {
  const pick = <K extends 'q' | 'container' | 'from' | 'to'>(key: K) => {
    const parsed = cookRunFiltersSchema.shape[key].safeParse(params.get(key) || undefined);
    return parsed.success ? parsed.data : undefined;
  };
  return {
    ...readTableState(params, cookRunSortFields),
    q: pick('q'),
    container: pick('container'),
    from: pick('from'),
    to: pick('to'),
    lowLethality: params.get('lowLethality') === 'true' ? 'true' : undefined,
  };
}

const pageSchema = pageOf(cookRunSchema);

export const cookRunsQueries = {
  all: ['cook-runs'] as const,
  lists: () => [...cookRunsQueries.all, 'list'] as const,
  list: (filters: CookRunListFilters) =>
    queryOptions({
      queryKey: [...cookRunsQueries.lists(), filters] as const,
      queryFn: ({ signal }) => api.get('/cook-runs', { query: { ...filters }, signal, schema: pageSchema }),
      placeholderData: keepPreviousData,
    }),
  details: () => [...cookRunsQueries.all, 'detail'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...cookRunsQueries.details(), id] as const,
      queryFn: ({ signal }) => api.get(`/cook-runs/${id}`, { signal, schema: cookRunDetailSchema }),
    }),
  readings: (id: number) =>
    queryOptions({
      queryKey: [...cookRunsQueries.details(), id, 'readings'] as const,
      queryFn: ({ signal }) => api.get(`/cook-runs/${id}/readings`, { signal, schema: cookRunReadingsSchema }),
    }),
};

/** The export takes the list's filters and sort, but every row. */
export function cookRunsExportUrl({ page: _page, pageSize: _size, ...filters }: CookRunListFilters): string {
  return apiUrl('/cook-runs/export.csv', filters);
}
