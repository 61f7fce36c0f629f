import { queryOptions } from '@tanstack/react-query';
import { meSchema, type MeDto } from '../../../../shared/schemas/auth';
import { api, isApiError } from '../../../lib/api-client';

/** The signed-in user, or null when there is no session (401 is an answer here, not a failure). */
async function fetchMe(signal: AbortSignal): Promise<MeDto | null> {
  try {
    return await api.get('/auth/me', { signal, schema: meSchema });
  } catch (error) {
    if (isApiError(error, 401)) return null;
    throw error;
  }
}

export const authQueries = {
  all: ['auth'] as const,
  me: () =>
    queryOptions({
      queryKey: [...authQueries.all, 'me'] as const,
      queryFn: ({ signal }) => fetchMe(signal),
      staleTime: 5 * 60_000,
      retry: 1,
    }),
};
