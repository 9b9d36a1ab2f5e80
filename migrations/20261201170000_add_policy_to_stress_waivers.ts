import type { Knex } from 'knex';

// A waiver holds for the policy it was written under; a change of policy needs a new one.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('stress_waivers', (t) => {
    t.bigInteger('policy_id');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('stress_waivers', (t) => t.dropColumn('policy_id'));
}
