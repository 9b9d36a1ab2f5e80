import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import passport from 'passport';
import { routeTable } from '../../server/routes';
import { startTestApp, signUp, type TestApp } from '../helpers/app';
import { makePart, makeSupplier, makeQuote, makeProfile, tinyPdf } from '../helpers/factories';

/**
 * Workspace isolation: a member of another workspace gets 404 on every id route of the
 * first and sees none of its rows in any list. Each id route needs a record of the first
 * workspace below; a new id route without one fails here until it gets one.
 */
let t: TestApp;
let a: Awaited<ReturnType<typeof signUp>>;
let b: Awaited<ReturnType<typeof signUp>>;
const ids: Record<string, string> = {};

beforeAll(async () => {
  t = await startTestApp();
  a = await signUp(t, { workspaceName: 'First' });
  b = await signUp(t, { workspaceName: 'Second' });
  const invite = await a.agent.post('/api/invites').send({ email: `iso-${Date.now()}@tinbell.example`, role: 'buyer' }).expect(201);
  const token = await a.agent.post('/api/tokens').send({ name: 'first ws token' }).expect(201);
  ids['/api/invites/:id'] = invite.body.id;
  ids['/api/tokens/:id'] = token.body.id;
  ids['/api/members/:userId'] = a.user.id;
  const part = await makePart(a.agent);
  const supplier = await makeSupplier(a.agent);
  const quote = await makeQuote(a.agent, part.id, supplier.id);
  const profile = await makeProfile(a.agent);
  const fx = await a.agent.post('/api/fx-rates').send({ date: '2024-06-28', base: 'EUR', quote: 'USD', rate: '1.0705' }).expect(201);
  const file = await a.agent.post(`/api/parts/${part.id}/files`).attach('file', tinyPdf, 'sheet.pdf').expect(201);
  for (const path of ['/api/parts/:id', '/api/parts/:id/quotes', '/api/parts/:id/offers', '/api/parts/:id/files', '/api/parts/:id/boms']) ids[path] = part.id;
  ids['/api/suppliers/:id'] = supplier.id;
  ids['/api/quotes/:id'] = quote.id;
  ids['/api/landed-cost-profiles/:id'] = profile.id;
  ids['/api/fx-rates/:id'] = fx.body.id;
  ids['/api/files/:id'] = file.body.id;
  const bom = await a.agent.post('/api/boms').send({ name: 'First torch', reportingCurrency: 'USD' }).expect(201);
  const line = await a.agent.post(`/api/boms/${bom.body.id}/lines`).send({ partId: part.id, qtyPerUnit: '1' }).expect(201);
  for (const path of ['/api/boms/:id', '/api/boms/:id/state', '/api/boms/:id/revisions', '/api/boms/:id/lines', '/api/boms/:id/lines/bulk', '/api/boms/:id/cost', '/api/boms/:id/cost/curve', '/api/boms/:id/shelf-ladder', '/api/boms/:id/import', '/api/boms/:id/snapshots']) ids[path] = bom.body.id;
  ids['/api/boms/:id/lines/:lineId'] = `${bom.body.id}/lines/${line.body.id}`;
  for (const path of ['/api/boms/:id/stress', '/api/boms/:id/export.xlsx']) ids[path] = bom.body.id;
  for (const path of ['/api/boms/:id/lines/:lineId/waivers', '/api/boms/:id/lines/:lineId/alternatives', '/api/boms/:id/lines/:lineId/swap']) ids[path] = `${bom.body.id}/lines/${line.body.id}`;
  const policies = await a.agent.get('/api/stress-policies').expect(200);
  for (const path of ['/api/stress-policies/:id', '/api/stress-policies/:id/default']) ids[path] = policies.body.items[0].id;
  await a.agent.patch(`/api/suppliers/${supplier.id}`).send({ contactEmails: ['first@supplier.example'], version: supplier.version }).expect(200);
  const rfq = await a.agent.post('/api/rfqs').send({ title: 'First RFQ', partIds: [part.id], supplierIds: [supplier.id], quantities: [1000], replyBy: new Date(Date.now() + 7 * 86400_000).toISOString().slice(0, 10) }).expect(201);
  for (const path of ['/api/rfqs/:id', '/api/rfqs/:id/reminders', '/api/rfqs/:id/close']) ids[path] = rfq.body.id;
  const snap = await a.agent.post(`/api/boms/${bom.body.id}/snapshots`).send({ name: 'first' }).expect(201);
  snapshotId = snap.body.id;
});
let snapshotId = '';

