import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, signUp, type TestApp } from '../helpers/app';
import { snapshot } from '../helpers/db';
import { makePart, makeSupplier, makeQuote, makeProfile, tinyPdf } from '../helpers/factories';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
beforeAll(async () => {
  t = await startTestApp();
  owner = await signUp(t, { workspaceName: 'Sourcing Co' });
});
afterAll(async () => t.close());

describe('parts library', () => {
  it('stores ratings given in the trade notations as numbers', async () => {
    const part = await makePart(owner.agent, { category: 'capacitor', package: '1206', ratings: { capacitanceF: '2n2', ratedVoltageV: '2kV', dielectric: 'hv_ceramic' } });
    expect(part.ratings).toEqual({ capacitanceF: 2.2e-9, ratedVoltageV: 2000, dielectric: 'hv_ceramic' });
  });

  it('rejects ratings of the wrong quantity or category with a message per field, writing nothing', async () => {
    const before = await snapshot(t.database.db);
    const res = await owner.agent.post('/api/parts').send({ internalPn: 'BAD-1', category: 'resistor', ratings: { resistanceOhm: '700mA', capacitanceF: 1e-9 } }).expect(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toContain('ratings.resistanceOhm');
    expect(paths).toContain('ratings');
    await owner.agent.post('/api/parts').send({ internalPn: 'BAD-2', category: 'pcb', ratings: { powerW: 1 } }).expect(400);
    expect(await snapshot(t.database.db)).toEqual(before);
  });

  it('search in the trade words: "10k 0603" finds the 10 kΩ 0603 resistor only', async () => {
    const hit = await makePart(owner.agent, { internalPn: 'R-10K-0603', package: '0603', ratings: { resistanceOhm: '10k', powerW: '0.1W', levV: '75V' } });
    await makePart(owner.agent, { internalPn: 'R-10K-1206', package: '1206', ratings: { resistanceOhm: '10k', powerW: '0.25W', levV: '200V' } });
    await makePart(owner.agent, { internalPn: 'R-4K7-0603', package: '0603', ratings: { resistanceOhm: '4K7', powerW: '0.1W', levV: '75V' } });
    const res = await owner.agent.get('/api/parts').query({ q: '10k 0603' }).expect(200);
    expect(res.body.items.map((p: { id: string }) => p.id)).toEqual([hit.id]);
    const mpn = await owner.agent.get('/api/parts').query({ q: 'R-4K7' }).expect(200);
    expect(mpn.body.items).toHaveLength(1);
  });

  it('a stale version is a 409 and changes nothing', async () => {
    const p = await makePart(owner.agent);
    await owner.agent.patch(`/api/parts/${p.id}`).send({ description: 'first', version: p.version }).expect(200);
    const res = await owner.agent.patch(`/api/parts/${p.id}`).send({ description: 'second', version: p.version }).expect(409);
    expect(res.body.error.code).toBe('stale_version');
    expect((await owner.agent.get(`/api/parts/${p.id}`)).body.description).toBe('first');
  });

  it('a duplicate internal part number is a 409 naming the field', async () => {
    await makePart(owner.agent, { internalPn: 'DUP-1' });
    const res = await owner.agent.post('/api/parts').send({ internalPn: 'DUP-1', category: 'other' }).expect(409);
    expect(res.body.error.details[0].path).toBe('internalPn');
  });
});

describe('suppliers and quotes', () => {
  it('quote price breaks must ascend, with positive prices of at most 6 decimals', async () => {
    const s = await makeSupplier(owner.agent);
    const p = await makePart(owner.agent);
    const before = await snapshot(t.database.db);
    const res = await owner.agent.post('/api/quotes').send({
      partId: p.id, supplierId: s.id, currency: 'USD', incoterm: 'FOB',
      priceBreaks: [{ minQty: 100, unitPrice: '0.0050' }, { minQty: 100, unitPrice: '0.0000001' }, { minQty: 10, unitPrice: '-1' }],
    }).expect(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['priceBreaks.1.minQty', 'priceBreaks.1.unitPrice', 'priceBreaks.2.unitPrice']));
    expect(await snapshot(t.database.db)).toEqual(before);
  });

  it('keeps 6-decimal prices exactly and marks expired quotes', async () => {
    const s = await makeSupplier(owner.agent);
    const p = await makePart(owner.agent);
    const q = await makeQuote(owner.agent, p.id, s.id, { priceBreaks: [{ minQty: 1, unitPrice: '0.000810' }], validUntil: '2020-01-31' });
    const got = await owner.agent.get(`/api/quotes/${q.id}`).expect(200);
    expect(got.body.priceBreaks).toEqual([{ minQty: 1, unitPrice: '0.000810' }]);
    expect(got.body.expired).toBe(true);
    const patched = await owner.agent.patch(`/api/quotes/${q.id}`).send({ version: got.body.version, validUntil: null, priceBreaks: [{ minQty: 1, unitPrice: '0.00081' }, { minQty: 5000, unitPrice: '0.0006' }] }).expect(200);
    expect(patched.body.expired).toBe(false);
    expect(patched.body.priceBreaks).toHaveLength(2);
  });

  it("a quote's breaks follow every write to price_breaks, however it is made (the cost roll reads the quote row's copy)", async () => {
    const s = await makeSupplier(owner.agent);
    const p = await makePart(owner.agent);
    const a = await makeQuote(owner.agent, p.id, s.id, { priceBreaks: [{ minQty: 1, unitPrice: '0.002000' }] });
    const b = await makeQuote(owner.agent, p.id, s.id, { priceBreaks: [{ minQty: 1, unitPrice: '0.003000' }] });
    const db = t.database.db;
    const breaksOf = async (id: string) => (await owner.agent.get(`/api/quotes/${id}`).expect(200)).body.priceBreaks;
    // Written straight to the table, as the quote import does, several rows in one statement.
    await db('price_breaks').insert([
      { workspaceId: owner.workspace.id, quoteId: a.id, minQty: 1000, unitPrice: '0.001500' },
      { workspaceId: owner.workspace.id, quoteId: a.id, minQty: 100, unitPrice: '0.001800' },
    ]);
    expect(await breaksOf(a.id)).toEqual([{ minQty: 1, unitPrice: '0.002000' }, { minQty: 100, unitPrice: '0.001800' }, { minQty: 1000, unitPrice: '0.001500' }]);
    // A break moved to another quote changes both.
    await db('price_breaks').where({ quoteId: a.id, minQty: 1000 }).update({ quoteId: b.id });
    expect(await breaksOf(a.id)).toEqual([{ minQty: 1, unitPrice: '0.002000' }, { minQty: 100, unitPrice: '0.001800' }]);
    expect(await breaksOf(b.id)).toEqual([{ minQty: 1, unitPrice: '0.003000' }, { minQty: 1000, unitPrice: '0.001500' }]);
    await db('price_breaks').where({ quoteId: a.id }).andWhere('minQty', '>', 1).delete();
    expect(await breaksOf(a.id)).toEqual([{ minQty: 1, unitPrice: '0.002000' }]);
    const offers = await owner.agent.get(`/api/parts/${p.id}/offers`).query({ qty: 1000 }).expect(200);
    expect(JSON.stringify(offers.body)).toContain('0.001500');
  });

  it('a supplier with quotes cannot be deleted (409); a buyer may edit quotes, a designer may not', async () => {
    const s = await makeSupplier(owner.agent);
    const p = await makePart(owner.agent);
    await makeQuote(owner.agent, p.id, s.id);
    await owner.agent.delete(`/api/suppliers/${s.id}`).expect(409);
  });
});

