import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParams, version } from '../../src/shared/schemas/common';
import {
  inviteBody, acceptInviteBody, memberParams, memberOut, inviteOut, sessionOut,
} from '../../src/shared/schemas/auth';
import { role } from '../../src/shared/schemas/common';
import { membersRepo } from './repository';
import { invite, previewInvite, acceptInvite, changeRole, removeMember, memberView } from './service';
import { loginSession, sessionView } from '../auth/service';

const list = <T extends z.ZodType>(item: T) => z.object({ items: z.array(item), nextCursor: z.string().nullable() });

export const memberRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/members', access: 'members.read', tag: 'Members',
    summary: 'Members of the current workspace with their roles.', response: list(memberOut),
    handler: async ({ auth, deps }) => ({ items: (await membersRepo.list(deps.db, auth.workspaceId)).map(memberView), nextCursor: null }),
  }),
  route({
    method: 'patch', path: '/api/members/:userId', access: 'members.manage', tag: 'Members',
    summary: "Change a member's role (a workspace keeps at least one owner).",
    params: memberParams, body: z.strictObject({ role, version: version.optional() }), response: memberOut,
    handler: async ({ auth, params, body, deps }) => changeRole(deps, auth, params.userId, body.role, body.version),
  }),
  route({
    method: 'delete', path: '/api/members/:userId', access: 'members.manage', tag: 'Members',
    summary: 'Remove a member from the workspace; their API tokens here are revoked.',
    params: memberParams,
    handler: async ({ auth, params, deps }) => {
      await removeMember(deps, auth, params.userId);
      return undefined;
    },
  }),
  route({
    method: 'get', path: '/api/invites', access: 'members.manage', tag: 'Members',
    summary: 'Open invitations of the workspace.', response: list(inviteOut),
    handler: async ({ auth, deps }) => ({
      items: (await membersRepo.invites(deps.db, auth.workspaceId)).map((i) => ({
        id: i.id, email: i.email, role: i.role, expiresAt: new Date(i.expiresAt).toISOString(), createdAt: new Date(i.createdAt).toISOString(),
      })),
      nextCursor: null,
    }),
  }),
  route({
    method: 'post', path: '/api/invites', access: 'members.manage', tag: 'Members', status: 201,
    summary: 'Invite someone by e-mail with a role; the mail holds a one-time link that expires in 7 days.',
    body: inviteBody, response: inviteOut,
    handler: async ({ auth, body, deps }) => invite(deps, auth, body),
  }),
  route({
    method: 'delete', path: '/api/invites/:id', access: 'members.manage', tag: 'Members',
    summary: 'Withdraw an open invitation.', params: idParams,
    handler: async ({ auth, params, deps }) => {
      const n = await membersRepo.deleteInvite(deps.db, auth.workspaceId, params.id);
      if (!n) throw errors.notFound('invitation');
      return undefined;
    },
  }),
  route({
    method: 'get', path: '/api/invites/preview', access: 'public', tag: 'Members',
    summary: 'What an invitation link offers (workspace, role, e-mail), for the accept page.',
    query: z.strictObject({ token: z.string().min(20).max(200) }),
    response: z.object({ email: z.string(), workspaceName: z.string(), role }),
    handler: async ({ query, deps }) => previewInvite(deps, query.token),
  }),
  route({
    method: 'post', path: '/api/invites/accept', access: 'public', tag: 'Members', rateLimit: 'auth',
    summary: 'Accept an invitation: creates the account (or joins with an existing one) and signs in.',
    body: acceptInviteBody, response: sessionOut,
    handler: async ({ req, body, deps }) => {
      const { userId, workspaceId } = await acceptInvite(deps, body);
      await loginSession(req, userId, workspaceId);
      return sessionView(deps, userId, workspaceId);
    },
  }),
];
