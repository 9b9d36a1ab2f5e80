/**
 * Once per test run: the private test cluster (.data/pg-test, its own port) and a
 * template database migrated to the latest schema. Each test file clones the template
 * into a database of its own, so files run in parallel without touching each other.
 */
import type { TestProject } from 'vitest/node';
import { prepareDatabase, type PreparedDatabase } from '../../scripts/lib/database';
import { createDb } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';

export const templateName = 'farthing_template';
let prepared: PreparedDatabase | null = null;

export default async function setup(_project: TestProject): Promise<() => void> {
  // Knex imports the .ts migrations itself, outside Vite's transform: let tsx load them.
  const { register } = await import('tsx/esm/api');
  const unregister = register();
  prepared = prepareDatabase({ folder: 'pg-test', port: Number(process.env.FARTHING_TEST_PG_PORT ?? 54339), database: 'postgres', log: () => undefined });
  const admin = createDb(prepared.url);
  // Leftovers of an interrupted run: other test databases and an old template.
  const { rows } = await admin.raw(`SELECT datname FROM pg_database WHERE datname LIKE 't\\_%' OR datname = ?`, [templateName]);
  for (const r of rows as { datname: string }[]) await admin.raw(`DROP DATABASE IF EXISTS "${r.datname}" WITH (FORCE)`);
  await admin.raw(`CREATE DATABASE "${templateName}"`);
  await admin.destroy();
  const template = createDb(prepared.url.replace(/\/[^/]*$/, `/${templateName}`));
  await migrateLatest(template);
  await template.destroy();
  await unregister();
  process.env.FARTHING_TEST_ADMIN_URL = prepared.url;
  return () => prepared?.stop();
}
