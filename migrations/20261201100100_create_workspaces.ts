import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('workspaces', (t) => {
    t.bigIncrements('id');
    t.string('name', 120).notNullable();
    // Reference-rate feeds publish against EUR, so cross rates go through it by default.
    t.string('pivot_currency', 3).notNullable().defaultTo('EUR');
    t.integer('version').notNullable().defaultTo(1);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('memberships', (t) => {
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.bigInteger('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.string('role', 16).notNullable();
    t.integer('version').notNullable().defaultTo(1);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['workspace_id', 'user_id']);
    t.index(['user_id']);
  });
  await knex.raw(
    "ALTER TABLE memberships ADD CONSTRAINT memberships_role_check CHECK (role IN ('owner','designer','buyer','viewer'))",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('memberships');
  await knex.schema.dropTable('workspaces');
}
