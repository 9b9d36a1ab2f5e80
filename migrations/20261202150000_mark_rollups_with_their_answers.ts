import type { Knex } from 'knex';

/**
 * The time the compressed answers and the stress tally of a roll-up were written, set in
 * the same statement as `computed_at`. A roll-up counts as complete only while the two are
 * equal. A writer that does not know these columns (an older server during a rolling
 * deploy) updates `computed_at` and the result but not them, and its row is then computed
 * again instead of being served with another computation's answers.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => t.timestamp('answers_computed_at', { useTz: true }));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => t.dropColumn('answers_computed_at'));
}
