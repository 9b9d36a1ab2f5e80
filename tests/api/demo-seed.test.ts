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
