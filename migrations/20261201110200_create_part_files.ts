import type { Knex } from 'knex';

// Datasheet metadata; the bytes live in the S3-compatible object store under storage_key.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('part_files', (t) => {
    t.bigIncrements('id');
    t.bigInteger('workspace_id').notNullable();
    t.bigInteger('part_id').notNullable();
    t.string('filename', 200).notNullable();
    t.string('content_type', 80).notNullable();
    t.bigInteger('size_bytes').notNullable();
    t.string('sha256', 64).notNullable();
    t.string('storage_key', 200).notNullable().unique();
    t.bigInteger('uploaded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(['workspace_id', 'part_id']).references(['workspace_id', 'id']).inTable('parts').onDelete('CASCADE');
    t.index(['workspace_id', 'part_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('part_files');
}
