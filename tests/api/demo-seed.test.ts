import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../helpers/app';
import { withTsx } from '../helpers/tsx';
import { seedConfig } from '../../server/db/migrate';
import { demoLogins, demoPassword } from '../../seeds/01_demo_workspace';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  await withTsx(() => t.database.db.seed.run(seedConfig));
}, 60_000);
afterAll(async () => t.close());

const count = async (table: string) => Number((await t.database.db(table).count('* as n').first())!.n);

describe('the demo workspace', () => {
  it('every demo login signs in with its role', async () => {
    for (const login of demoLogins) {
      const res = await t.agent().post('/api/auth/login').send({ email: login.email, password: demoPassword }).expect(200);
      expect(res.body.role).toBe(login.role);
      expect(res.body.workspace.name).toMatch(/Tinbell/);
    }
  });

  it('holds the sourcing data the demo needs', async () => {
    expect(await count('parts')).toBeGreaterThanOrEqual(60);
    expect(await count('suppliers')).toBeGreaterThanOrEqual(3);
    expect(await count('quotes')).toBeGreaterThanOrEqual(140);
    expect(await count('landed_cost_profiles')).toBe(2);
    const currencies = await t.database.db('suppliers').distinct('currency').pluck('currency');
    expect(currencies.sort()).toEqual(expect.arrayContaining(['CNY', 'EUR', 'USD']));
    const days = await t.database.db('fx_rates').countDistinct('date as n').first();
    expect(Number(days!.n)).toBeGreaterThanOrEqual(30);
    const rated = await t.database.db('parts').whereIn('category', ['resistor', 'capacitor', 'bjt', 'mosfet', 'diode', 'led']).count('* as n').first();
    expect(Number(rated!.n)).toBeGreaterThanOrEqual(40);
  });

  it('the demo BOMs cost out and their stress checks show every status', async () => {
    const agent = t.agent();
    await agent.post('/api/auth/login').send({ email: 'designer@tinbell.example', password: demoPassword }).expect(200);
    const boms = (await agent.get('/api/boms').expect(200)).body.items as { id: string; name: string; revision: number; state: string; cost: { landedPerUnit: string; leftOut: number } }[];
    expect(boms.map((b) => `${b.name} r${b.revision} ${b.state}`).sort()).toEqual([
      'Arc lighter (USB rechargeable) r1 released', 'Arc lighter (USB rechargeable) r2 draft', 'Clip-on LED book light r1 in_review', 'Desk ioniser r1 draft',
    ]);
    for (const b of boms) {
      expect(Number(b.cost.landedPerUnit), b.name).toBeGreaterThan(0);
      expect(b.cost.leftOut, b.name).toBe(0);
    }
    const statuses = new Set<string>();
    for (const b of boms) for (const l of (await agent.get(`/api/boms/${b.id}/stress`).expect(200)).body.lines) statuses.add(l.status);
    expect([...statuses].sort()).toEqual(['beyond_policy', 'clear', 'close', 'needs_data', 'over_rating']);
    // The cost-down revision's chip bleeder is beyond policy, and a cheaper-than-leaded HV chip fixes it.
    const rev2 = boms.find((b) => b.revision === 2)!;
    const stress = (await agent.get(`/api/boms/${rev2.id}/stress`).expect(200)).body;
    const bleeder = stress.lines.find((l: { refDes: string }) => l.refDes === 'R10-R13');
    expect(bleeder.status).toBe('beyond_policy');
    const alt = (await agent.get(`/api/boms/${rev2.id}/lines/${bleeder.lineId}/alternatives`).expect(200)).body;
    expect(alt.candidates[0].internalPn).toBe('TB-R-22M-HV1206');
  });

  it('seeding again changes nothing', async () => {
    const before = [await count('users'), await count('parts'), await count('quotes'), await count('fx_rates')];
    await withTsx(() => t.database.db.seed.run(seedConfig));
    expect([await count('users'), await count('parts'), await count('quotes'), await count('fx_rates')]).toEqual(before);
  });

  it('the demo quote board for a resistor has a cheapest eligible offer', async () => {
    const agent = t.agent();
    await agent.post('/api/auth/login').send({ email: 'buyer@tinbell.example', password: demoPassword }).expect(200);
    const parts = await agent.get('/api/parts').query({ q: '10k 0603' }).expect(200);
    expect(parts.body.items.length).toBeGreaterThan(0);
    const board = await agent.get(`/api/parts/${parts.body.items[0].id}/offers`).query({ qty: 10000 }).expect(200);
    expect(board.body.cheapestQuoteId).not.toBeNull();
    expect(board.body.offers.some((o: { reason: string }) => o.reason === 'expired')).toBe(true);
  });
});
