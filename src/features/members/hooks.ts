import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import type { InviteBody } from '../../shared/schemas/auth';
import type { Role } from '../../shared/schemas/common';
import { inviteKeys, memberKeys, type Invite, type Member } from './api';

// The session's own key, written out rather than imported: areas do not import each
// other. A role change or removal may concern the person signed in.
const sessionKey = ['auth', 'me'] as const;
// The plan's usage counts members and pending invitations (its limit banner reads it).
const billingKey = ['billing'] as const;

export function useChangeMemberRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      api.patch<Member>(`/api/members/${encodeURIComponent(userId)}`, { role }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: memberKeys.all }),
        queryClient.invalidateQueries({ queryKey: sessionKey }),
      ]),
  });
}

export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => api.delete(`/api/members/${encodeURIComponent(userId)}`),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: memberKeys.all }),
        queryClient.invalidateQueries({ queryKey: sessionKey }),
        queryClient.invalidateQueries({ queryKey: billingKey }),
      ]),
  });
}

export function useSendInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: InviteBody) => api.post<Invite>('/api/invites', body),
    onSuccess: () =>
      Promise.all([queryClient.invalidateQueries({ queryKey: inviteKeys.all }), queryClient.invalidateQueries({ queryKey: billingKey })]),
  });
}

export function useRevokeInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: string) => api.delete(`/api/invites/${encodeURIComponent(inviteId)}`),
    onSuccess: () =>
      Promise.all([queryClient.invalidateQueries({ queryKey: inviteKeys.all }), queryClient.invalidateQueries({ queryKey: billingKey })]),
  });
}
