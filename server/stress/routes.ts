import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParams } from '../../src/shared/schemas/common';
import { lineParams } from '../../src/shared/schemas/boms';
import { policyCreateBody, policyPatchBody, waiverBody, swapBody } from '../../src/shared/schemas/stress';
import { scoped } from '../db/scope';
import { updateOrConflict, getOrNotFound } from '../db/versioned';
import { audit } from '../audit/repository';
import { getBom } from '../boms/repository';
import { plannedStress } from '../boms/rollups';
import { acceptedEncoding } from '../http/encoding';
import { CAUTION_TEXT } from '../derating';
import { parseLimits, policyView, defaultPolicyId, type PolicyRow } from './policies';
import { stressOf, lineOf } from './service';
import { alternativesFor, swapPart } from './alternatives';

export const stressRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/stress-policies', access: 'policies.read', tag: 'Stress policies',
    summary: 'Stress policies: the allowed fraction of each rating, each limit with its source and confidence.',
    handler: async ({ auth, deps }) => {
      const def = await defaultPolicyId(deps.db, auth.workspaceId);
      const rows = (await scoped(deps.db, 'stress_policies', auth.workspaceId).orderBy('id')) as PolicyRow[];
      return { items: rows.map((p) => policyView(p, def)), nextCursor: null, caution: CAUTION_TEXT };
    },
  }),
  route({
    method: 'post', path: '/api/stress-policies', access: 'policies.write', tag: 'Stress policies', status: 201,
    summary: 'Add a policy (usually a copy of a seeded one with edited limits).', body: policyCreateBody,
    handler: async ({ auth, body, deps }) => {
      const limits = parseLimits(body.limits);
      return deps.db.transaction(async (trx) => {
        const [row] = await trx('stress_policies').insert({ workspaceId: auth.workspaceId, name: body.name, notes: body.notes, limits: JSON.stringify(limits) }).returning('*');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'stress_policy', entityId: row.id, changes: body });
        return policyView(row, await defaultPolicyId(trx, auth.workspaceId));
      });
    },
  }),
  route({
    method: 'get', path: '/api/stress-policies/:id', access: 'policies.read', tag: 'Stress policies',
    summary: 'One stress policy.', params: idParams,
    handler: async ({ auth, params, deps }) => policyView(await getOrNotFound(deps.db, 'stress_policies', auth.workspaceId, params.id, 'stress policy'), await defaultPolicyId(deps.db, auth.workspaceId)),
  }),
  route({
    method: 'patch', path: '/api/stress-policies/:id', access: 'policies.write', tag: 'Stress policies',
    summary: 'Edit a stress policy (send the version you read).', params: idParams, body: policyPatchBody,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const { version, ...changes } = body;
        const cols: Record<string, unknown> = { ...changes };
        if (changes.limits) cols.limits = JSON.stringify(parseLimits(changes.limits));
        const row = await updateOrConflict<PolicyRow>(trx, 'stress_policies', auth.workspaceId, params.id, version, cols, 'stress policy');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'stress_policy', entityId: params.id, changes });
        return policyView(row, await defaultPolicyId(trx, auth.workspaceId));
      }),
  }),
  route({
    method: 'post', path: '/api/stress-policies/:id/default', access: 'policies.write', tag: 'Stress policies',
    summary: "Make a policy the workspace default (BOMs without their own policy use it).", params: idParams,
    handler: async ({ auth, params, deps }) => {
      await getOrNotFound(deps.db, 'stress_policies', auth.workspaceId, params.id, 'stress policy');
      await deps.db('workspaces').where({ id: auth.workspaceId }).update({ defaultStressPolicyId: params.id });
      await audit(deps.db, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'default', entity: 'stress_policy', entityId: params.id });
      return { defaultStressPolicyId: params.id };
    },
  }),
  route({
    method: 'get', path: '/api/boms/:id/stress', access: 'boms.read', tag: 'Stress check',
    summary: "The stress check: every rated line's checks at its operating point under the BOM's policy (applied, rated, ratio, limit, status, formula), the line's worst status, a tally and the caution.",
    params: idParams,
    handler: async ({ req, res, auth, params, deps }) => {
      // The same URL may go compressed or not, by the request's Accept-Encoding.
      res.vary('Accept-Encoding');
      return plannedStress(deps, auth.workspaceId, params.id, acceptedEncoding(req));
    },
  }),
  route({
    method: 'post', path: '/api/boms/:id/lines/:lineId/waivers', access: 'boms.write', tag: 'Stress check', status: 201,
    summary: 'Record a written waiver for a line beyond the policy (who, when, why); kept in the audit log. Over-rating lines cannot be waived.',
    params: lineParams, body: waiverBody,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const bom = await getBom(trx, auth.workspaceId, params.id);
        await lineOf(trx, auth.workspaceId, params.id, params.lineId);
        const s = await stressOf(trx, auth.workspaceId, bom);
        const line = s.lines.find((l) => l.lineId === params.lineId);
        if (!line) throw errors.validation('This line has no stress checks to waive.');
        if (line.status === 'over_rating') throw errors.conflict('A line over its absolute rating cannot be waived; change the part or the circuit.');
        if (line.status !== 'beyond_policy') throw errors.conflict('Only a line beyond the policy needs a waiver.');
        const [row] = await trx('stress_waivers').insert({ workspaceId: auth.workspaceId, bomId: params.id, lineId: params.lineId, policyId: s.policyId, reason: body.reason, waivedBy: auth.userId }).returning('*');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'waive', entity: 'line', entityId: params.lineId, changes: { bomId: params.id, reason: body.reason, checks: line.checks.filter((c) => c.status === 'beyond_policy').map((c) => c.check) } });
        return { id: row.id, lineId: params.lineId, reason: row.reason, createdAt: new Date(row.createdAt).toISOString() };
      }),
  }),
  route({
    method: 'get', path: '/api/boms/:id/lines/:lineId/alternatives', access: 'boms.read', tag: 'Stress check',
    summary: 'The cheapest parts that pass: same-category parts that pass at the line’s operating point, ranked by the BOM’s landed cost per unit with each on the line; for a passing line, only cheaper ones.',
    params: lineParams,
    handler: async ({ auth, params, deps }) => alternativesFor(deps, auth.workspaceId, params.id, params.lineId),
  }),
  route({
    method: 'post', path: '/api/boms/:id/lines/:lineId/swap', access: 'boms.write', tag: 'Stress check',
    summary: 'Put another part on the line (on a released BOM this makes the next revision and swaps there).',
    params: lineParams, body: swapBody,
    handler: async ({ auth, params, body, deps }) => swapPart(deps, auth, params.id, params.lineId, body.partId, body.version),
  }),
];

