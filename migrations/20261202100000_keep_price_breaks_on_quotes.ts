import type { Knex } from 'knex';

/**
 * Each quote also carries its price breaks as one text ("minQty price minQty price …",
 * ascending minQty), kept by statement-level triggers on price_breaks in the same
 * transaction. The cost roll reads a large BOM's 40,000 quotes with their 200,000 breaks;
 * aggregating the breaks per quote at read time was most of that read. price_breaks stays
 * the table every write goes to; this column is only a copy for reading.
 */
// The quotes are locked first: a concurrent writer of the same quote's breaks then finishes
// before the UPDATE, whose new snapshot (read committed) sees that writer's rows too.
const refresh = (idsFrom: string) => `
  PERFORM 1 FROM quotes WHERE id IN (${idsFrom}) ORDER BY id FOR UPDATE;
  UPDATE quotes q
     SET breaks_text = (SELECT string_agg(pb.min_qty || ' ' || pb.unit_price, ' ' ORDER BY pb.min_qty)
                          FROM price_breaks pb WHERE pb.quote_id = q.id)
   WHERE q.id IN (${idsFrom})`;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('quotes', (t) => t.text('breaks_text'));
  await knex.raw(`
    CREATE FUNCTION keep_quote_breaks() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      ${refresh('SELECT DISTINCT quote_id FROM changed')};
      RETURN NULL;
    END $$`);
  // An update may move a break to another quote: both the old and the new quote change.
  await knex.raw(`
    CREATE FUNCTION keep_quote_breaks_on_update() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      ${refresh('SELECT quote_id FROM changed UNION SELECT quote_id FROM was')};
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER price_breaks_keep_quote_insert AFTER INSERT ON price_breaks
    REFERENCING NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION keep_quote_breaks()`);
  await knex.raw(`CREATE TRIGGER price_breaks_keep_quote_delete AFTER DELETE ON price_breaks
    REFERENCING OLD TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION keep_quote_breaks()`);
  await knex.raw(`CREATE TRIGGER price_breaks_keep_quote_update AFTER UPDATE ON price_breaks
    REFERENCING OLD TABLE AS was NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION keep_quote_breaks_on_update()`);
  await knex.raw(`
    CREATE FUNCTION clear_quote_breaks() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE quotes SET breaks_text = NULL WHERE breaks_text IS NOT NULL;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER price_breaks_keep_quote_truncate AFTER TRUNCATE ON price_breaks
    FOR EACH STATEMENT EXECUTE FUNCTION clear_quote_breaks()`);
  await knex.raw(`
    UPDATE quotes q
       SET breaks_text = (SELECT string_agg(pb.min_qty || ' ' || pb.unit_price, ' ' ORDER BY pb.min_qty)
                            FROM price_breaks pb WHERE pb.quote_id = q.id)`);
}

export async function down(knex: Knex): Promise<void> {
  for (const event of ['insert', 'delete', 'update', 'truncate']) await knex.raw(`DROP TRIGGER price_breaks_keep_quote_${event} ON price_breaks`);
  await knex.raw('DROP FUNCTION clear_quote_breaks()');
  await knex.raw('DROP FUNCTION keep_quote_breaks_on_update()');
  await knex.raw('DROP FUNCTION keep_quote_breaks()');
  await knex.schema.alterTable('quotes', (t) => t.dropColumn('breaks_text'));
}
