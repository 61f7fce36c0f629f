import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { cultureStateSchema, jarStatusSchema, type JarStatus } from '../../../../shared/enums';
import { pageOf } from '../../../../shared/schemas/common';
import { labelSheetRowSchema } from '../../../../shared/schemas/jar-labels';
import { jarListQuerySchema, jarRowSchema, jarSortFields } from '../../../../shared/schemas/jars';
import { jarStorySchema } from '../../../../shared/schemas/jar-story';
import { lineageNodeSchema, type LineageTreeDto } from '../../../../shared/schemas/jar-lineage';
import { shelfPlaceSchema } from '../../../../shared/schemas/jar-shelf';
import { api, apiUrl } from '../../../lib/api-client';
import { readTableState, type TableState } from '../../../lib/list-params';
import { exportUrl, pagedListQuery, pickParam } from '../../../lib/list-query';

type TextFilter = 'room' | 'shelf' | 'q' | 'from' | 'to';
type IdFilter = 'grainId' | 'cookRunId' | 'sessionId' | 'cultureId';

export interface JarListFilters
  extends TableState, Partial<Record<TextFilter, string>>, Partial<Record<IdFilter, number>> {
  status: JarStatus | undefined;
}

/** The URL is the list's source of truth; a filter the server would refuse is dropped, not sent. */
export function readJarFilters(params: URLSearchParams): JarListFilters {
  const shape = jarListQuerySchema.shape;
  const text = (key: TextFilter) => pickParam(shape, params, key);
  const id = (key: IdFilter) => pickParam(shape, params, key);
  const status = jarStatusSchema.safeParse(params.get('status'));
  return {
    ...readTableState(params, jarSortFields),
    status: status.success ? status.data : undefined,
    room: text('room'),
    shelf: text('shelf'),
    q: text('q'),
    from: text('from'),
    to: text('to'),
    grainId: id('grainId'),
    cookRunId: id('cookRunId'),
    sessionId: id('sessionId'),
    cultureId: id('cultureId'),
  };
}

const pageSchema = pageOf(jarRowSchema);
const itemsOf = <T extends z.ZodType>(item: T) => z.object({ items: z.array(item) });
const lineageTreeSchema: z.ZodType<LineageTreeDto> = z.lazy(() =>
  z.object({ node: lineageNodeSchema, children: z.array(lineageTreeSchema) }),
);

/** Just what the make-jars form offers from the other registers. */
const optionSchemas = {
  sessions: pageOf(z.object({ id: z.number(), code: z.string(), heldOn: z.string() })),
  grains: z.array(z.object({ id: z.number(), name: z.string(), active: z.boolean() })),
  prepBatches: pageOf(z.object({ id: z.number(), code: z.string(), grain: z.string(), preparedOn: z.string() })),
  cookRuns: pageOf(z.object({ id: z.number(), code: z.string(), cookedOn: z.string().nullable() })),
  cultures: pageOf(
    z.object({ id: z.number(), code: z.string(), species: z.string().nullable(), state: cultureStateSchema }),
  ),
};

export const jarsQueries = {
  all: ['jars'] as const,
  lists: () => [...jarsQueries.all, 'list'] as const,
  list: (filters: JarListFilters) =>
    pagedListQuery([...jarsQueries.lists(), filters] as const, '/jars', pageSchema, filters),
  details: () => [...jarsQueries.all, 'detail'] as const,
  byLabel: (label: string) =>
    queryOptions({
      queryKey: [...jarsQueries.details(), 'label', label] as const,
      queryFn: ({ signal }) =>
        api.get(`/jars/by-label/${encodeURIComponent(label)}`, { signal, schema: jarStorySchema }),
    }),
  shelf: (room: string, shelf: string) =>
    queryOptions({
      queryKey: [...jarsQueries.all, 'shelf', room, shelf] as const,
      queryFn: ({ signal }) =>
        api.get('/jars/shelf', { query: { room, shelf }, signal, schema: itemsOf(jarRowSchema) }),
    }),
  shelves: () =>
    queryOptions({
      queryKey: [...jarsQueries.all, 'shelves'] as const,
      queryFn: ({ signal }) => api.get('/jars/shelves', { signal, schema: itemsOf(shelfPlaceSchema) }),
    }),
  labels: (query: { sessionId?: number; ids?: string }) =>
    queryOptions({
      queryKey: [...jarsQueries.all, 'labels', query] as const,
      queryFn: ({ signal }) => api.get('/jars/labels', { query, signal, schema: itemsOf(labelSheetRowSchema) }),
    }),
  lineage: (kind: 'culture' | 'jar', id: number) =>
    queryOptions({
      queryKey: [...jarsQueries.all, 'lineage', kind, id] as const,
      queryFn: ({ signal }) => api.get(`/lineage/${kind}/${id}`, { signal, schema: lineageTreeSchema }),
    }),
  options: () =>
    queryOptions({
      queryKey: [...jarsQueries.all, 'form-options'] as const,
      queryFn: async ({ signal }) => {
        const many = { pageSize: 200 };
        // Retired cultures are never offered, so only the other two states are fetched.
        const cultures = (state: 'released' | 'quarantined') =>
          api.get('/cultures', { query: { ...many, sort: 'code', state }, signal, schema: optionSchemas.cultures });
        const [sessions, grains, prepBatches, cookRuns, released, quarantined] = await Promise.all([
          api.get('/sessions', { query: { ...many, sort: '-heldOn' }, signal, schema: optionSchemas.sessions }),
          api.get('/grains', { signal, schema: optionSchemas.grains }),
          api.get('/prep-batches', {
            query: { ...many, sort: '-preparedOn' },
            signal,
            schema: optionSchemas.prepBatches,
          }),
          api.get('/cook-runs', { query: { ...many, sort: '-cookedOn' }, signal, schema: optionSchemas.cookRuns }),
          cultures('released'),
          cultures('quarantined'),
        ]);
        return {
          sessions: sessions.items,
          grains,
          prepBatches: prepBatches.items,
          cookRuns: cookRuns.items,
          cultures: [...released.items, ...quarantined.items],
        };
      },
      staleTime: 60_000,
    }),
};

export const jarsExportUrl = (filters: JarListFilters) => exportUrl('/jars/export.csv', filters);

export const jarQrUrl = (qrPath: string) => apiUrl(qrPath.replace(/^\/api/, ''));
