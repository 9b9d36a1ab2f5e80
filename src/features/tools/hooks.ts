import { useMutation } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import type { HelperEndpoints, HelperName } from './api';

/**
 * Runs a circuit helper on the server (the source of the numbers). A helper reads and
 * writes nothing, so there is nothing to cache or invalidate: each "Work it out" is a
 * mutation whose last answer the form shows.
 */
export function useCircuitHelper<N extends HelperName>(name: N) {
  return useMutation({
    mutationFn: (input: HelperEndpoints[N]['input']) => api.post<HelperEndpoints[N]['result']>(`/api/tools/${name}`, input),
  });
}
