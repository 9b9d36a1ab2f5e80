import type { Knex } from 'knex';

/**
 * A line update bumps the costing epoch only when a column the cost roll reads changed
 * (a note or an operating point does not change the cost, so the stored roll-up stays
 * fresh). PostgreSQL refuses column lists on triggers with transition tables, so the
 * trigger compares the old and new rows itself.
 */
const costingColumns = ['bom_id', 'position', 'kind', 'ref_des', 'part_id', 'qty_per_unit', 'attrition_pct', 'pinned_quote_id', 'dnp', 'unit_cost', 'one_time_cost', 'currency'];

export async function up(knex: Knex): Promise<void> {
  const o = costingColumns.map((c) => `o.${c}`).join(', ');
  const n = costingColumns.map((c) => `n.${c}`).join(', ');
  await knex.raw(`
    CREATE FUNCTION bump_costing_epoch_for_line_updates() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE workspaces SET costing_epoch = costing_epoch + 1
       WHERE id IN (SELECT DISTINCT n.workspace_id FROM changed n JOIN previous o ON o.id = n.id
                     WHERE (${o}) IS DISTINCT FROM (${n}));
      RETURN NULL;
    END $$`);
  await knex.raw('DROP TRIGGER bom_lines_costing_update ON bom_lines');
  await knex.raw(`CREATE TRIGGER bom_lines_costing_update AFTER UPDATE ON bom_lines
    REFERENCING OLD TABLE AS previous NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION bump_costing_epoch_for_line_updates()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER bom_lines_costing_update ON bom_lines');
  await knex.raw(`CREATE TRIGGER bom_lines_costing_update AFTER UPDATE ON bom_lines
    REFERENCING NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION bump_costing_epoch()`);
  await knex.raw('DROP FUNCTION bump_costing_epoch_for_line_updates()');
}
