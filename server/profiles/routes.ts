import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { idParams } from '../../src/shared/schemas/common';
import { profileCreateBody, profilePatchBody } from '../../src/shared/schemas/profiles';
import { scoped } from '../db/scope';
import { updateOrConflict, getOrNotFound } from '../db/versioned';
import { audit } from '../audit/repository';
import { profileView, type ProfileRow } from './repository';

const toDb = (b: Record<string, unknown>) => {
  const out: Record<string, unknown> = { ...b };
  if (b.dutyRates !== undefined) out.dutyRates = JSON.stringify(b.dutyRates);
  if (b.attritionPct !== undefined) out.attritionPct = JSON.stringify(b.attritionPct);
  return out;
};

export const profileRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/landed-cost-profiles', access: 'profiles.read', tag: 'Landed-cost profiles',
    summary: 'Landed-cost profiles: the adders, duty basis and rates, assembly rates and attrition a cost roll applies.',
    response: z.object({ items: z.array(z.record(z.string(), z.unknown())), nextCursor: z.string().nullable() }),
    handler: async ({ auth, deps }) => ({
      items: ((await scoped(deps.db, 'landed_cost_profiles', auth.workspaceId).orderBy('name')) as ProfileRow[]).map(profileView),
      nextCursor: null,
    }),
  }),
  route({
    method: 'post', path: '/api/landed-cost-profiles', access: 'profiles.write', tag: 'Landed-cost profiles', status: 201,
    summary: 'Add a landed-cost profile (percentages as decimal strings in percent: "3.7" = 3.7 %).', body: profileCreateBody,
    handler: async ({ auth, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const [row] = await trx('landed_cost_profiles').insert({ ...toDb(body), workspaceId: auth.workspaceId }).returning('*');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'landed_cost_profile', entityId: row.id, changes: body });
        return profileView(row);
      }),
  }),
  route({
    method: 'get', path: '/api/landed-cost-profiles/:id', access: 'profiles.read', tag: 'Landed-cost profiles',
    summary: 'One landed-cost profile.', params: idParams,
    handler: async ({ auth, params, deps }) => profileView(await getOrNotFound(deps.db, 'landed_cost_profiles', auth.workspaceId, params.id, 'landed-cost profile')),
  }),
  route({
    method: 'patch', path: '/api/landed-cost-profiles/:id', access: 'profiles.write', tag: 'Landed-cost profiles',
    summary: 'Change a landed-cost profile (send the version you read).', params: idParams, body: profilePatchBody,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const { version, ...changes } = body;
        const row = await updateOrConflict<ProfileRow>(trx, 'landed_cost_profiles', auth.workspaceId, params.id, version, toDb(changes), 'landed-cost profile');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'landed_cost_profile', entityId: params.id, changes });
        return profileView(row);
      }),
  }),
];
