import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { LabSettingsDto, UpdateLabSettingsInput } from '../../../../shared/schemas/settings';
import { api } from '../../../lib/api-client';

export const settingsQueries = {
  all: ['settings'] as const,
  detail: () =>
    queryOptions({
      queryKey: [...settingsQueries.all, 'lab'] as const,
      queryFn: ({ signal }) => api.get<LabSettingsDto>('/settings', { signal }),
    }),
};

export function useUpdateLabSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateLabSettingsInput) => api.patch<LabSettingsDto>('/settings', input),
    // Buckets, window and target change every analysis figure, so those are refetched too.
    onSuccess: async (saved) => {
      queryClient.setQueryData(settingsQueries.detail().queryKey, saved);
      await queryClient.invalidateQueries({ queryKey: ['analysis'] });
    },
  });
}
