import type { DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';
import { errors } from '../http/errors';
import { policyLimitsSchema, type StressPolicy } from '../derating';

export interface PolicyRow {
  id: string;
  name: string;
  seededFrom: string | null;
  limits: StressPolicy['limits'];
  notes: string;
  version: number;
}

export const policyView = (p: PolicyRow, defaultId: string | null) => ({
  id: p.id, name: p.name, seededFrom: p.seededFrom, limits: p.limits, notes: p.notes, version: p.version, isDefault: p.id === defaultId,
});

export function parseLimits(limits: unknown) {
  const r = policyLimitsSchema.safeParse(limits);
  if (!r.success) throw errors.validation('The policy limits are not valid.', r.error.issues.map((i) => ({ path: ['limits', ...i.path].join('.'), message: i.message })));
  return r.data;
}

export async function defaultPolicyId(db: DbOrTrx, workspaceId: string): Promise<string | null> {
  const ws = await db('workspaces').where({ id: workspaceId }).first('defaultStressPolicyId');
  return ws?.defaultStressPolicyId ?? null;
}

/** The policy a BOM is checked against: its own, else the workspace default. */
export async function policyFor(db: DbOrTrx, workspaceId: string, policyId: string | null): Promise<PolicyRow> {
  const id = policyId ?? (await defaultPolicyId(db, workspaceId));
  const row = id ? await scoped(db, 'stress_policies', workspaceId).andWhere({ id }).first() : undefined;
  if (!row) throw errors.conflict('This workspace has no stress policy; add one under Settings → Stress policies.');
  return row as PolicyRow;
}
