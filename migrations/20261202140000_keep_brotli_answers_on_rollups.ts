import type { Knex } from 'knex';

/**
 * The stored cost roll and stress check also kept brotli-compressed, for clients that
 * accept it (browsers do): a 1,000-line BOM's cost roll is about 930 KB as text, 98 KB as
 * gzip and 12 KB as brotli (quality 5), since brotli's window spans the repeated line
 * shapes that gzip's 32 KB window cannot.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => {
    t.binary('result_br');
    t.binary('check_br');
  });
  await knex.raw('ALTER TABLE cost_rollups ALTER COLUMN result_br SET STORAGE EXTERNAL, ALTER COLUMN check_br SET STORAGE EXTERNAL');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => {
    t.dropColumn('result_br');
    t.dropColumn('check_br');
  });
}