// A valid request apart from the id, so that only workspace scoping can answer 404.
const bodies: Record<string, object> = {
  'PATCH /api/members/:userId': { role: 'viewer', version: 1 },
  'PATCH /api/parts/:id': { description: 'changed', version: 1 },
  'PATCH /api/suppliers/:id': { notes: 'changed', version: 1 },
  'PATCH /api/quotes/:id': { note: 'changed', version: 1 },
  'PATCH /api/landed-cost-profiles/:id': { notes: 'changed', version: 1 },
  'PATCH /api/boms/:id': { notes: 'changed', version: 1 },
  'POST /api/boms/:id/state': { state: 'in_review' },
  'POST /api/boms/:id/lines': { qtyPerUnit: '1', kind: 'labour', unitCost: '0.01' },
  'PATCH /api/boms/:id/lines/:lineId': { qtyPerUnit: '2', version: 1 },
  'POST /api/boms/:id/lines/bulk': { create: [{ qtyPerUnit: '1', kind: 'labour', unitCost: '0.01' }] },
  'POST /api/boms/:id/snapshots': { name: 'theirs' },
  'PATCH /api/stress-policies/:id': { notes: 'changed', version: 1 },
  'POST /api/boms/:id/lines/:lineId/waivers': { reason: 'Reaching into another workspace.' },
  'POST /api/boms/:id/lines/:lineId/swap': { partId: '1', version: 1 },
};
const queries: Record<string, object> = { 'GET /api/parts/:id/offers': { qty: 100 } };
afterAll(async () => t.close());

const idRoutes = () => routeTable(passport).filter((r) => r.access !== 'public' && /:[A-Za-z]+/.test(r.path));

describe('another workspace is unreachable', () => {
  it('every id route of the first workspace answers 404 to the second', async () => {
    for (const r of idRoutes()) {
      const id = ids[r.path];
      expect(id, `no record of the first workspace for ${r.path}: add one to this test`).toBeDefined();
      const path = r.path.includes(':lineId') ? r.path.replace(':id/lines/:lineId', id) : r.path.replace(/:[A-Za-z]+/, id);
      const key = `${r.method.toUpperCase()} ${r.path}`;
      const req = b.agent[r.method](path).query(queries[key] ?? {});
      const res = r.bodyKind === 'multipart' ? await req.attach('file', tinyPdf, 'sheet.pdf') : await req.send(bodies[key]);
      expect(res.status, `${r.method} ${path}: ${JSON.stringify(res.body)}`).toBe(404);
    }
    // Nothing of the first workspace changed.
    expect(await t.database.db('invites').where({ id: ids['/api/invites/:id'] }).first()).toBeDefined();
    expect((await t.database.db('api_tokens').where({ id: ids['/api/tokens/:id'] }).first()).revokedAt).toBeNull();
    expect((await t.database.db('memberships').where({ userId: a.user.id }).first()).role).toBe('owner');
  });

  it('lists show none of the first workspace rows', async () => {
    const lists = routeTable(passport).filter((r) => r.method === 'get' && r.access !== 'public' && !/:[A-Za-z]+/.test(r.path));
    const firstIds = new Set([a.user.id, ...Object.values(ids)]);
    // Comparing the first workspace's snapshot from the second is a 404 too.
    await b.agent.get('/api/cost-compare').query({ left: `snapshot:${snapshotId}`, right: `snapshot:${snapshotId}` }).expect(404);
    for (const r of lists.filter((x) => x.path !== '/api/cost-compare')) {
      const res = await b.agent.get(r.path);
      if (res.status === 403) continue; // the role may not list it at all
      expect(res.status, r.path).toBe(200);
      const text = JSON.stringify(res.body);
      expect(text, r.path).not.toContain('First');
      for (const item of (res.body.items ?? []) as Record<string, unknown>[]) {
        expect(firstIds.has(String(item.id ?? item.userId)), `${r.path} leaks ${JSON.stringify(item)}`).toBe(false);
      }
    }
  });
});
