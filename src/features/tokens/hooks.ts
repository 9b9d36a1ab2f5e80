import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { tokenKeys, type NewApiToken } from './api';

/**
 * Creates a token. The secret lives only in this mutation's result (component state),
 * never in the query cache, so it is gone once the screen moves on.
 */
export function useCreateToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name: string }) => api.post<NewApiToken>('/api/tokens', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tokenKeys.all }),
  });
}

export function useRevokeToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tokenId: string) => api.delete(`/api/tokens/${encodeURIComponent(tokenId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tokenKeys.all }),
  });
}
