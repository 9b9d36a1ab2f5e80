import type { Knex } from 'knex';
import { SEEDED_POLICIES, DEFAULT_POLICY_ID } from '../derating';

/** Every workspace starts with Shelf-grade (its default), Careful and Hi-rel, each limit with its source. */
export async function seedStressPolicies(db: Knex | Knex.Transaction, workspaceId: string): Promise<void> {
  const rows = (await db('stress_policies')
    .insert(SEEDED_POLICIES.map((p) => ({ workspaceId, name: p.name, seededFrom: p.id, limits: JSON.stringify(p.limits) })))
    .onConflict(['workspace_id', 'name'])
    .ignore()
    .returning(['id', 'seededFrom'])) as { id: string; seededFrom: string }[];
  const def = rows.find((r) => r.seededFrom === DEFAULT_POLICY_ID);
  if (def) await db('workspaces').where({ id: workspaceId }).whereNull('defaultStressPolicyId').update({ defaultStressPolicyId: def.id });
}