describe('FX rates', () => {
  it('imports a EUR feed in the long and the wide shape; bad rows import nothing', async () => {
    const long = 'date,currency,rate\n2024-06-28,USD,1.0705\n2024-06-28,CNY,7.7748\n2024-06-28,GBP,0.84638\n';
    const r1 = await owner.agent.post('/api/fx-rates/import').attach('file', Buffer.from(long), 'eurofeed.csv').expect(200);
    expect(r1.body.imported).toBe(3);
    const wide = 'Date,USD,JPY,CNY,RUB,\n2024-06-27,1.0713,171.84,7.7795,N/A,\n';
    const r2 = await owner.agent.post('/api/fx-rates/import').attach('file', Buffer.from(wide), 'wide.csv').expect(200);
    expect(r2.body.imported).toBe(3);
    const before = await snapshot(t.database.db);
    const bad = 'date,currency,rate\n2024-06-29,USD,1.07\n2024-02-30,XXQ,-2\n';
    const r3 = await owner.agent.post('/api/fx-rates/import').attach('file', Buffer.from(bad), 'bad.csv').expect(400);
    expect(r3.body.error.details[0].path).toBe('row 3');
    expect(await snapshot(t.database.db)).toEqual(before);
    await owner.agent.post('/api/fx-rates/import').attach('file', tinyPdf, 'rates.csv').expect(415);
  });

  it('a manual rate for the same date and pair is a 409', async () => {
    await owner.agent.post('/api/fx-rates').send({ date: '2024-07-01', base: 'EUR', quote: 'USD', rate: '1.0740' }).expect(201);
    await owner.agent.post('/api/fx-rates').send({ date: '2024-07-01', base: 'EUR', quote: 'USD', rate: '1.0741' }).expect(409);
    await owner.agent.post('/api/fx-rates').send({ date: '2024-07-01', base: 'EUR', quote: 'EUR', rate: '1' }).expect(400);
  });
});

