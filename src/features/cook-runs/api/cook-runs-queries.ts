import { queryOptions } from '@tanstack/react-query';
import { pageOf, suggestedCodeSchema } from '../../../../shared/schemas/common';
import {
  cookRunDetailSchema,
  cookRunFiltersSchema,
  cookRunReadingsSchema,
  cookRunSchema,
  cookRunSortFields,
} from '../../../../shared/schemas/cook-runs';
import { api } from '../../../lib/api-client';
import { readTableState, type TableState } from '../../../lib/list-params';
import { exportUrl, pagedListQuery, pickParam } from '../../../lib/list-query';

export interface CookRunListFilters extends TableState {
  q: string | undefined;
  container: string | undefined;
  from: string | undefined;
  to: string | undefined;
  belowTarget: 'true' | undefined;
}

/** The URL is the list's source of truth; a filter the server would refuse is dropped, not sent. */
export function readCookRunFilters(params: URLSearchParams): CookRunListFilters {
  const pick = <K extends 'q' | 'container' | 'from' | 'to'>(key: K) =>
    pickParam(cookRunFiltersSchema.shape, params, key);
  return {
    ...readTableState(params, cookRunSortFields),
    q: pick('q'),
    container: pick('container'),
    from: pick('from'),
    to: pick('to'),
    belowTarget: params.get('belowTarget') === 'true' ? 'true' : undefined,
  };
}

const pageSchema = pageOf(cookRunSchema);

export const cookRunsQueries = {
  all: ['cook-runs'] as const,
  lists: () => [...cookRunsQueries.all, 'list'] as const,
  list: (filters: CookRunListFilters) =>
    pagedListQuery([...cookRunsQueries.lists(), filters] as const, '/cook-runs', pageSchema, filters),
  details: () => [...cookRunsQueries.all, 'detail'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...cookRunsQueries.details(), id] as const,
      queryFn: ({ signal }) => api.get(`/cook-runs/${id}`, { signal, schema: cookRunDetailSchema }),
    }),
  /** Fetched fresh each time a create form opens: another bench may have just taken a code. */
  nextCode: () =>
    queryOptions({
      queryKey: [...cookRunsQueries.all, 'next-code'] as const,
      queryFn: ({ signal }) => api.get('/cook-runs/next-code', { signal, schema: suggestedCodeSchema }),
      staleTime: 0,
    }),
  readings: (id: number) =>
    queryOptions({
      queryKey: [...cookRunsQueries.details(), id, 'readings'] as const,
      queryFn: ({ signal }) => api.get(`/cook-runs/${id}/readings`, { signal, schema: cookRunReadingsSchema }),
    }),
};

export const cookRunsExportUrl = (filters: CookRunListFilters) => exportUrl('/cook-runs/export.csv', filters);
