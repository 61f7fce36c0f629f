import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cookRunDetailSchema, type CreateCookRunInput } from '../../../../shared/schemas/cook-runs';
import { api } from '../../../lib/api-client';
import { cookRunsQueries } from './cook-runs-queries';

export function useCreateCookRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCookRunInput) => api.post('/cook-runs', input, { schema: cookRunDetailSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cookRunsQueries.lists() }),
  });
}
