import { useMutation, useQueryClient } from '@tanstack/react-query';
import { stepLinkSchema } from '../../../../shared/schemas/procedures';
import { api } from '../../../lib/api-client';
import { proceduresQueries } from './procedures-queries';

export function useLinkStep() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ incidentId, stepId, note }: { incidentId: number; stepId: number; note: string }) =>
      api.post(`/incidents/${incidentId}/step-links`, { stepId, note }, { schema: stepLinkSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: proceduresQueries.all }),
  });
}

export function useUnlinkStep() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (linkId: number) => api.delete(`/step-links/${linkId}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: proceduresQueries.all }),
  });
}
