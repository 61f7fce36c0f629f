import { queryOptions } from '@tanstack/react-query';
import { cultureStateSchema, type CultureState } from '../../../../shared/enums';
import { pageOf } from '../../../../shared/schemas/common';
import { cultureDetailSchema, cultureSchema, cultureSortFields } from '../../../../shared/schemas/cultures';
import { api } from '../../../lib/api-client';
import { readTableState, type TableState } from '../../../lib/list-params';
import { exportUrl, pagedListQuery } from '../../../lib/list-query';

export interface CultureListFilters extends TableState {
  state: CultureState | undefined;
  q: string | undefined;
}

export function readCultureFilters(params: URLSearchParams): CultureListFilters {
  const state = cultureStateSchema.safeParse(params.get('state'));
  const q = params.get('q')?.trim();
  return {
    ...readTableState(params, cultureSortFields),
    state: state.success ? state.data : undefined,
    q: q ? q.slice(0, 120) : undefined,
  };
}

const pageSchema = pageOf(cultureSchema);

export const culturesQueries = {
  all: ['cultures'] as const,
  lists: () => [...culturesQueries.all, 'list'] as const,
  list: (filters: CultureListFilters) =>
    pagedListQuery([...culturesQueries.lists(), filters] as const, '/cultures', pageSchema, filters),
  details: () => [...culturesQueries.all, 'detail'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...culturesQueries.details(), id] as const,
      queryFn: ({ signal }) => api.get(`/cultures/${id}`, { signal, schema: cultureDetailSchema }),
    }),
};

export const culturesExportUrl = (filters: CultureListFilters) => exportUrl('/cultures/export.csv', filters);
