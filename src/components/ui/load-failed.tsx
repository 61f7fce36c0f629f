import { errorMessage } from '../../lib/api-client';
import { Button } from './button';
import { Notice } from './notice';

export function LoadFailed({ title, error, onRetry }: { title: string; error: unknown; onRetry?: () => void }) {
  return (
    <Notice
      tone="danger"
      title={title}
      action={
        onRetry && (
          <Button variant="secondary" onClick={onRetry}>
            Try again
          </Button>
        )
      }
    >
      {errorMessage(error)}
    </Notice>
  );
}
