import { isApiError, isTransientError } from '../../lib/api-client';
import { Button } from './button';

/** The words to show for a failed read, without leaking internals. */
export function describeError(error: unknown): string {
  if (isTransientError(error)) {
    return isApiError(error) && error.status === 0
      ? 'Farthing could not reach the server.'
      : 'The database is not answering at the moment.';
  }
  if (isApiError(error)) return error.message;
  return 'Something went wrong while loading this page.';
}

export function ErrorState({
  title = 'This page could not be loaded',
  error,
  onRetry,
}: {
  title?: string;
  error?: unknown;
  onRetry?: () => void;
}) {
  return (
    <div role="alert" className="rounded-lg border border-brick/30 bg-surface px-6 py-8">
      <p className="text-base font-medium text-ink">{title}</p>
      <p className="mt-1 text-sm text-muted">{describeError(error)}</p>
      {onRetry ? (
        <Button variant="secondary" className="mt-4" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}
