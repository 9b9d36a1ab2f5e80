import type { Knex } from 'knex';
import { seedStressPolicies } from '../server/stress/seed-policies';

// Workspaces made before stress policies existed get the three seeded policies too.
export async function up(knex: Knex): Promise<void> {
  const workspaces = (await knex('workspaces').whereNull('default_stress_policy_id').select('id')) as { id: string }[];
  for (const ws of workspaces) await seedStressPolicies(knex, ws.id);
}

export async function down(): Promise<void> {
  // Nothing to undo: the policies go with the table in the previous migration's down.
}
