import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/schemas/common';
import {
  incidentDetailSchema,
  incidentListItemSchema,
  incidentListQuerySchema,
  incidentSortFields,
} from '../../../../shared/schemas/incidents';
import { api, apiUrl } from '../../../lib/api-client';
import { readTableState, type TableState } from '../../../lib/list-params';

export const incidentFilterKeys = ['status', 'verdict', 'contaminant', 'cookRunId', 'cultureId', 'sessionId', 'operator', 'jar', 'from', 'to', 'voided'] as const;
export type IncidentFilterKey = (typeof incidentFilterKeys)[number];

export type IncidentListFilters = TableState & Partial<Record<IncidentFilterKey, string>>;

/** The URL is the list's source of truth; a filter the server would refuse is dropped, not sent. */
export function readIncidentFilters(params: URLSearchParams): IncidentListFilters {
  const filters: IncidentListFilters = readTableState(params, incidentSortFields);
  const shape = incidentListQuerySchema.shape;
  for (const key of incidentFilterKeys) {
    const raw = params.get(key);
    if (raw && shape[key].safeParse(raw).success) filters[key] = raw;
  }
  return filters;
}

export const hasIncidentFilters = (f: IncidentListFilters) => incidentFilterKeys.some((k) => f[k] !== undefined);

const pageSchema = pageOf(incidentListItemSchema);

export const incidentsQueries = {
  all: ['incidents'] as const,
  lists: () => [...incidentsQueries.all, 'list'] as const,
  list: (filters: IncidentListFilters) =>
    queryOptions({
      queryKey: [...incidentsQueries.lists(), filters] as const,
      queryFn: ({ signal }) => api.get('/incidents', { query: { ...filters }, signal, schema: pageSchema }),
      placeholderData: keepPreviousData,
    }),
  details: () => [...incidentsQueries.all, 'detail'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...incidentsQueries.details(), id] as const,
      queryFn: ({ signal }) => api.get(`/incidents/${id}`, { signal, schema: incidentDetailSchema }),
    }),
};

/** The export takes the list's filters and sort, but every row. */
export function incidentsExportUrl({ page: _page, pageSize: _size, ...filters }: IncidentListFilters): string {
  return apiUrl('/incidents/export.csv', filters);
}
