import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import passport from 'passport';
import { routeTable } from '../../server/routes';
import { startTestApp, type TestApp } from '../helpers/app';
import { snapshot } from '../helpers/db';
import { workspaceWithEveryRole, type RoleWorkspace } from '../helpers/roles';
import { makePart, makeSupplier, makeQuote, makeProfile } from '../helpers/factories';

/**
 * Generated bad input for every mutating route of the route table (fast-check): wrong
 * types, missing and extra fields, huge and empty strings, negative and non-finite numbers,
 * deep nesting, invalid dates and currencies, non-objects and broken JSON. No answer may be
 * a 5xx, and no table may change.
 */
let t: TestApp;
let ws: RoleWorkspace;
const ids: Record<string, string> = {};
const counts = { cases: 0, byStatus: {} as Record<number, number> };

// Valid bodies to corrupt, per route; routes without one start from {}.
const bases: Record<string, Record<string, unknown>> = {};

beforeAll(async () => {
  t = await startTestApp({ RATE_LIMIT_AUTH_PER_MINUTE: '100000' });
  ws = await workspaceWithEveryRole(t, 'Fuzz Co');
  const o = ws.agents.owner;
  const part = await makePart(o);
  const supplier = await makeSupplier(o, { contactEmails: ['fuzz@supplier.example'] });
  const quote = await makeQuote(o, part.id, supplier.id);
  const profile = await makeProfile(o);
  const bom = (await o.post('/api/boms').send({ name: 'Fuzz BOM', reportingCurrency: 'USD', profileId: profile.id }).expect(201)).body;
  const line = (await o.post(`/api/boms/${bom.id}/lines`).send({ partId: part.id, qtyPerUnit: '1' }).expect(201)).body;
  const policy = (await o.get('/api/stress-policies').expect(200)).body.items[0];
  Object.assign(ids, { part: part.id, supplier: supplier.id, quote: quote.id, profile: profile.id, bom: bom.id, line: line.id, policy: policy.id, user: ws.userIds.viewer });
  Object.assign(bases, {
    'POST /api/auth/signup': { email: 'fuzz@tinbell.example', password: 'long enough pw', name: 'F', workspaceName: 'W' },
    'POST /api/auth/login': { email: 'fuzz@tinbell.example', password: 'x' },
    'POST /api/parts': { internalPn: 'FZ-1', category: 'resistor', ratings: { resistanceOhm: '10k' } },
    'PATCH /api/parts/:id': { description: 'x', version: 1 },
    'POST /api/suppliers': { name: 'Fuzz supplier', country: 'CN', currency: 'CNY', defaultIncoterm: 'FOB' },
    'POST /api/quotes': { partId: part.id, supplierId: supplier.id, currency: 'USD', incoterm: 'FOB', priceBreaks: [{ minQty: 1, unitPrice: '0.01' }], validFrom: '2026-01-01' },
    'POST /api/fx-rates': { date: '2026-01-01', base: 'EUR', quote: 'USD', rate: '1.08' },
    'POST /api/boms': { name: 'B', reportingCurrency: 'USD', plannedQty: 1000 },
    'POST /api/boms/:id/lines': { partId: part.id, qtyPerUnit: '1', operatingPoint: { voltageV: '2kV' } },
    'POST /api/boms/:id/lines/bulk': { create: [{ qtyPerUnit: '1', kind: 'labour', unitCost: '0.01' }] },
    'POST /api/rfqs': { title: 'T', partIds: [part.id], supplierIds: [supplier.id], quantities: [1000], replyBy: '2099-01-01' },
    'POST /api/invites': { email: 'x@tinbell.example', role: 'buyer' },
  });
});
afterAll(async () => {
  console.log(`[bad input] ${counts.cases} generated requests; answers by status: ${JSON.stringify(counts.byStatus)}`);
  await t.close();
});

