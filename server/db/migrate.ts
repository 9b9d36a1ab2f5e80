import { fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';
import type { Knex } from 'knex';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

export const migrationConfig: Knex.MigratorConfig = {
  directory: join(root, 'migrations'),
  loadExtensions: ['.ts'],
  tableName: 'knex_migrations',
};

export async function migrateLatest(db: Knex): Promise<string[]> {
  const [, applied] = (await db.migrate.latest(migrationConfig)) as [number, string[]];
  return applied;
}

export const seedConfig: Knex.SeederConfig = {
  directory: join(root, 'seeds'),
  loadExtensions: ['.ts'],
};
