import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('rfqs', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable().references('workspaces.id').onDelete('CASCADE');
    t.string('title', 160).notNullable();
    t.bigInteger('bom_id');
    t.specificType('quantities', 'integer[]').notNullable();
    t.date('reply_by').notNullable();
    t.string('state', 8).notNullable().defaultTo('open');
    t.text('message').notNullable().defaultTo('');
    t.bigInteger('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('closed_at', { useTz: true });
    t.integer('version').notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.unique(['workspace_id', 'id']);
    t.foreign(['workspace_id', 'bom_id']).references(['workspace_id', 'id']).inTable('boms').onDelete('SET NULL (bom_id)');
  });
  await knex.raw(`ALTER TABLE rfqs ADD CONSTRAINT rfqs_state_check CHECK (state IN ('open','closed'))`);
  await knex.schema.createTable('rfq_items', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('rfq_id').notNullable();
    t.bigInteger('part_id').notNullable();
    t.string('note', 500).notNullable().defaultTo('');
    t.foreign(['workspace_id', 'rfq_id']).references(['workspace_id', 'id']).inTable('rfqs').onDelete('CASCADE');
    t.foreign(['workspace_id', 'part_id']).references(['workspace_id', 'id']).inTable('parts').onDelete('RESTRICT');
    t.unique(['rfq_id', 'part_id']);
    t.unique(['workspace_id', 'id']);
  });
  // One private link per supplier and RFQ: the token is stored hashed and expires.
  await knex.schema.createTable('rfq_recipients', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('rfq_id').notNullable();
    t.bigInteger('supplier_id').notNullable();
    t.string('token_hash', 64).notNullable().unique();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.string('status', 10).notNullable().defaultTo('sent');
    t.timestamp('sent_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('opened_at', { useTz: true });
    t.timestamp('answered_at', { useTz: true });
    t.timestamp('reminded_at', { useTz: true });
    t.foreign(['workspace_id', 'rfq_id']).references(['workspace_id', 'id']).inTable('rfqs').onDelete('CASCADE');
    t.foreign(['workspace_id', 'supplier_id']).references(['workspace_id', 'id']).inTable('suppliers').onDelete('RESTRICT');
    t.unique(['rfq_id', 'supplier_id']);
  });
  await knex.raw(`ALTER TABLE rfq_recipients ADD CONSTRAINT rfq_recipients_status_check CHECK (status IN ('sent','opened','answered','declined'))`);
  await knex.schema.createTable('rfq_answers', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('recipient_id').notNullable().references('rfq_recipients.id').onDelete('CASCADE');
    t.bigInteger('item_id').notNullable();
    t.boolean('declined').notNullable().defaultTo(false);
    t.bigInteger('quote_id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(['workspace_id', 'item_id']).references(['workspace_id', 'id']).inTable('rfq_items').onDelete('CASCADE');
    t.unique(['recipient_id', 'item_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('rfq_answers');
  await knex.schema.dropTable('rfq_recipients');
  await knex.schema.dropTable('rfq_items');
  await knex.schema.dropTable('rfqs');
}
