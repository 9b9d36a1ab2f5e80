import { useEffect, type ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { isApiError } from '../lib/api-client';
import { queryClient } from '../lib/query-client';
import { authKeys, type Session } from '../features/auth/api';

/**
 * When any read answers 401 the session has ended (expired, signed out elsewhere).
 * Marking the session as gone lets the app shell send the person to sign in, from
 * whichever screen they were on. Mutations are left alone: a 401 from sign-in is a
 * wrong password, not an ended session.
 */
function useSessionExpiry(): void {
  useEffect(
    () =>
      queryClient.getQueryCache().subscribe((event) => {
        if (event.type !== 'updated' || event.action.type !== 'error') return;
        if (event.query.queryKey[0] === authKeys.all[0]) return;
        const error = event.action.error;
        if (isApiError(error) && error.status === 401) {
          queryClient.setQueryData<Session | null>(authKeys.me(), null);
        }
      }),
    [],
  );
}

export function AppProvider({ children }: { children: ReactNode }) {
  useSessionExpiry();
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}