const poison = fc.oneof(
  fc.constant('x'.repeat(200_000)),
  fc.constant(''),
  fc.constant('2026-02-30'),
  fc.constant('ZZZ'),
  fc.constant(-1),
  fc.constant(-1e308),
  fc.constant(Number.MAX_SAFE_INTEGER * 1000),
  fc.constant(true),
  fc.constant(null),
  fc.constant([]),
  fc.constant({ $gt: '' }),
  fc.constant('=cmd|"/c calc"!A1'),
  fc.constant("'; DROP TABLE parts; --"),
  fc.constant('NaN'),
  fc.constant('\u0000\uffff'),
  fc.integer({ min: 1, max: 400 }).map((depth) => {
    let v: unknown = 1;
    for (let i = 0; i < depth; i++) v = { a: v };
    return v;
  }),
  fc.anything({ maxDepth: 3 }),
);

type Mutation = (b: Record<string, unknown>) => Record<string, unknown> | string | unknown;
const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  // Replace a field (or add one) with a poisoned value, always alongside an unknown field.
  fc.tuple(fc.nat(), poison).map(([i, v]) => (b: Record<string, unknown>) => {
    const keys = Object.keys(b);
    const key = keys.length ? keys[i % keys.length] : 'field';
    return { ...b, [key]: v, [`unknown_${i}`]: v };
  }),
  // Drop fields.
  fc.nat().map((i) => (b: Record<string, unknown>) => {
    const keys = Object.keys(b);
    const out = { ...b };
    delete out[keys[i % Math.max(1, keys.length)]];
    return { ...out, extraField: i };
  }),
  // Not an object at all.
  fc.oneof(fc.constant([]), fc.constant(42), fc.constant('text'), fc.constant(null)).map((v) => () => v),
  // Broken or hostile JSON text (Infinity through 1e999, duplicate keys, deep arrays).
  fc.constantFrom('{"a":', '{"qty": 1e999, "x": -1e999}', '{"a":1,"a":2,"b":[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]}', '[' .repeat(5000) + ']'.repeat(5000), '\u0000', 'null').map((s) => () => `RAW:${s}`),
);

describe('generated bad input against every mutating route', () => {
  it('never answers 5xx and changes no table (≥ 1,000 cases)', async () => {
    const routes = routeTable(passport).filter((r) => r.method !== 'get');
    const perRoute = Math.ceil(1100 / routes.length);
    const before = await snapshot(t.database.db);
    for (const r of routes) {
      const path = r.path
        .replace(':lineId', ids.line)
        .replace('/api/parts/:id', `/api/parts/${ids.part}`)
        .replace('/api/suppliers/:id', `/api/suppliers/${ids.supplier}`)
        .replace('/api/quotes/:id', `/api/quotes/${ids.quote}`)
        .replace('/api/landed-cost-profiles/:id', `/api/landed-cost-profiles/${ids.profile}`)
        .replace('/api/boms/:id', `/api/boms/${ids.bom}`)
        .replace('/api/stress-policies/:id', `/api/stress-policies/${ids.policy}`)
        .replace('/api/members/:userId', `/api/members/${ids.user}`)
        .replace(/:[A-Za-z]+/g, '1')
        .replace(/\/api\/rfq-replies\/1/, '/api/rfq-replies/rfq_00000000000000000000000000000000');
      const base = bases[`${r.method.toUpperCase()} ${r.path}`] ?? {};
      await fc.assert(
        fc.asyncProperty(mutation, async (mutate) => {
          const payload = mutate(structuredClone(base));
          const raw = typeof payload === 'string' && payload.startsWith('RAW:') ? payload.slice(4) : JSON.stringify(payload);
          const res = await ws.agents.owner[r.method](path).set('Content-Type', 'application/json').send(raw);
          counts.cases++;
          counts.byStatus[res.status] = (counts.byStatus[res.status] ?? 0) + 1;
          expect(res.status, `${r.method} ${path} ${raw.slice(0, 200)} → ${JSON.stringify(res.body).slice(0, 300)}`).toBeLessThan(500);
          expect(res.status, `${r.method} ${path} accepted ${raw.slice(0, 200)}`).toBeGreaterThanOrEqual(400);
        }),
        { numRuns: perRoute, seed: 20261201 },
      );
    }
    expect(counts.cases).toBeGreaterThanOrEqual(1000);
    expect(await snapshot(t.database.db)).toEqual(before);
  }, 600_000);
});
