import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParams } from '../../src/shared/schemas/common';
import { tokenBody, tokenOut } from '../../src/shared/schemas/auth';
import { newSecret } from '../auth/secret-tokens';
import { scoped } from '../db/scope';
import { audit } from '../audit/repository';
import { assertAllowed } from '../billing/plan';

const view = (t: { id: string; name: string; createdAt: Date; lastUsedAt: Date | null }) => ({
  id: t.id, name: t.name, createdAt: new Date(t.createdAt).toISOString(), lastUsedAt: t.lastUsedAt ? new Date(t.lastUsedAt).toISOString() : null,
});

/** API tokens act as their user, in the workspace they were made in, with the user's role. */
export const tokenRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/tokens', access: 'tokens.own', tag: 'API tokens',
    summary: 'Your API tokens in this workspace (never the secrets).',
    response: z.object({ items: z.array(tokenOut), nextCursor: z.string().nullable() }),
    handler: async ({ auth, deps }) => {
      const rows = await scoped(deps.db, 'api_tokens', auth.workspaceId)
        .andWhere({ userId: auth.userId }).whereNull('revokedAt').orderBy('createdAt', 'desc')
        .select('id', 'name', 'createdAt', 'lastUsedAt');
      return { items: rows.map(view), nextCursor: null };
    },
  }),
  route({
    method: 'post', path: '/api/tokens', access: 'tokens.own', tag: 'API tokens', status: 201,
    summary: 'Create an API token; the secret is in this answer only.',
    body: tokenBody, response: tokenOut.extend({ token: z.string() }),
    handler: async ({ auth, body, deps }) => {
      if (auth.via === 'token') throw errors.forbidden('Create API tokens from a signed-in browser session.');
      await assertAllowed(deps.db, auth.workspaceId, deps.config.BILLING_GRACE_DAYS, 'apiTokens');
      const { secret, hash } = newSecret('fth_');
      const [row] = await deps.db('api_tokens')
        .insert({ workspaceId: auth.workspaceId, userId: auth.userId, name: body.name, tokenHash: hash })
        .returning(['id', 'name', 'createdAt', 'lastUsedAt']);
      await audit(deps.db, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'api_token', entityId: row.id, changes: { name: body.name } });
      return { ...view(row), token: secret };
    },
  }),
  route({
    method: 'delete', path: '/api/tokens/:id', access: 'tokens.own', tag: 'API tokens',
    summary: 'Revoke one of your API tokens; it fails at once.', params: idParams,
    handler: async ({ auth, params, deps }) => {
      const n = await scoped(deps.db, 'api_tokens', auth.workspaceId)
        .andWhere({ id: params.id, userId: auth.userId }).whereNull('revokedAt').update({ revokedAt: deps.db.fn.now() });
      if (!n) throw errors.notFound('API token');
      await audit(deps.db, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'revoke', entity: 'api_token', entityId: params.id });
      return undefined;
    },
  }),
];
