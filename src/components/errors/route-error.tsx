import { isRouteErrorResponse, useRevalidator, useRouteError } from 'react-router';
import { ErrorFallback } from './error-fallback';
import { NotFound } from './not-found';

export function RouteError() {
  const error = useRouteError();
  const revalidator = useRevalidator();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFound />;
  return <ErrorFallback error={error} onRetry={() => void revalidator.revalidate()} />;
}
