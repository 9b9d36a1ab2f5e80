import type { Knex } from 'knex';

/**
 * The stored cost roll and stress check also kept gzip-compressed, as sent to a client
 * that accepts gzip (every browser): a 1,000-line BOM's answers are about 1 MB each as
 * text and a tenth of that compressed once, when the roll-up is stored, instead of on
 * every read. EXTERNAL storage: PostgreSQL would only try to compress them again.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => {
    t.binary('result_gzip');
    t.binary('check_gzip');
  });
  await knex.raw('ALTER TABLE cost_rollups ALTER COLUMN result_gzip SET STORAGE EXTERNAL, ALTER COLUMN check_gzip SET STORAGE EXTERNAL');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => {
    t.dropColumn('result_gzip');
    t.dropColumn('check_gzip');
  });
}
