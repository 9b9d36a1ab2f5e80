import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('boms', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    // Revisions of one product share a family; each revision is its own row with its own lines.
    t.bigInteger('family_id').notNullable();
    t.integer('revision').notNullable().defaultTo(1);
    t.string('name', 120).notNullable();
    t.string('state', 12).notNullable().defaultTo('draft');
    t.string('reporting_currency', 3).notNullable();
    t.bigInteger('profile_id');
    t.bigInteger('stress_policy_id');
    t.decimal('ambient_c', 6, 2).notNullable().defaultTo(25);
    t.integer('planned_qty').notNullable().defaultTo(10000);
    t.decimal('target_unit_cost', 18, 6);
    t.integer('amortisation_qty');
    t.jsonb('shelf').notNullable().defaultTo('{}');
    t.text('notes').notNullable().defaultTo('');
    t.timestamp('released_at', { useTz: true });
    t.bigInteger('released_by').references('users.id').onDelete('SET NULL');
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.unique(['workspace_id', 'id']);
    t.unique(['workspace_id', 'family_id', 'revision']);
    t.foreign(['workspace_id', 'profile_id']).references(['workspace_id', 'id']).inTable('landed_cost_profiles').onDelete('RESTRICT');
  });
  await knex.raw(`ALTER TABLE boms ADD CONSTRAINT boms_state_check CHECK (state IN ('draft','in_review','released'))`);
  await knex.raw(`ALTER TABLE boms ADD CONSTRAINT boms_qty_check CHECK (planned_qty >= 1 AND (amortisation_qty IS NULL OR amortisation_qty >= 1))`);

  await knex.schema.createTable('bom_lines', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('bom_id').notNullable();
    t.integer('position').notNullable().defaultTo(0);
    t.string('kind', 12).notNullable().defaultTo('part');
    t.text('ref_des').notNullable().defaultTo('');
    t.bigInteger('part_id');
    t.decimal('qty_per_unit', 18, 6).notNullable().defaultTo(1);
    t.decimal('attrition_pct', 9, 4);
    t.bigInteger('pinned_quote_id');
    t.boolean('dnp').notNullable().defaultTo(false);
    t.string('note', 1000).notNullable().defaultTo('');
    t.decimal('unit_cost', 18, 6);
    t.decimal('one_time_cost', 20, 6);
    t.string('currency', 3);
    // Operating point for the stress check (physical quantities, not money).
    t.double('op_voltage_v');
    t.double('op_current_a');
    t.double('op_power_w');
    t.double('op_ambient_c');
    // An imported row that matched no library part keeps its text until resolved.
    t.string('unresolved', 200);
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.foreign(['workspace_id', 'bom_id']).references(['workspace_id', 'id']).inTable('boms').onDelete('CASCADE');
    t.foreign(['workspace_id', 'part_id']).references(['workspace_id', 'id']).inTable('parts').onDelete('RESTRICT');
    t.foreign(['workspace_id', 'pinned_quote_id']).references(['workspace_id', 'id']).inTable('quotes').onDelete('SET NULL (pinned_quote_id)');
    t.index(['workspace_id', 'bom_id', 'position']);
    t.index(['workspace_id', 'part_id']);
  });
  await knex.raw(`ALTER TABLE bom_lines ADD CONSTRAINT bom_lines_kind_check CHECK (kind IN ('part','labour','packaging','test','tooling','other'))`);
  await knex.raw(`ALTER TABLE bom_lines ADD CONSTRAINT bom_lines_qty_check CHECK (qty_per_unit > 0)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('bom_lines');
  await knex.schema.dropTable('boms');
}
