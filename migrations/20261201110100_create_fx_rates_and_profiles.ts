import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('fx_rates', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.date('date').notNullable();
    t.string('base', 3).notNullable();
    t.string('quote', 3).notNullable();
    t.decimal('rate', 20, 10).notNullable();
    t.string('source', 40).notNullable().defaultTo('manual');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['workspace_id', 'date', 'base', 'quote']);
  });
  await knex.raw(`ALTER TABLE fx_rates ADD CONSTRAINT fx_rates_positive CHECK (rate > 0 AND base <> quote)`);

  await knex.schema.createTable('landed_cost_profiles', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.string('name', 80).notNullable();
    t.string('currency', 3).notNullable();
    t.decimal('origin_pct', 9, 4).notNullable().defaultTo(0);
    t.decimal('freight_pct', 9, 4).notNullable().defaultTo(0);
    t.decimal('freight_per_shipment', 20, 6).notNullable().defaultTo(0);
    t.string('freight_currency', 3);
    t.integer('shipments').notNullable().defaultTo(1);
    t.string('freight_basis', 8).notNullable().defaultTo('value');
    t.decimal('insurance_pct', 9, 4).notNullable().defaultTo(0);
    t.string('duty_basis', 3).notNullable().defaultTo('CIF');
    t.jsonb('duty_rates').notNullable().defaultTo('[]');
    t.decimal('default_duty_pct', 9, 4).notNullable().defaultTo(0);
    t.decimal('fees_per_shipment', 20, 6).notNullable().defaultTo(0);
    t.decimal('destination_pct', 9, 4).notNullable().defaultTo(0);
    t.integer('max_lead_time_days');
    t.jsonb('attrition_pct').notNullable().defaultTo('{}');
    t.decimal('smt_rate_per_placement', 18, 6).notNullable().defaultTo(0);
    t.decimal('tht_rate_per_joint', 18, 6).notNullable().defaultTo(0);
    t.decimal('hand_rate_per_op', 18, 6).notNullable().defaultTo(0);
    t.text('notes').notNullable().defaultTo('');
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.unique(['workspace_id', 'name']);
    t.unique(['workspace_id', 'id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('landed_cost_profiles');
  await knex.schema.dropTable('fx_rates');
}
