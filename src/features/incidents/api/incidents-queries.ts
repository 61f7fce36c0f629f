import { queryOptions } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/schemas/common';
import { incidentDetailSchema } from '../../../../shared/schemas/incident-detail';
import {
  incidentListItemSchema,
  incidentListQuerySchema,
  incidentSortFields,
} from '../../../../shared/schemas/incidents';
import { api } from '../../../lib/api-client';
import { hasAnyFilter, readTableState, type TableState } from '../../../lib/list-params';
import { exportUrl, pagedListQuery } from '../../../lib/list-query';

export const incidentFilterKeys = [
  'status',
  'verdict',
  'contaminant',
  'cookRunId',
  'cultureId',
  'sessionId',
  'operator',
  'jar',
  'from',
  'to',
  'voided',
] as const;
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

export const hasIncidentFilters = (f: IncidentListFilters) => hasAnyFilter(f, incidentFilterKeys);

const pageSchema = pageOf(incidentListItemSchema);

export const incidentsQueries = {
  all: ['incidents'] as const,
  lists: () => [...incidentsQueries.all, 'list'] as const,
  list: (filters: IncidentListFilters) =>
    pagedListQuery([...incidentsQueries.lists(), filters] as const, '/incidents', pageSchema, filters),
  details: () => [...incidentsQueries.all, 'detail'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...incidentsQueries.details(), id] as const,
      queryFn: ({ signal }) => api.get(`/incidents/${id}`, { signal, schema: incidentDetailSchema }),
    }),
};

export const incidentsExportUrl = (filters: IncidentListFilters) => exportUrl('/incidents/export.csv', filters);
