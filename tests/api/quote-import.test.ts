import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { startTestApp, signUp, type TestApp } from '../helpers/app';
import { snapshot } from '../helpers/db';
import { makePart, makeSupplier, tinyPdf } from '../helpers/factories';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
let supplier: { id: string };
beforeAll(async () => {
  t = await startTestApp();
  owner = await signUp(t, { workspaceName: 'Import Co' });
  supplier = await makeSupplier(owner.agent, { name: 'Shenzhen Demo Passives', currency: 'CNY' });
  await makePart(owner.agent, { internalPn: 'TB-R-10K', mpn: 'RC0603-10K' });
  await makePart(owner.agent, { internalPn: 'TB-C-2N2', mpn: 'CC1206-2N2', category: 'capacitor', ratings: {} });
});
afterAll(async () => t.close());

// A supplier's own sheet with its own headers: one row per break.
const sheet = [
  'Our PN,Vendor,Ccy,Terms,MOQ,Reel,Lead time,Break,Price each,Remark',
  'TB-R-10K,Shenzhen Demo Passives,CNY,FOB,5000,5000,21,5000,0.0021,=HYPERLINK("x")',
  'TB-R-10K,Shenzhen Demo Passives,CNY,FOB,5000,5000,21,50000,0.0016,',
  'TB-C-2N2,Shenzhen Demo Passives,CNY,EXW,4000,4000,28,4000,0.0105,',
].join('\n');

async function xlsxOf(rows: (string | number)[][]): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet('Quote');
  rows.forEach((r) => ws.addRow(r));
  return Buffer.from(await wb.xlsx.writeBuffer());
}

describe('quote import', () => {
  it('previews with a suggested mapping, then commits all quotes in one go', async () => {
    const preview = await owner.agent.post('/api/quotes/import').attach('file', Buffer.from(sheet), 'vendor.csv').expect(200);
    expect(preview.body.mapping).toMatchObject({ internalPn: 'Our PN', supplier: 'Vendor', currency: 'Ccy', incoterm: 'Terms', moq: 'MOQ', orderMultiple: 'Reel', minQty: 'Break', unitPrice: 'Price each', note: 'Remark' });
    expect(preview.body).toMatchObject({ totalRows: 3, problemRows: 0, quotes: 2 });
    expect(await t.database.db('quotes').count('* as n').first()).toEqual({ n: '0' });

    const done = await owner.agent.post('/api/quotes/import').query({ commit: 'true' }).attach('file', Buffer.from(sheet), 'vendor.csv').expect(200);
    expect(done.body.imported).toBe(2);
    const quotes = await owner.agent.get('/api/quotes').expect(200);
    const r = quotes.body.items.find((q: { moq: number }) => q.moq === 5000);
    expect(r.priceBreaks).toEqual([{ minQty: 5000, unitPrice: '0.002100' }, { minQty: 50000, unitPrice: '0.001600' }]);
    expect(r.source).toBe('import');
    // The formula-looking remark is kept as plain text, never evaluated.
    expect(r.note).toBe('=HYPERLINK("x")');
  });

  it('maps columns the client chose and takes one supplier for the whole file (XLSX)', async () => {
    const buf = await xlsxOf([['Part', 'Qty', 'USD price'], ['RC0603-10K', 10000, 0.0003], ['RC0603-10K', 100000, 0.00025]]);
    const mapping = JSON.stringify({ mpn: 'Part', minQty: 'Qty', unitPrice: 'USD price', currency: null });
    const res = await owner.agent.post('/api/quotes/import').query({ commit: 'true' }).field('mapping', mapping).field('supplierId', supplier.id).attach('file', buf, 'q.xlsx').expect(200);
    expect(res.body.imported).toBe(1);
  });

  it('bad rows show in the preview with the reason, and commit writes nothing', async () => {
    const bad = ['internal_pn,supplier,currency,min_qty,unit_price', 'TB-NOPE,Shenzhen Demo Passives,CNY,100,0.01', 'TB-R-10K,Shenzhen Demo Passives,XXX,100,0.0000001', 'TB-R-10K,Shenzhen Demo Passives,CNY,=A1*2,0.01'].join('\n');
    const preview = await owner.agent.post('/api/quotes/import').attach('file', Buffer.from(bad), 'bad.csv').expect(200);
    expect(preview.body.problemRows).toBe(3);
    const fields = preview.body.rows.map((r: { problems: { field: string }[] }) => r.problems.map((p) => p.field));
    expect(fields[0]).toContain('internalPn');
    expect(fields[1]).toEqual(expect.arrayContaining(['currency', 'unitPrice']));
    expect(fields[2]).toContain('minQty');
    const before = await snapshot(t.database.db);
    await owner.agent.post('/api/quotes/import').query({ commit: 'true' }).attach('file', Buffer.from(bad), 'bad.csv').expect(400);
    expect(await snapshot(t.database.db)).toEqual(before);
  });

  it('a truncated XLSX is 422, a wrong type 415, an oversized file 413', async () => {
    const good = await xlsxOf([['internal_pn', 'min_qty', 'unit_price'], ['TB-R-10K', 1, 0.01]]);
    await owner.agent.post('/api/quotes/import').attach('file', good.subarray(0, Math.floor(good.length / 2)), 'cut.xlsx').expect(422);
    await owner.agent.post('/api/quotes/import').attach('file', tinyPdf, 'quote.csv').expect(415);
    await owner.agent.post('/api/quotes/import').attach('file', Buffer.alloc(11 * 1024 * 1024, 'a'), 'huge.csv').expect(413);
  });

  it('offers a template that imports cleanly once its names exist', async () => {
    const tpl = await owner.agent.get('/api/quotes/import/template.csv').expect(200);
    expect(tpl.headers['content-type']).toMatch(/text\/csv/);
    expect(tpl.text.split('\n')[0]).toContain('min_qty');
    const preview = await owner.agent.post('/api/quotes/import').attach('file', Buffer.from(tpl.text), 'template.csv').expect(200);
    expect(preview.body.mappingProblems).toEqual([]);
  });
});
