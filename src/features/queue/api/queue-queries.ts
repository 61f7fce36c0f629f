import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { QueueDto } from '../../../../shared/schemas/queue';
import { api } from '../../../lib/api-client';

export const queueQueries = {
  all: ['queue'] as const,
  detail: () =>
    queryOptions({
      queryKey: [...queueQueries.all, 'supervisor'] as const,
      queryFn: ({ signal }) => api.get<QueueDto>('/queue', { signal }),
    }),
};

export function useMarkAlertSeen() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post(`/queue/cluster-alerts/${id}/seen`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queueQueries.all }),
  });
}
