import type { Knex } from 'knex';

// Tokens are stored as SHA-256 hashes: a leaked table does not leak usable links.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('invites', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.specificType('email', 'citext').notNullable();
    t.string('role', 16).notNullable();
    t.string('token_hash', 64).notNullable().unique();
    t.bigInteger('invited_by').references('users.id').onDelete('SET NULL');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('accepted_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['workspace_id']);
  });
  await knex.raw(
    "ALTER TABLE invites ADD CONSTRAINT invites_role_check CHECK (role IN ('owner','designer','buyer','viewer'))",
  );
  await knex.schema.createTable('password_resets', (t) => {
    t.bigIncrements('id');
    t.bigInteger('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.string('token_hash', 64).notNullable().unique();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('password_resets');
  await knex.schema.dropTable('invites');
}
