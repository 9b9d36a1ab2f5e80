import type { Knex } from 'knex';

// connect-pg-simple's own table layout, created here rather than at run time.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE TABLE session (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    )`);
  await knex.raw('CREATE INDEX session_expire_idx ON session (expire)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('session');
}
