import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { pageOf } from '../../../../shared/schemas/common';
import { incidentListItemSchema } from '../../../../shared/schemas/incidents';
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
const incidentChoicesSchema = pageOf(
  incidentListItemSchema.pick({ id: true, foundOn: true, contaminant: true, jarLabels: true, status: true }),
);

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
  linksOfStep: (stepId: number) =>
    queryOptions({
      queryKey: [...proceduresQueries.all, 'links-of-step', stepId] as const,
      queryFn: ({ signal }) => api.get(`/procedure-steps/${stepId}/links`, { signal, schema: stepLinksSchema }),
    }),
  /** Incidents for the link picker: a number with or without #, a jar label, an operator or a contaminant. */
  incidentChoices: (q: string) =>
    queryOptions({
      queryKey: [...proceduresQueries.all, 'incident-choices', q] as const,
      queryFn: ({ signal }) =>
        api.get('/incidents', { query: { q, pageSize: 8, sort: '-foundAt' }, signal, schema: incidentChoicesSchema }),
      enabled: q.trim() !== '',
      placeholderData: keepPreviousData,
    }),
  stepLinks: (incidentId: number) =>
    queryOptions({
      queryKey: [...proceduresQueries.all, 'step-links', incidentId] as const,
      queryFn: ({ signal }) => api.get(`/incidents/${incidentId}/step-links`, { signal, schema: stepLinksSchema }),
    }),
};
