import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { paths } from '../../../config/paths';
import { api, isApiError, refreshCsrfToken } from '../../../lib/api-client';
import { forgetCachedReads } from '../../../lib/service-worker';
import { authQueries } from './auth-queries';

export const signOutKey = [...authQueries.all, 'sign-out'] as const;

export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();

  const finish = async () => {
    // "Nobody" first, so guards stop rendering screens; then drop every cached record so the next
    // person on a shared device sees nothing of this session.
    queryClient.setQueryData(authQueries.me().queryKey, null);
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authQueries.all[0] });
    void refreshCsrfToken().catch(() => undefined);
    await forgetCachedReads().catch(() => undefined);
    await navigate(paths.signIn.to(), { replace: true });
  };

  return useMutation({
    mutationKey: signOutKey,
    mutationFn: () => api.post('/auth/logout'),
    onSuccess: finish,
    onError: async (error) => {
      if (isApiError(error, 401)) await finish();
    },
  });
}
