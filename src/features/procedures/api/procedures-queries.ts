import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { pageOf } from '../../../../shared/schemas/common';
import {
  procedureDetailSchema,
  procedureSchema,
  procedureVersionSchema,
  stepLinkSchema,
  stepStatsSchema,
} from '../../../../shared/schemas/procedures';
import { api } from '../../../lib/api-client';

const procedurePageSchema = pageOf(procedureSchema);
const stepLinksSchema = z.object({ items: z.array(stepLinkSchema) });

export const proceduresQueries = {
  all: ['procedures'] as const,
  lists: () => [...proceduresQueries.all, 'list'] as const,
  list: () =>
    queryOptions({
      queryKey: [...proceduresQueries.lists()] as const,
      queryFn: ({ signal }) =>
        api.get('/procedures', { query: { pageSize: 200, sort: 'title' }, signal, schema: procedurePageSchema }),
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: [...proceduresQueries.all, 'detail', id] as const,
      queryFn: ({ signal }) => api.get(`/procedures/${id}`, { signal, schema: procedureDetailSchema }),
    }),
  version: (id: number) =>
    queryOptions({
      queryKey: [...proceduresQueries.all, 'version', id] as const,
      queryFn: ({ signal }) => api.get(`/procedure-versions/${id}`, { signal, schema: procedureVersionSchema }),
    }),
  stepStats: (stepId: number) =>
    queryOptions({
      queryKey: [...proceduresQueries.all, 'step-stats', stepId] as const,
      queryFn: ({ signal }) => api.get(`/procedure-steps/${stepId}/stats`, { signal, schema: stepStatsSchema }),
    }),
  stepLinks: (incidentId: number) =>
    queryOptions({
      queryKey: [...proceduresQueries.all, 'step-links', incidentId] as const,
      queryFn: ({ signal }) => api.get(`/incidents/${incidentId}/step-links`, { signal, schema: stepLinksSchema }),
    }),
};
