import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { startTestApp, signUp, waitForMail, type TestApp } from '../helpers/app';
import { snapshot } from '../helpers/db';
import { makePart, makeSupplier } from '../helpers/factories';

let t: TestApp;
let buyer: Awaited<ReturnType<typeof signUp>>;
let parts: { id: string }[];
let alpha: { id: string };
let beta: { id: string };
const day = (offset: number) => new Date(Date.now() + offset * 86400_000).toISOString().slice(0, 10);
const tokenIn = (text: string) => /\/rfq\/(rfq_[A-Za-z0-9_-]+)/.exec(text)![1];
const anon = () => t.agent();

beforeAll(async () => {
  t = await startTestApp();
  buyer = await signUp(t, { workspaceName: 'RFQ Co' });
  parts = [await makePart(buyer.agent, { internalPn: 'RFQ-R1' }), await makePart(buyer.agent, { internalPn: 'RFQ-C1', category: 'capacitor', ratings: {} })];
  alpha = await makeSupplier(buyer.agent, { name: 'Alpha Passives', contactEmails: ['sales@alpha.example'] });
  beta = await makeSupplier(buyer.agent, { name: 'Beta Semis', contactEmails: ['rfq@beta.example'], currency: 'USD' });
});
afterAll(async () => t.close());

async function sendRfq(title: string, replyBy = day(14)) {
  const res = await buyer.agent.post('/api/rfqs').send({ title, partIds: parts.map((p) => p.id), supplierIds: [alpha.id, beta.id], quantities: [10000, 50000, 100000], replyBy }).expect(201);
  return res.body as { id: string; recipients: { supplierName: string; status: string }[] };
}