describe('the quote board', () => {
  it('converts through EUR, marks the cheapest landed offer and greys the ineligible with a reason', async () => {
    // ECB reference rates of 2024-06-28 [ECB-FMT]: 1 EUR = 1.0705 USD = 7.7748 CNY.
    await owner.agent.post('/api/fx-rates/import').attach('file', Buffer.from('date,currency,rate\n2024-06-28,USD,1.0705\n2024-06-28,CNY,7.7748\n'), 'f.csv').expect(200);
    const cny = await makeSupplier(owner.agent, { currency: 'CNY' });
    const usd = await makeSupplier(owner.agent, { currency: 'USD', country: 'US' });
    const gone = await makeSupplier(owner.agent, { currency: 'USD', country: 'US', active: false });
    const part = await makePart(owner.agent, { hsCode: '8533.21' });
    const qCny = await makeQuote(owner.agent, part.id, cny.id, { currency: 'CNY', priceBreaks: [{ minQty: 1, unitPrice: '0.0100' }] });
    const qUsd = await makeQuote(owner.agent, part.id, usd.id, { currency: 'USD', priceBreaks: [{ minQty: 1, unitPrice: '0.0020' }] });
    const qOld = await makeQuote(owner.agent, part.id, usd.id, { currency: 'USD', validUntil: '2024-01-01', priceBreaks: [{ minQty: 1, unitPrice: '0.0001' }] });
    const qInactive = await makeQuote(owner.agent, part.id, gone.id, { currency: 'USD', priceBreaks: [{ minQty: 1, unitPrice: '0.0001' }] });
    const qNoFx = await makeQuote(owner.agent, part.id, usd.id, { currency: 'KRW', priceBreaks: [{ minQty: 1, unitPrice: '0.01' }] });
    const profile = await makeProfile(owner.agent, { currency: 'USD', dutyBasis: 'CIF', defaultDutyPct: '0' });

    const res = await owner.agent.get(`/api/parts/${part.id}/offers`).query({ qty: 10000, currency: 'USD', profileId: profile.id, date: '2024-06-28' }).expect(200);
    const byId = Object.fromEntries(res.body.offers.map((o: { quoteId: string }) => [o.quoteId, o]));
    // CNY 0.0100 × 10,000 = CNY 100 = 100 × 1.0705 / 7.7748 USD = 13.768842… USD [ECB-FMT] cross rate.
    expect(Number(byId[qCny.id].goodsValue)).toBeCloseTo(13.768842, 5);
    expect(byId[qUsd.id].goodsValue).toBe('20.000000');
    expect(res.body.cheapestQuoteId, JSON.stringify(res.body.offers.map((o: Record<string, unknown>) => [o.quoteId, o.eligible, o.reason, o.landed]))).toBe(qCny.id);
    expect(byId[qOld.id]).toMatchObject({ eligible: false, reason: 'expired' });
    expect(byId[qInactive.id]).toMatchObject({ eligible: false, reason: 'inactive_supplier' });
    expect(byId[qNoFx.id]).toMatchObject({ eligible: false, reason: 'missing_fx' });
  });
});

