/**
 * Once per test run: the private test cluster (.data/pg-test, its own port) and a
 * template database migrated to the latest schema. Each test file clones the template
 * into a database of its own, so files run in parallel without touching each other.
 */
import type { TestProject } from 'vitest/node';
import { prepareDatabase, type PreparedDatabase } from '../../scripts/lib/database';
import { createDb } from '../../server/db/knex';
import { migrateLatest } from '../../server/db/migrate';
import PgBoss from 'pg-boss';

let prepared: PreparedDatabase | null = null;

export default async function setup(_project: TestProject): Promise<() => void> {
  // Knex imports the .ts migrations itself, outside Vite's transform: let tsx load them.
  const { register } = await import('tsx/esm/api');
  const unregister = register();
  prepared = prepareDatabase({ folder: 'pg-test', port: Number(process.env.FARTHING_TEST_PG_PORT ?? 54339), database: 'postgres', log: () => undefined });
  // Names carry this run's pid, so two runs on one cluster never collide.
  const templateName = `tpl_${process.pid}`;
  const admin = createDb(prepared.url);
  const { rows } = await admin.raw(`SELECT datname FROM pg_database WHERE datname ~ '^(t|tpl)_[0-9]+'`);
  for (const { datname } of rows as { datname: string }[]) {
    const pid = Number(/^(?:t|tpl)_(\d+)/.exec(datname)![1]);
    if (!isAlive(pid)) await admin.raw(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
  }
  await admin.raw(`CREATE DATABASE "${templateName}"`);
  await admin.destroy();
  const template = createDb(prepared.url.replace(/\/[^/]*$/, `/${templateName}`));
  await migrateLatest(template);
  await template.destroy();
  // The job queue's own schema, made once here so every clone starts with it.
  const boss = new PgBoss({ connectionString: prepared.url.replace(/\/[^/]*$/, `/${templateName}`), schema: 'pgboss', supervise: false, schedule: false });
  await boss.start();
  await boss.stop({ graceful: false, wait: true });
  await unregister();
  process.env.FARTHING_TEST_ADMIN_URL = prepared.url;
  process.env.FARTHING_TEST_TEMPLATE = templateName;
  return async () => {
    const a = createDb(prepared!.url);
    const { rows: mine } = await a.raw(`SELECT datname FROM pg_database WHERE datname ~ ?`, [`^(t|tpl)_${process.pid}(_|$)`]);
    for (const { datname } of mine as { datname: string }[]) await a.raw(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
    await a.destroy();
    prepared?.stop();
  };
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}
