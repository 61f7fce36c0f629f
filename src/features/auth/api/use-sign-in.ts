import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema, type LoginInput } from '../../../../shared/schemas/auth';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { authQueries } from './auth-queries';

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginInput) => api.post('/auth/login', input, { schema: meSchema }),
    onSuccess: async (me) => {
      // Sign-in starts a new session, so the anonymous session's token no longer counts.
      await refreshCsrfToken().catch(() => undefined);
      queryClient.setQueryData(authQueries.me().queryKey, me);
      void queryClient.invalidateQueries({ predicate: (query) => query.queryKey[0] !== authQueries.all[0] });
    },
  });
}
