import { queryOptions } from '@tanstack/react-query';
import { getAllPages } from '../../lib/api-client';
import type { InviteOut, MemberOut } from '../../shared/schemas/auth';

export type Member = MemberOut;
export type Invite = InviteOut;

export const memberKeys = {
  all: ['members'] as const,
  list: () => [...memberKeys.all, 'list'] as const,
};

export const inviteKeys = {
  all: ['invites'] as const,
  list: () => [...inviteKeys.all, 'list'] as const,
};

export const membersQueryOptions = () =>
  queryOptions({
    queryKey: memberKeys.list(),
    queryFn: ({ signal }) => getAllPages<Member>('/api/members', signal),
  });

/** Pending invitations; only an owner may read them. */
export const invitesQueryOptions = () =>
  queryOptions({
    queryKey: inviteKeys.list(),
    queryFn: ({ signal }) => getAllPages<Invite>('/api/invites', signal),
  });
