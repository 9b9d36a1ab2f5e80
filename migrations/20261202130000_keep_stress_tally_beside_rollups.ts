import type { Knex } from 'knex';

/**
 * The stress tally in a column of its own: the BOM list reads it for every BOM on every
 * request, and reading it out of the stored stress check meant decompressing the whole
 * check (about 1 MB for a 1,000-line BOM) each time.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => t.jsonb('stress_tally'));
  await knex.raw(`UPDATE cost_rollups SET stress_tally = stress -> 'tally' WHERE stress IS NOT NULL`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => t.dropColumn('stress_tally'));
}
