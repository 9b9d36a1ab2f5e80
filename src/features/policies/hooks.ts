import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { policyKeys, type PolicyLimits, type StressPolicy } from './api';

// Every BOM's stress check and the BOM list's tallies depend on the policies (under the
// BOM area's key, written out: areas do not import each other).
const bomsKey = ['boms'] as const;

function invalidateChecked(queryClient: QueryClient) {
  return Promise.all([queryClient.invalidateQueries({ queryKey: policyKeys.all }), queryClient.invalidateQueries({ queryKey: bomsKey })]);
}

export type PolicyBody = { name: string; limits: PolicyLimits; notes: string };

/** A new policy (a copy, usually); no BOM uses it yet, so only the list changes. */
export function useCreatePolicy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PolicyBody) => api.post<StressPolicy>('/api/stress-policies', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: policyKeys.all }),
  });
}

/** New limits change the stress check of every BOM that uses the policy. */
export function useUpdatePolicy(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<PolicyBody> & { version: number }) => api.patch<StressPolicy>(`/api/stress-policies/${encodeURIComponent(id)}`, body),
    onSuccess: () => invalidateChecked(queryClient),
    onError: () => queryClient.invalidateQueries({ queryKey: policyKeys.all }),
  });
}

/** The default applies to every BOM without a policy of its own. */
export function useMakeDefaultPolicy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.post<{ defaultStressPolicyId: string }>(`/api/stress-policies/${encodeURIComponent(id)}/default`),
    onSuccess: () => invalidateChecked(queryClient),
  });
}