describe('requests for quotation', () => {
  it('round trip: the link from the mail, the supplier answers, offers become rfq quotes and the buyer is told', async () => {
    const rfq = await sendRfq('Ioniser passives Q1');
    expect(rfq.recipients.map((r) => r.status)).toEqual(['sent', 'sent']);
    const mail = await waitForMail(t.sink, 'sales@alpha.example', 10_000, 'Ioniser passives Q1');
    expect(mail.subject).toContain('Ioniser passives Q1');
    const token = tokenIn(mail.text);

    const page = await anon().get(`/api/rfq-replies/${token}`).expect(200);
    expect(page.body).toMatchObject({ title: 'Ioniser passives Q1', supplier: 'Alpha Passives', quantities: [10000, 50000, 100000] });
    expect(page.body.items).toHaveLength(2);
    const [r1, c1] = page.body.items;
    const opened = await buyer.agent.get(`/api/rfqs/${rfq.id}`).expect(200);
    expect(opened.body.recipients.find((r: { supplierName: string }) => r.supplierName === 'Alpha Passives').status).toBe('opened');

    await anon().post(`/api/rfq-replies/${token}`).send({
      items: [
        { itemId: r1.itemId, declined: false, currency: 'CNY', incoterm: 'FOB', moq: 5000, orderMultiple: 5000, leadTimeDays: 21, validUntil: day(60), priceBreaks: [{ minQty: 10000, unitPrice: '0.0021' }, { minQty: 50000, unitPrice: '0.0016' }] },
        { itemId: c1.itemId, declined: true },
      ],
    }).expect(200);
    const quotes = await buyer.agent.get('/api/quotes').query({ partId: r1.partId ?? parts[0].id }).expect(200);
    expect(quotes.body.items.some((q: { source: string; supplierId: string }) => q.source === 'rfq' && q.supplierId === alpha.id)).toBe(true);
    const after = await buyer.agent.get(`/api/rfqs/${rfq.id}`).expect(200);
    expect(after.body.recipients.find((r: { supplierName: string }) => r.supplierName === 'Alpha Passives').status).toBe('answered');
    const told = await waitForMail(t.sink, buyer.body.email, 10_000, 'answered');
    expect(told.subject).toMatch(/Alpha Passives answered/);
    // A corrected answer replaces the earlier offer instead of adding a second one.
    await anon().post(`/api/rfq-replies/${token}`).send({
      items: [{ itemId: r1.itemId, declined: false, currency: 'CNY', incoterm: 'FOB', moq: 5000, orderMultiple: 5000, leadTimeDays: 21, validUntil: day(60), priceBreaks: [{ minQty: 10000, unitPrice: '0.0019' }] }],
    }).expect(200);
    const offers = (await buyer.agent.get('/api/quotes').query({ partId: parts[0].id }).expect(200)).body.items.filter((q: { source: string; supplierId: string }) => q.source === 'rfq' && q.supplierId === alpha.id);
    expect(offers).toHaveLength(1);
    expect(offers[0].priceBreaks).toEqual([{ minQty: 10000, unitPrice: '0.001900' }]);
  });

  it('a token reaches only its own supplier and RFQ: anything else is 404', async () => {
    await sendRfq('Scope check');
    const token = tokenIn((await waitForMail(t.sink, 'rfq@beta.example', 10_000, 'Scope check')).text);
    await anon().get(`/api/rfq-replies/rfq_${'x'.repeat(43)}`).expect(404);
    // The token is no session: the buyer's API stays closed to it.
    await anon().get('/api/quotes').set('Authorization', `Bearer ${token}`).expect(401);
    await anon().get(`/api/rfqs`).expect(401);
    // An item of another RFQ cannot be answered through this link.
    const other = await sendRfq('Another');
    const otherItem = (await buyer.agent.get(`/api/rfqs/${other.id}`)).body.items[0].id;
    const before = await snapshot(t.database.db);
    await anon().post(`/api/rfq-replies/${token}`).send({ items: [{ itemId: otherItem, declined: true }] }).expect(400);
    expect(await snapshot(t.database.db)).toEqual(before);
  });

  it('bad values in the form or the sheet get clear errors and nothing is written', async () => {
    await sendRfq('Bad values');
    const token = tokenIn((await waitForMail(t.sink, 'sales@alpha.example', 10_000, 'Bad values')).text);
    const { items } = (await anon().get(`/api/rfq-replies/${token}`).expect(200)).body;
    const before = await snapshot(t.database.db);
    const res = await anon().post(`/api/rfq-replies/${token}`).send({
      items: [{ itemId: items[0].itemId, declined: false, currency: 'XXQ', incoterm: 'FOB', moq: 0, orderMultiple: 1, leadTimeDays: 10, validUntil: day(30), priceBreaks: [{ minQty: 100, unitPrice: '-1' }] }],
    }).expect(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['items.0.currency', 'items.0.moq', 'items.0.priceBreaks.0.unitPrice']));

    const sheet = await anon().get(`/api/rfq-replies/${token}/sheet.xlsx`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(sheet.body as unknown as ArrayBuffer);
    const ws = wb.worksheets[0];
    ws.getRow(2).getCell(10).value = 'not a date';
    ws.getRow(2).getCell(12).value = 0.0021;
    const bad = Buffer.from(await wb.xlsx.writeBuffer());
    const up = await anon().post(`/api/rfq-replies/${token}/sheet`).attach('file', bad, 'answer.xlsx').expect(400);
    expect(up.body.error.details[0].path).toMatch(/^row 2/);
    expect(await snapshot(t.database.db)).toEqual(before);

    ws.getRow(2).getCell(10).value = day(45);
    ws.getRow(2).getCell(7).value = 4000;
    ws.getRow(2).getCell(8).value = 4000;
    ws.getRow(2).getCell(9).value = 14;
    const good = Buffer.from(await wb.xlsx.writeBuffer());
    const ok = await anon().post(`/api/rfq-replies/${token}/sheet`).attach('file', good, 'answer.xlsx').expect(200);
    expect(ok.body.quotes).toBe(1);
  });

  it('a closed request or an expired link gets a clear 410; reminders send fresh links', async () => {
    const rfq = await sendRfq('Closing soon');
    const first = tokenIn((await waitForMail(t.sink, 'rfq@beta.example', 10_000, 'Closing soon')).text);
    await buyer.agent.post(`/api/rfqs/${rfq.id}/reminders`).expect(200);
    const fresh = tokenIn((await waitForMail(t.sink, 'rfq@beta.example', 10_000, 'Reminder: Request for quotation: Closing soon')).text);
    await anon().get(`/api/rfq-replies/${first}`).expect(404);
    await anon().get(`/api/rfq-replies/${fresh}`).expect(200);
    await buyer.agent.post(`/api/rfqs/${rfq.id}/close`).expect(200);
    const closed = await anon().get(`/api/rfq-replies/${fresh}`).expect(410);
    expect(closed.body.error.message).toMatch(/closed/);

    const late = await sendRfq('Expiring');
    const tok = tokenIn((await waitForMail(t.sink, 'rfq@beta.example', 10_000, 'Expiring')).text);
    await t.database.db('rfq_recipients').where({ rfqId: late.id }).update({ expiresAt: new Date(Date.now() - 1000) });
    const expired = await anon().get(`/api/rfq-replies/${tok}`).expect(410);
    expect(expired.body.error.message).toMatch(/expired/);
  });

  it('RFQs need a plan that includes them (402 on Bench, naming Workshop)', async () => {
    const bench = await signUp(t, { plan: 'bench' });
    const p = await makePart(bench.agent);
    const s = await makeSupplier(bench.agent, { contactEmails: ['x@supplier.example'] });
    const res = await bench.agent.post('/api/rfqs').send({ title: 'x', partIds: [p.id], supplierIds: [s.id], quantities: [1000], replyBy: day(7) }).expect(402);
    expect(res.body.error.message).toMatch(/Workshop/);
  });
});
