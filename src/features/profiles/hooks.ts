import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { isStaleVersion } from '../../lib/stale-version';
import type { ProfileCreateBody } from '../../shared/schemas/profiles';
import { profileKeys, type Profile } from './api';

// A profile's adders, duty and lead-time limit price every offer on the quote board
// (under the quotes key, written out: areas do not import each other).
const offersKey = ['quotes', 'offers'] as const;

export function useCreateProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ProfileCreateBody) => api.post<Profile>('/api/landed-cost-profiles', body),
    onSuccess: async (profile) => {
      queryClient.setQueryData(profileKeys.detail(profile.id), profile);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: profileKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: offersKey }),
      ]);
    },
  });
}

export function useUpdateProfile(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ProfileCreateBody & { version: number }) => api.patch<Profile>(`/api/landed-cost-profiles/${encodeURIComponent(id)}`, body),
    onSuccess: async (profile) => {
      queryClient.setQueryData(profileKeys.detail(id), profile);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: profileKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: offersKey }),
      ]);
    },
    onError: (error) =>
      isStaleVersion(error)
        ? Promise.all([
            queryClient.invalidateQueries({ queryKey: profileKeys.detail(id) }),
            queryClient.invalidateQueries({ queryKey: profileKeys.lists() }),
          ])
        : undefined,
  });
}
