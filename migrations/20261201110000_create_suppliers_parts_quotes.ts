import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('suppliers', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.string('name', 120).notNullable();
    t.string('country', 2).notNullable();
    t.string('currency', 3).notNullable();
    t.string('default_incoterm', 3).notNullable();
    t.specificType('contact_emails', 'text[]').notNullable().defaultTo('{}');
    t.boolean('active').notNullable().defaultTo(true);
    t.text('notes').notNullable().defaultTo('');
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.unique(['workspace_id', 'name']);
    t.unique(['workspace_id', 'id']);
  });
  await knex.schema.createTable('parts', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.string('internal_pn', 40).notNullable();
    t.string('mpn', 80).notNullable().defaultTo('');
    t.string('manufacturer', 80).notNullable().defaultTo('');
    t.string('category', 16).notNullable();
    t.string('description', 500).notNullable().defaultTo('');
    t.string('package', 40).notNullable().defaultTo('');
    t.string('mount', 8).notNullable().defaultTo('smt');
    t.integer('pins').notNullable().defaultTo(2);
    t.string('hs_code', 10);
    t.decimal('unit_weight_g', 12, 4);
    t.jsonb('ratings').notNullable().defaultTo('{}');
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.unique(['workspace_id', 'internal_pn']);
    t.unique(['workspace_id', 'id']);
    t.index(['workspace_id', 'mpn']);
    t.index(['workspace_id', 'category']);
  });
  await knex.raw(`ALTER TABLE parts ADD CONSTRAINT parts_category_check CHECK (category IN
    ('resistor','capacitor','bjt','mosfet','diode','led','inductor','transformer','switch','battery','pcb','enclosure','wire','packaging','other'))`);
  await knex.raw(`ALTER TABLE parts ADD CONSTRAINT parts_mount_check CHECK (mount IN ('smt','tht','hand','none'))`);

  // Composite keys to (workspace_id, id) make a cross-workspace reference impossible in the schema itself.
  await knex.schema.createTable('quotes', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('part_id').notNullable();
    t.bigInteger('supplier_id').notNullable();
    t.string('currency', 3).notNullable();
    t.string('incoterm', 3).notNullable();
    t.bigInteger('moq').notNullable().defaultTo(1);
    t.bigInteger('order_multiple').notNullable().defaultTo(1);
    t.integer('lead_time_days');
    t.date('valid_from');
    t.date('valid_until');
    t.string('source', 8).notNullable().defaultTo('manual');
    t.string('note', 1000).notNullable().defaultTo('');
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.foreign(['workspace_id', 'part_id']).references(['workspace_id', 'id']).inTable('parts').onDelete('CASCADE');
    t.foreign(['workspace_id', 'supplier_id']).references(['workspace_id', 'id']).inTable('suppliers').onDelete('RESTRICT');
    t.unique(['workspace_id', 'id']);
    t.index(['workspace_id', 'part_id']);
    t.index(['workspace_id', 'supplier_id']);
  });
  await knex.raw(`ALTER TABLE quotes ADD CONSTRAINT quotes_moq_check CHECK (moq >= 1 AND order_multiple >= 1)`);
  await knex.raw(`ALTER TABLE quotes ADD CONSTRAINT quotes_source_check CHECK (source IN ('manual','import','rfq'))`);
  await knex.schema.createTable('price_breaks', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('quote_id').notNullable();
    t.bigInteger('min_qty').notNullable();
    t.decimal('unit_price', 18, 6).notNullable();
    t.foreign(['workspace_id', 'quote_id']).references(['workspace_id', 'id']).inTable('quotes').onDelete('CASCADE');
    t.unique(['quote_id', 'min_qty']);
  });
  await knex.raw(`ALTER TABLE price_breaks ADD CONSTRAINT price_breaks_positive CHECK (min_qty >= 1 AND unit_price > 0)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('price_breaks');
  await knex.schema.dropTable('quotes');
  await knex.schema.dropTable('parts');
  await knex.schema.dropTable('suppliers');
}
