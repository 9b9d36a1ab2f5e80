import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../helpers/app';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { makePart } from '../helpers/factories';
import { createDb } from '../../server/db/knex';

/**
 * A BOM import or bulk edit whose database connection is killed mid-way writes nothing of
 * itself, and the same request works when repeated.
 */
let t: TestApp;
let ws: RoleWorkspace;
let bomId: string;
beforeAll(async () => {
  t = await startTestApp();
  ws = await workspaceWithEveryRole(t, 'Interrupt Co');
  await makePart(ws.agents.owner, { internalPn: 'INT-1', mpn: 'INT-MPN' });
  bomId = (await ws.agents.designer.post('/api/boms').send({ name: 'Interrupted', reportingCurrency: 'USD' }).expect(201)).body.id;
});
afterAll(async () => t.close());

/** Kills the backend that is writing bom_lines in this test's database, as soon as it shows up. */
async function killWriterWhenSeen(timeoutMs = 20_000): Promise<boolean> {
  const admin = createDb(process.env.FARTHING_TEST_ADMIN_URL!);
  try {
    const until = Date.now() + timeoutMs;
    while (Date.now() < until) {
      const { rows } = await admin.raw(
        `SELECT pid FROM pg_stat_activity WHERE datname = ? AND (query ILIKE 'insert into "bom_lines"%' OR state = 'idle in transaction') AND pid <> pg_backend_pid()`,
        [t.database.name],
      );
      if (rows.length) {
        for (const r of rows) await admin.raw('SELECT pg_terminate_backend(?)', [r.pid]);
        return true;
      }
      await new Promise((r) => setTimeout(r, 5));
    }
    return false;
  } finally {
    await admin.destroy();
  }
}

const lineCount = async () => Number((await t.database.db('bom_lines').where({ bomId }).count('* as n').first())!.n);

describe('a write interrupted by a killed connection', () => {
  it('BOM import: nothing of it is written; repeating it works', async () => {
    const csv = ['Designator,Qty,MPN', ...Array.from({ length: 60_000 }, (_, i) => `R${i + 1},1,INT-MPN`)].join('\n');
    const attempt = ws.agents.designer.post(`/api/boms/${bomId}/import`).query({ commit: 'true' }).attach('file', Buffer.from(csv), 'big.csv');
    const [res, killed] = await Promise.all([attempt.then((r) => r), killWriterWhenSeen()]);
    expect(killed).toBe(true);
    expect(res.status, JSON.stringify(res.body)).toBeGreaterThanOrEqual(500);
    expect(res.body.error.code).toBe('database_unavailable');
    expect(await lineCount()).toBe(0);
    const again = await ws.agents.designer.post(`/api/boms/${bomId}/import`).query({ commit: 'true' }).attach('file', Buffer.from(csv), 'big.csv');
    expect(again.status).toBe(200);
    expect(await lineCount()).toBe(60_000);
  }, 120_000);

  it('bulk edit: nothing of it is written; repeating it works', async () => {
    const target = (await ws.agents.designer.post('/api/boms').send({ name: 'Bulk interrupted', reportingCurrency: 'USD' }).expect(201)).body.id;
    const body = { create: Array.from({ length: 10_000 }, (_, i) => ({ kind: 'labour', qtyPerUnit: '1', unitCost: '0.001', note: `op ${i}` })) };
    const [res, killed] = await Promise.all([ws.agents.designer.post(`/api/boms/${target}/lines/bulk`).send(body).then((r) => r), killWriterWhenSeen()]);
    expect(killed).toBe(true);
    expect(res.status).toBe(503);
    expect(Number((await t.database.db('bom_lines').where({ bomId: target }).count('* as n').first())!.n)).toBe(0);
    await ws.agents.designer.post(`/api/boms/${target}/lines/bulk`).send(body).expect(200);
    expect(Number((await t.database.db('bom_lines').where({ bomId: target }).count('* as n').first())!.n)).toBe(10_000);
  }, 120_000);
});
