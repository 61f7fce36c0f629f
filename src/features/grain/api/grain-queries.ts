import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { idSchema, pageOf } from '../../../../shared/schemas/common';
import {
  grainLotSchema,
  grainLotSortFields,
  grainSchema,
  prepBatchSchema,
  prepBatchSortFields,
} from '../../../../shared/schemas/grain';
import { api } from '../../../lib/api-client';
import { readTableState, type TableState } from '../../../lib/list-params';

export type GrainView = 'lots' | 'batches';

export interface GrainListFilters extends TableState {
  view: GrainView;
  grainId: number | undefined;
  grainLotId: number | undefined;
  q: string | undefined;
}

/** One table shows at a time; `view` picks it and the paging params belong to it. */
export function readGrainFilters(params: URLSearchParams): GrainListFilters {
  const view: GrainView = params.get('view') === 'batches' ? 'batches' : 'lots';
  const id = (key: string) => {
    const parsed = idSchema.safeParse(params.get(key) ?? undefined);
    return parsed.success ? parsed.data : undefined;
  };
  const q = params.get('q')?.trim();
  return {
    ...readTableState(params, view === 'lots' ? grainLotSortFields : prepBatchSortFields),
    view,
    grainId: id('grainId'),
    grainLotId: view === 'batches' ? id('grainLotId') : undefined,
    q: q ? q.slice(0, 40) : undefined,
  };
}

const lotPage = pageOf(grainLotSchema);
const batchPage = pageOf(prepBatchSchema);

export const grainQueries = {
  all: ['grain'] as const,
  grains: () =>
    queryOptions({
      queryKey: [...grainQueries.all, 'grains'] as const,
      queryFn: ({ signal }) => api.get('/grains', { signal, schema: z.array(grainSchema) }),
      staleTime: 5 * 60_000,
    }),
  lists: () => [...grainQueries.all, 'list'] as const,
  lots: ({ view: _view, grainLotId: _lot, ...filters }: GrainListFilters) =>
    queryOptions({
      queryKey: [...grainQueries.lists(), 'lots', filters] as const,
      queryFn: ({ signal }) => api.get('/grain-lots', { query: { ...filters }, signal, schema: lotPage }),
      placeholderData: keepPreviousData,
    }),
  batches: ({ view: _view, grainId, ...filters }: GrainListFilters) =>
    queryOptions({
      queryKey: [...grainQueries.lists(), 'batches', { ...filters, grainId }] as const,
      queryFn: ({ signal }) =>
        api.get('/prep-batches', { query: { ...filters, grain: grainId }, signal, schema: batchPage }),
      placeholderData: keepPreviousData,
    }),
  /** Every lot for the prep-batch form's picker, newest first. */
  lotOptions: () =>
    queryOptions({
      queryKey: [...grainQueries.all, 'lot-options'] as const,
      queryFn: ({ signal }) =>
        api.get('/grain-lots', { query: { pageSize: 200, sort: '-receivedOn' }, signal, schema: lotPage }),
    }),
};
