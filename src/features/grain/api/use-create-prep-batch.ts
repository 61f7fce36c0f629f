import { useMutation, useQueryClient } from '@tanstack/react-query';
import { prepBatchSchema, type CreatePrepBatchInput } from '../../../../shared/schemas/grain';
import { api } from '../../../lib/api-client';
import { grainQueries } from './grain-queries';

export function useCreatePrepBatch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreatePrepBatchInput) => api.post('/prep-batches', input, { schema: prepBatchSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: grainQueries.all }),
  });
}
