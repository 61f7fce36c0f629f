import { useMutation, useQueryClient } from '@tanstack/react-query';
import { jarBatchResultSchema, type CreateJarBatchInput } from '../../../../shared/schemas/jars';
import { api } from '../../../lib/api-client';
import { jarsQueries } from './jars-queries';

export function useCreateJarBatch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateJarBatchInput) => api.post('/jars/batch', input, { schema: jarBatchResultSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jarsQueries.all }),
  });
}
