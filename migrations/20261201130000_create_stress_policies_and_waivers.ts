import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stress_policies', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.string('name', 80).notNullable();
    // Which seeded policy this row started from (shelf-grade, careful, hi-rel), if any.
    t.string('seeded_from', 40);
    t.jsonb('limits').notNullable();
    t.text('notes').notNullable().defaultTo('');
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.unique(['workspace_id', 'name']);
    t.unique(['workspace_id', 'id']);
  });
  await knex.schema.alterTable('workspaces', (t) => {
    t.bigInteger('default_stress_policy_id');
  });
  await knex.schema.alterTable('boms', (t) => {
    t.foreign(['workspace_id', 'stress_policy_id']).references(['workspace_id', 'id']).inTable('stress_policies').onDelete('RESTRICT');
  });
  await knex.schema.createTable('stress_waivers', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('bom_id').notNullable();
    t.bigInteger('line_id').notNullable();
    t.text('reason').notNullable();
    t.bigInteger('waived_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(['workspace_id', 'bom_id']).references(['workspace_id', 'id']).inTable('boms').onDelete('CASCADE');
    t.index(['workspace_id', 'bom_id']);
  });
  await knex.raw(`ALTER TABLE stress_waivers ADD CONSTRAINT stress_waivers_reason_check CHECK (length(trim(reason)) >= 10)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stress_waivers');
  await knex.schema.alterTable('boms', (t) => t.dropForeign(['workspace_id', 'stress_policy_id']));
  await knex.schema.alterTable('workspaces', (t) => t.dropColumn('default_stress_policy_id'));
  await knex.schema.dropTable('stress_policies');
}
