import { useMutation, useQueryClient } from '@tanstack/react-query';
import { procedureDetailSchema, type CreateProcedureInput } from '../../../../shared/schemas/procedures';
import { api } from '../../../lib/api-client';
import { proceduresQueries } from './procedures-queries';

export function useCreateProcedure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateProcedureInput) => api.post('/procedures', input, { schema: procedureDetailSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: proceduresQueries.lists() }),
  });
}
