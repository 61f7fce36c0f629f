import { QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { ErrorBoundary } from '../components/errors/error-boundary';
import { ErrorFallback } from '../components/errors/error-fallback';
import { ToastProvider } from '../components/ui/toast';
import { authQueries } from '../features/auth/api/auth-queries';
import { createQueryClient } from '../lib/query-client';
import { seedPageReads } from './page-reads';

export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(() => {
    const client = createQueryClient({
      // A 401 on any list means the session ended; re-asking "who am I" lets the guard send the user to sign in.
      onUnauthenticated: () => void client.invalidateQueries({ queryKey: authQueries.me().queryKey }),
    });
    seedPageReads(client);
    return client;
  });

  return (
    <ErrorBoundary fallback={(reset) => <ErrorFallback onRetry={reset} />}>
      <QueryClientProvider client={queryClient}>
        <ToastProvider>{children}</ToastProvider>
      </QueryClientProvider>
    </ErrorBoundary>
  );
}
