import type { Knex } from 'knex';
import { hashPassword } from '../server/auth/passwords';
import { seedStressPolicies } from '../server/stress/seed-policies';

/**
 * DEMO DATA — the invented importer Tinbell Gadgets and one login per role.
 * Idempotent: runs on every `npm start` and does nothing once the workspace exists.
 */
export const demoPassword = 'tinbell-demo-2026';
export const demoLogins = [
  { email: 'owner@tinbell.example', name: 'Ada Tinbell', role: 'owner' },
  { email: 'designer@tinbell.example', name: 'Dev Okafor', role: 'designer' },
  { email: 'buyer@tinbell.example', name: 'Bea Lindqvist', role: 'buyer' },
  { email: 'viewer@tinbell.example', name: 'Vic Moreau', role: 'viewer' },
] as const;
export const demoWorkspaceName = 'Tinbell Gadgets (demo)';

export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('workspaces').where({ name: demoWorkspaceName }).first();
  if (existing) return;
  const passwordHash = await hashPassword(demoPassword);
  await knex.transaction(async (trx) => {
    // The demo shows every feature, so it runs on the Factory plan.
    const [ws] = await trx('workspaces').insert({ name: demoWorkspaceName, plan: 'factory', billingStatus: 'active' }).returning('id');
    await seedStressPolicies(trx, ws.id);
    for (const login of demoLogins) {
      const [user] = await trx('users')
        .insert({ email: login.email, name: login.name, passwordHash })
        .onConflict('email')
        .merge()
        .returning('id');
      await trx('memberships').insert({ workspaceId: ws.id, userId: user.id, role: login.role }).onConflict(['workspace_id', 'user_id']).ignore();
    }
  });
}
