import { queryOptions } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/schemas/common';
import { operatorsSchema, retrainRequestSchema, trainingRecordSchema } from '../../../../shared/schemas/training';
import { api } from '../../../lib/api-client';

const recordPageSchema = pageOf(trainingRecordSchema);
const requestPageSchema = pageOf(retrainRequestSchema);

export const trainingQueries = {
  all: ['training'] as const,
  operators: (procedureId: number | undefined) =>
    queryOptions({
      queryKey: [...trainingQueries.all, 'operators', procedureId ?? null] as const,
      queryFn: ({ signal }) =>
        api.get('/training/operators', { query: { procedureId }, signal, schema: operatorsSchema }),
    }),
  records: (procedureId: number | undefined) =>
    queryOptions({
      queryKey: [...trainingQueries.all, 'records', procedureId ?? null] as const,
      queryFn: ({ signal }) =>
        api.get('/training-records', { query: { procedureId, pageSize: 50 }, signal, schema: recordPageSchema }),
    }),
  openRequests: () =>
    queryOptions({
      queryKey: [...trainingQueries.all, 'retrain-requests', 'open'] as const,
      queryFn: ({ signal }) =>
        api.get('/training/retrain-requests', {
          query: { open: 'true', pageSize: 50 },
          signal,
          schema: requestPageSchema,
        }),
    }),
};
