import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cookRunDetailSchema } from '../../../../shared/schemas/cook-runs';
import { api } from '../../../lib/api-client';
import { cookRunsQueries } from './cook-runs-queries';

export function useRemoveReadings(cookRunId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete(`/cook-runs/${cookRunId}/readings`, { schema: cookRunDetailSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cookRunsQueries.all }),
  });
}