describe('the quote board reads its profile', () => {
  it('uses the profile asked for, else the first; another workspace\'s profile is a 400', async () => {
    const buyer = await signUp(t, { workspaceName: 'Board profiles Co' });
    const supplier = await makeSupplier(buyer.agent, { currency: 'USD', country: 'US' });
    const part = await makePart(buyer.agent, { hsCode: '8533.21' });
    await makeQuote(buyer.agent, part.id, supplier.id, { currency: 'USD', incoterm: 'FOB', priceBreaks: [{ minQty: 1, unitPrice: '0.0020' }] });
    const none = (await buyer.agent.get(`/api/parts/${part.id}/offers`).query({ qty: 10000, currency: 'USD' }).expect(200)).body;
    expect(none).toMatchObject({ profileId: null, profileName: null, dutyPct: '0' });
    expect(none.offers[0]).toMatchObject({ goodsValue: '20.000000', duty: '0.000000', landed: '20.000000' });
    const first = await makeProfile(buyer.agent, { currency: 'USD', dutyBasis: 'FOB', defaultDutyPct: '0' });
    const second = await makeProfile(buyer.agent, { currency: 'USD', dutyBasis: 'FOB', defaultDutyPct: '10' });
    const board = async (query: Record<string, unknown>) => (await buyer.agent.get(`/api/parts/${part.id}/offers`).query({ qty: 10000, currency: 'USD', ...query }).expect(200)).body;
    const byDefault = await board({});
    const asked = await board({ profileId: second.id });
    expect(byDefault.profileId).toBe(first.id);
    expect(asked).toMatchObject({ profileId: second.id, profileName: expect.stringMatching(/^Profile /), dutyPct: '10' });
    // Under FOB the buyer pays the import duty (Incoterms 2020, costing-facts table [INCO-ICCPA]);
    // duty on the FOB basis is on the goods value (costing.md). 10 % of the FOB value of
    // 10,000 × USD 0.0020 = USD 20 is USD 2 with the second profile, nothing with the first.
    expect(byDefault.offers[0]).toMatchObject({ goodsValue: '20.000000', duty: '0.000000', landed: '20.000000' });
    expect(asked.offers[0]).toMatchObject({ goodsValue: '20.000000', duty: '2.000000', landed: '22.000000' });
    const elsewhere = await makeProfile(owner.agent, { currency: 'USD' });
    const res = await buyer.agent.get(`/api/parts/${part.id}/offers`).query({ qty: 10000, profileId: elsewhere.id }).expect(400);
    expect(res.body.error.details[0].path).toBe('profileId');
  });
});

describe('datasheets in the object store', () => {
  it('uploads a PDF, lists and downloads it; refuses other types and oversize files', async () => {
    const part = await makePart(owner.agent);
    const up = await owner.agent.post(`/api/parts/${part.id}/files`).attach('file', tinyPdf, { filename: '../../etc/passwd.pdf', contentType: 'application/pdf' }).expect(201);
    expect(up.body.filename).toBe('passwd.pdf');
    const list = await owner.agent.get(`/api/parts/${part.id}/files`).expect(200);
    expect(list.body.items).toHaveLength(1);
    const dl = await owner.agent.get(`/api/files/${up.body.id}`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(Buffer.compare(dl.body as Buffer, tinyPdf)).toBe(0);

    const before = await snapshot(t.database.db);
    await owner.agent.post(`/api/parts/${part.id}/files`).attach('file', Buffer.from('MZ not a pdf at all'), { filename: 'sheet.pdf', contentType: 'application/pdf' }).expect(415);
    const big = Buffer.concat([tinyPdf, Buffer.alloc(21 * 1024 * 1024)]);
    await owner.agent.post(`/api/parts/${part.id}/files`).attach('file', big, 'big.pdf').expect(413);
    expect(await snapshot(t.database.db)).toEqual(before);

    const other = await signUp(t);
    await other.agent.get(`/api/files/${up.body.id}`).expect(404);
  });
});
