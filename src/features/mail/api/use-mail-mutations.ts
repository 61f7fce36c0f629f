import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  digestResultSchema,
  mailPreferencesSchema,
  type UpdateMailPreferencesInput,
} from '../../../../shared/schemas/mail';
import { api } from '../../../lib/api-client';
import { mailQueries } from './mail-queries';

export function useUpdateMailPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateMailPreferencesInput) =>
      api.put('/mail/preferences', input, { schema: mailPreferencesSchema }),
    onSuccess: (prefs) => queryClient.setQueryData(mailQueries.preferences().queryKey, prefs),
  });
}

export function useSendDigest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post('/mail/digest', undefined, { schema: digestResultSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mailQueries.sentLists() }),
  });
}
