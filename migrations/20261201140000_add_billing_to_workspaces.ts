import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('workspaces', (t) => {
    t.string('plan', 16).notNullable().defaultTo('bench');
    t.string('billing_status', 16).notNullable().defaultTo('none');
    t.string('stripe_customer_id', 64).unique();
    t.string('stripe_subscription_id', 64);
    t.timestamp('current_period_end', { useTz: true });
    t.boolean('cancel_at_period_end').notNullable().defaultTo(false);
    t.timestamp('past_due_since', { useTz: true });
  });
  await knex.raw(`ALTER TABLE workspaces ADD CONSTRAINT workspaces_plan_check CHECK (plan IN ('bench','workshop','factory'))`);
  // Each payment-service event is applied once: its id is the key.
  await knex.schema.createTable('billing_events', (t) => {
    t.string('id', 80).primary();
    t.string('type', 80).notNullable();
    t.bigInteger('workspace_id').references('workspaces.id').onDelete('SET NULL');
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('billing_events');
  await knex.schema.alterTable('workspaces', (t) => {
    t.dropColumns('plan', 'billing_status', 'stripe_customer_id', 'stripe_subscription_id', 'current_period_end', 'cancel_at_period_end', 'past_due_since');
  });
}
