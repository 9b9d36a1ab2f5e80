import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import PgBoss from 'pg-boss';
import { createTestDatabase, type TestDatabase } from '../../tests/helpers/db';
import { ensureQueue } from './queue';

let database: TestDatabase;
const bosses: PgBoss[] = [];
beforeAll(async () => {
  database = await createTestDatabase();
  // Several servers on one new database, as `npm start` runs one per core.
  for (let i = 0; i < 4; i++) bosses.push(new PgBoss({ connectionString: database.url, schema: 'pgboss', max: 2, supervise: false, schedule: false }));
  for (const b of bosses) await b.start();
}, 60_000);
afterAll(async () => {
  for (const b of bosses) await b.stop({ graceful: false, wait: true, timeout: 2000 }).catch(() => undefined);
  await database.drop();
});

describe('job queues', () => {
  it('are made once when several servers create the same queues at the same moment', async () => {
    const names = Array.from({ length: 3 }, (_, i) => `race-${i}`);
    await Promise.all(bosses.flatMap((b) => names.map((n) => ensureQueue(b, n, { retryLimit: 1 }))));
    const made = await database.db.raw(`SELECT name FROM pgboss.queue WHERE name LIKE 'race-%' ORDER BY name`);
    expect(made.rows.map((r: { name: string }) => r.name)).toEqual(names);
  }, 60_000);
});
