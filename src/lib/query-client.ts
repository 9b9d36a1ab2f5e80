import { QueryClient } from '@tanstack/react-query';
import { isApiError, isTransientError } from './api-client';

/** How long to keep retrying while the database is away (about two minutes with the delays below). */
const TRANSIENT_RETRIES = 30;

/**
 * Retry what may heal on its own (database away, server unreachable) patiently and
 * other server faults once; an answer such as 401, 403, 404 or 400 will not change.
 */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isTransientError(error)) return failureCount < TRANSIENT_RETRIES;
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 1;
}

/** Back off quickly to a steady pace, so the page comes back soon after the database does. */
export function retryDelay(failureCount: number): number {
  return Math.min(500 * 2 ** failureCount, 5_000);
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: shouldRetry,
        retryDelay,
        refetchOnWindowFocus: true,
      },
      mutations: { retry: false },
    },
  });
}

/** The app's one cache; route loaders and components share it. */
export const queryClient = createQueryClient();
