import { useCallback, useSyncExternalStore } from 'react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { isTransientError } from '../../lib/api-client';

/** True while some query is retrying after the database or the server went away. */
function isReconnecting(queryClient: QueryClient): boolean {
  return queryClient
    .getQueryCache()
    .getAll()
    .some(
      (query) =>
        query.state.fetchStatus === 'fetching' &&
        query.state.fetchFailureCount > 0 &&
        isTransientError(query.state.fetchFailureReason),
    );
}

/**
 * A calm notice while TanStack Query retries through a database outage. It only reads
 * the cache, so every screen gets it without handling 503 itself.
 */
export function ReconnectingBanner() {
  const queryClient = useQueryClient();
  const subscribe = useCallback((onChange: () => void) => queryClient.getQueryCache().subscribe(onChange), [queryClient]);
  const reconnecting = useSyncExternalStore(subscribe, () => isReconnecting(queryClient), () => false);

  return (
    <div role="status" aria-live="polite" className={reconnecting ? 'sticky top-0 z-40' : 'sr-only'}>
      {reconnecting ? (
        <p className="border-b border-slate-info/20 bg-[#e9eef4] px-4 py-2 text-center text-sm text-slate-info">
          <span className="font-medium">Reconnecting…</span> The database is not answering for a moment; Farthing keeps
          trying and the page will catch up on its own.
        </p>
      ) : null}
    </div>
  );
}
