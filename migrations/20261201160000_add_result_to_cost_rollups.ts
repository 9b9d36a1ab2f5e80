import type { Knex } from 'knex';

// The whole cost roll at the planned quantity is kept, so the Cost roll tab reads it too.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => {
    t.jsonb('result');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => t.dropColumn('result'));
}
