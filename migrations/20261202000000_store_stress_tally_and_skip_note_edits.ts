import type { Knex } from 'knex';

/**
 * The stored roll-up also keeps the BOM's stress tally (the BOM list read it by checking
 * every line of every BOM on each request), so the epoch now also follows the stress
 * inputs: operating points and stress policies. And a line update bumps it only when a
 * column the cost roll or the stress check reads changed: a note changes neither, so the
 * roll-up stays fresh. PostgreSQL refuses column lists on triggers with transition
 * tables, so the trigger compares the old and new rows itself.
 */
const costingColumns = [
  'bom_id', 'position', 'kind', 'ref_des', 'part_id', 'qty_per_unit', 'attrition_pct', 'pinned_quote_id', 'dnp', 'unit_cost', 'one_time_cost', 'currency',
  'op_voltage_v', 'op_current_a', 'op_power_w', 'op_ambient_c',
];
const policyEvents = [
  ['INSERT', 'NEW TABLE AS changed'],
  ['UPDATE', 'NEW TABLE AS changed'],
  ['DELETE', 'OLD TABLE AS changed'],
] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cost_rollups', (t) => t.jsonb('stress'));
  // BOMs without a policy of their own are checked against the workspace default.
  await knex.raw(`
    CREATE FUNCTION bump_costing_epoch_for_default_policy() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF NEW.default_stress_policy_id IS DISTINCT FROM OLD.default_stress_policy_id THEN
        NEW.costing_epoch := NEW.costing_epoch + 1;
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER workspaces_default_policy_costing BEFORE UPDATE OF default_stress_policy_id ON workspaces
    FOR EACH ROW EXECUTE FUNCTION bump_costing_epoch_for_default_policy()`);
  for (const [event, ref] of policyEvents) {
    await knex.raw(`CREATE TRIGGER stress_policies_costing_${event.toLowerCase()} AFTER ${event} ON stress_policies
      REFERENCING ${ref} FOR EACH STATEMENT EXECUTE FUNCTION bump_costing_epoch()`);
  }
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
  await knex.raw('DROP TRIGGER workspaces_default_policy_costing ON workspaces');
  await knex.raw('DROP FUNCTION bump_costing_epoch_for_default_policy()');
  for (const [event] of policyEvents) await knex.raw(`DROP TRIGGER stress_policies_costing_${event.toLowerCase()} ON stress_policies`);
  await knex.schema.alterTable('cost_rollups', (t) => t.dropColumn('stress'));
  await knex.raw('DROP TRIGGER bom_lines_costing_update ON bom_lines');
  await knex.raw(`CREATE TRIGGER bom_lines_costing_update AFTER UPDATE ON bom_lines
    REFERENCING NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION bump_costing_epoch()`);
  await knex.raw('DROP FUNCTION bump_costing_epoch_for_line_updates()');
}
