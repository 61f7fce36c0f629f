import { paths } from '../../config/paths';
import { errorMessage, isApiError } from '../../lib/api-client';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';

interface ErrorFallbackProps {
  error?: unknown;
  onRetry?: () => void;
}

/** Shown when a screen fails as a whole. Nothing was saved by the failure itself, so say so. */
export function ErrorFallback({ error, onRetry }: ErrorFallbackProps) {
  const offline = isApiError(error) && (error.status === 0 || (error.status >= 502 && error.status <= 504));
  return (
    <div role="alert" className="mx-auto max-w-xl px-4 py-16">
      <Notice
        tone="danger"
        title={offline ? 'Asepta cannot reach its server.' : 'This screen stopped working.'}
        action={
          <div className="flex flex-wrap gap-3">
            <Button onClick={onRetry ?? (() => window.location.reload())}>Try again</Button>
            {/* A plain link: this fallback may show outside the router. */}
            <a
              href={paths.home.to()}
              className="inline-flex min-h-touch items-center px-2 font-semibold text-accent underline"
            >
              Go to the start page
            </a>
          </div>
        }
      >
        <p>{error ? errorMessage(error) : 'An unexpected error occurred.'}</p>
        <p className="mt-1 text-muted">
          Anything you had already saved is kept. Unsaved entries on this screen may be lost.
        </p>
      </Notice>
    </div>
  );
}
