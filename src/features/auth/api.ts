import { queryOptions } from '@tanstack/react-query';
import { api, isApiError } from '../../lib/api-client';
import type { SessionOut } from '../../shared/schemas/auth';
import type { Role } from '../../shared/schemas/common';

/** GET /api/auth/me: who is signed in, in which workspace, and every workspace they belong to. */
export type Session = SessionOut;
/** What sign-in, sign-up, accept and switch answer: the session without the workspace list. */
export type SignedIn = Omit<SessionOut, 'workspaces'>;

export type InvitePreview = { email: string; workspaceName: string; role: Role };

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  invitePreview: (token: string) => [...authKeys.all, 'invite-preview', token] as const,
};

/**
 * The current session, or null when nobody is signed in. A 401 is an answer here, not
 * a failure: it is how the app learns to show the sign-in page.
 */
export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: async ({ signal }): Promise<Session | null> => {
      try {
        return await api.get<Session>('/api/auth/me', { signal });
      } catch (error) {
        if (isApiError(error) && error.status === 401) return null;
        throw error;
      }
    },
    staleTime: 60_000,
  });

/** An invitation as its recipient sees it before accepting; 404 when it is unknown or used. */
export const invitePreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitePreview(token),
    queryFn: ({ signal }) => api.get<InvitePreview>('/api/invites/preview', { query: { token }, signal }),
    staleTime: 5 * 60_000,
  });
