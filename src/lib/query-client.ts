import { QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

const isClientError = (error: unknown) => error instanceof ApiError && error.status >= 400 && error.status < 500;

interface Options {
  /** Any query answered 401: the session has ended under us. */
  onUnauthenticated?: () => void;
}

export function createQueryClient({ onUnauthenticated }: Options = {}): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error) => {
        if (error instanceof ApiError && error.status === 401) onUnauthenticated?.();
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // Try the request even offline: the service worker answers reads it has seen from its cache.
        networkMode: 'offlineFirst',
        retry: (failureCount, error) => !isClientError(error) && failureCount < 2,
      },
      mutations: { retry: false },
    },
  });
}
