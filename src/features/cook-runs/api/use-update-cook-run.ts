import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cookRunDetailSchema, type UpdateCookRunInput } from '../../../../shared/schemas/cook-runs';
import { api } from '../../../lib/api-client';
import { cookRunsQueries } from './cook-runs-queries';

export function useUpdateCookRun(cookRunId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateCookRunInput) =>
      api.patch(`/cook-runs/${cookRunId}`, input, { schema: cookRunDetailSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cookRunsQueries.all }),
  });
}
