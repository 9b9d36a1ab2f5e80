import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../lib/api-client';
import type { AcceptInviteBody, LoginBody, SignupBody } from '../../shared/schemas/auth';
import { authKeys, type Session, type SignedIn } from './api';

/** Is this query about the session itself (kept across sign-in changes)? */
const isAuthQuery = (queryKey: readonly unknown[]) => queryKey[0] === authKeys.all[0];

/**
 * A new person or workspace is in charge: nothing cached for the previous one may show.
 * Drop every workspace query, seat the new session, then fetch /me again for the full
 * workspace list (the sign-in answers do not carry it).
 */
async function startSession(queryClient: QueryClient, signedIn: SignedIn): Promise<void> {
  await queryClient.cancelQueries();
  queryClient.removeQueries({ predicate: (query) => !isAuthQuery(query.queryKey) });
  queryClient.setQueryData<Session | null>(authKeys.me(), (previous) => ({
    ...signedIn,
    workspaces: previous?.user.id === signedIn.user.id ? previous.workspaces : undefined,
  }));
  await queryClient.invalidateQueries({ queryKey: authKeys.me() });
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: LoginBody) => api.post<SignedIn>('/api/auth/login', body),
    onSuccess: (signedIn) => startSession(queryClient, signedIn),
  });
}

export function useSignup() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignupBody) => api.post<SignedIn>('/api/auth/signup', body),
    onSuccess: (signedIn) => startSession(queryClient, signedIn),
  });
}

export function useAcceptInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInviteBody) => api.post<SignedIn>('/api/invites/accept', body),
    onSuccess: async (signedIn, body) => {
      queryClient.removeQueries({ queryKey: authKeys.invitePreview(body.token) });
      await startSession(queryClient, signedIn);
    },
  });
}

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      try {
        await api.post<void>('/api/auth/logout');
      } catch (error) {
        // Already signed out (the session expired): the outcome the person wanted.
        if (!(isApiError(error) && error.status === 401)) throw error;
      }
    },
    onSuccess: async () => {
      await queryClient.cancelQueries();
      // Signed out: the session reads null (the app shell sends the user to sign in),
      // and nothing of the workspace stays in memory.
      queryClient.removeQueries({ predicate: (query) => !isAuthQuery(query.queryKey) });
      queryClient.setQueryData<Session | null>(authKeys.me(), null);
    },
  });
}

export function useSwitchWorkspace() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (workspaceId: string) => api.post<SignedIn>('/api/auth/switch', { workspaceId }),
    onSuccess: async (signedIn) => {
      await queryClient.cancelQueries();
      queryClient.setQueryData<Session | null>(authKeys.me(), (previous) => ({
        ...signedIn,
        workspaces: previous?.workspaces,
      }));
      // Every other query belongs to the workspace just left: reset them so the screens
      // on show fetch again for the new one, and refresh /me for roles that changed.
      await Promise.all([
        queryClient.resetQueries({ predicate: (query) => !isAuthQuery(query.queryKey) }),
        queryClient.invalidateQueries({ queryKey: authKeys.me() }),
      ]);
    },
  });
}

export function useRequestReset() {
  return useMutation({
    mutationFn: (body: { email: string }) => api.post<void>('/api/auth/password-reset', body),
  });
}

export function useConfirmReset() {
  return useMutation({
    mutationFn: (body: { token: string; password: string }) => api.post<void>('/api/auth/password-reset/confirm', body),
  });
}
