import type { Knex } from 'knex';

/**
 * Every change to an input of a cost roll (parts, quotes, price breaks, suppliers, FX rates,
 * profiles, BOMs, lines) bumps its workspace's costing epoch, in the same transaction, by
 * statement-level triggers. A stored roll-up is fresh while its epoch, date and quantity
 * still match; the BOM list reads it without recomputing.
 */
const tables = ['parts', 'quotes', 'price_breaks', 'suppliers', 'fx_rates', 'landed_cost_profiles', 'boms', 'bom_lines'];
const events = [
  ['INSERT', 'NEW TABLE AS changed'],
  ['UPDATE', 'NEW TABLE AS changed'],
  ['DELETE', 'OLD TABLE AS changed'],
] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('workspaces', (t) => {
    t.bigInteger('costing_epoch').notNullable().defaultTo(0);
  });
  await knex.raw(`
    CREATE FUNCTION bump_costing_epoch() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE workspaces SET costing_epoch = costing_epoch + 1
       WHERE id IN (SELECT DISTINCT workspace_id FROM changed);
      RETURN NULL;
    END $$`);
  for (const table of tables) {
    for (const [event, ref] of events) {
      await knex.raw(
        `CREATE TRIGGER ${table}_costing_${event.toLowerCase()} AFTER ${event} ON ${table}
           REFERENCING ${ref} FOR EACH STATEMENT EXECUTE FUNCTION bump_costing_epoch()`,
      );
    }
  }
  await knex.schema.createTable('cost_rollups', (t) => {
    t.bigInteger('bom_id').primary();
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('epoch').notNullable();
    t.date('costing_date').notNullable();
    t.integer('qty').notNullable();
    t.string('currency', 3).notNullable();
    t.decimal('landed_per_unit', 20, 10);
    t.decimal('target_unit_cost', 18, 6);
    t.integer('left_out').notNullable().defaultTo(0);
    t.integer('warnings').notNullable().defaultTo(0);
    t.jsonb('totals').notNullable();
    t.timestamp('computed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(['workspace_id', 'bom_id']).references(['workspace_id', 'id']).inTable('boms').onDelete('CASCADE');
  });
  await knex.schema.createTable('cost_snapshots', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('bom_id').notNullable();
    t.string('name', 120).notNullable();
    t.integer('qty').notNullable();
    t.date('costing_date').notNullable();
    t.jsonb('result').notNullable();
    t.bigInteger('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(['workspace_id', 'bom_id']).references(['workspace_id', 'id']).inTable('boms').onDelete('CASCADE');
    t.index(['workspace_id', 'bom_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('cost_snapshots');
  await knex.schema.dropTable('cost_rollups');
  for (const table of tables) for (const [event] of events) await knex.raw(`DROP TRIGGER ${table}_costing_${event.toLowerCase()} ON ${table}`);
  await knex.raw('DROP FUNCTION bump_costing_epoch()');
  await knex.schema.alterTable('workspaces', (t) => t.dropColumn('costing_epoch'));
}
