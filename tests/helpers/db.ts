import { randomBytes } from 'node:crypto';
import { createDb, type Db } from '../../server/db/knex';

export interface TestDatabase {
  db: Db;
  url: string;
  name: string;
  drop(): Promise<void>;
}

const adminUrl = () => {
  const url = process.env.FARTHING_TEST_ADMIN_URL;
  if (!url) throw new Error('FARTHING_TEST_ADMIN_URL is not set: run the tests with `npm test` or `npx vitest`');
  return url;
};

/** A fresh database cloned from the migrated template: real PostgreSQL, no mocks. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const template = process.env.FARTHING_TEST_TEMPLATE ?? 'missing_template';
  // The run's pid (the template's suffix) lets a later run clean up after a crash.
  const name = `t_${template.slice(4)}_${randomBytes(5).toString('hex')}`;
  const admin = createDb(adminUrl());
  for (let attempt = 0; ; attempt++) {
    try {
      await admin.raw(`CREATE DATABASE "${name}" TEMPLATE "${template}"`);
      break;
    } catch (err) {
      // Two clones at the same instant can collide on the template; try again shortly.
      if (attempt > 10) throw err;
      await new Promise((r) => setTimeout(r, 100 + Math.random() * 200));
    }
  }
  await admin.destroy();
  const url = adminUrl().replace(/\/[^/]*$/, `/${name}`);
  const db = createDb(url);
  return {
    db,
    url,
    name,
    drop: async () => {
      await db.destroy();
      const a = createDb(adminUrl());
      await a.raw(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await a.destroy();
    },
  };
}

/**
 * Every table's row count and content checksum: proves a rejected request wrote nothing.
 * Left out: sessions, rate-limit counters and cost roll-ups, which the server keeps up to
 * date by itself (a roll-up refresh may land at any time).
 */
export async function snapshot(db: Db): Promise<Record<string, string>> {
  const { rows } = await db.raw(
    `SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_type = 'BASE TABLE' AND table_name NOT IN ('knex_migrations','knex_migrations_lock','session','rate_limits','cost_rollups') ORDER BY 1`,
  );
  const out: Record<string, string> = {};
  for (const { tableName } of rows as { tableName: string }[]) {
    const r = await db.raw(`SELECT count(*) AS n, coalesce(md5(string_agg(t::text, '|' ORDER BY t::text)), '') AS sum FROM "${tableName}" t`);
    out[tableName] = `${r.rows[0].n}:${r.rows[0].sum}`;
  }
  return out;
}
