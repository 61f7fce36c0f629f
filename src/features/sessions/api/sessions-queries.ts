import { queryOptions } from '@tanstack/react-query';
import { workspaceSchema, type Workspace } from '../../../../shared/enums';
import { pageOf, suggestedCodeSchema } from '../../../../shared/schemas/common';
import { procedureSchema, procedureVersionSchema } from '../../../../shared/schemas/procedures';
import {
  sessionDetailSchema,
  sessionFiltersSchema,
  sessionSchema,
  sessionSortFields,
} from '../../../../shared/schemas/sessions';
import { api } from '../../../lib/api-client';
import { readTableState, type TableState } from '../../../lib/list-params';
import { exportUrl, pagedListQuery, pickParam } from '../../../lib/list-query';

export interface SessionListFilters extends TableState {
  from: string | undefined;
  to: string | undefined;
  operator: string | undefined;
  workspace: Workspace | undefined;
  q: string | undefined;
}

export function readSessionFilters(params: URLSearchParams): SessionListFilters {
  const pick = <K extends 'from' | 'to' | 'operator' | 'q'>(key: K) =>
    pickParam(sessionFiltersSchema.shape, params, key);
  const workspace = workspaceSchema.safeParse(params.get('workspace'));
  return {
    ...readTableState(params, sessionSortFields),
    from: pick('from'),
    to: pick('to'),
    operator: pick('operator'),
    q: pick('q'),
    workspace: workspace.success ? workspace.data : undefined,
  };
}

const pageSchema = pageOf(sessionSchema);
const procedurePageSchema = pageOf(procedureSchema);

export const sessionsQueries = {
  all: ['sessions'] as const,
  lists: () => [...sessionsQueries.all, 'list'] as const,
  list: (filters: SessionListFilters) =>
    pagedListQuery([...sessionsQueries.lists(), filters] as const, '/sessions', pageSchema, filters),
  details: () => [...sessionsQueries.all, 'detail'] as const,
  detail: (id: number) =>
    queryOptions({
      queryKey: [...sessionsQueries.details(), id] as const,
      queryFn: ({ signal }) => api.get(`/sessions/${id}`, { signal, schema: sessionDetailSchema }),
    }),
  /** Fetched fresh each time the create form opens: another bench may have just taken a code. */
  nextCode: () =>
    queryOptions({
      queryKey: [...sessionsQueries.all, 'next-code'] as const,
      queryFn: ({ signal }) => api.get('/sessions/next-code', { signal, schema: suggestedCodeSchema }),
      staleTime: 0,
    }),
  /** The procedures a session can follow, for the create form; kept under this feature's key. */
  procedureOptions: () =>
    queryOptions({
      queryKey: [...sessionsQueries.all, 'procedure-options'] as const,
      queryFn: ({ signal }) =>
        api.get('/procedures', { query: { pageSize: 200 }, signal, schema: procedurePageSchema }),
      staleTime: 60_000,
    }),
  procedureVersion: (versionId: number) =>
    queryOptions({
      queryKey: [...sessionsQueries.all, 'procedure-version', versionId] as const,
      queryFn: ({ signal }) => api.get(`/procedure-versions/${versionId}`, { signal, schema: procedureVersionSchema }),
      staleTime: 60_000,
    }),
};

export const sessionsExportUrl = (filters: SessionListFilters) => exportUrl('/sessions/export.csv', filters);
