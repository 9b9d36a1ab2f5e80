import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { canRunBrowser, startBrowserApp, type BrowserApp } from '../helpers/browser';
import { withTsx } from '../helpers/tsx';
import { seedConfig } from '../../server/db/migrate';
import { demoPassword } from '../../seeds/01_demo_workspace';

let b: BrowserApp;
describe.skipIf(!canRunBrowser)('a buyer imports a supplier quote sheet (browser)', () => {
  beforeAll(async () => {
    b = await startBrowserApp('quote-import');
    await withTsx(() => b.t.database.db.seed.run(seedConfig));
  }, 90_000);
  afterAll(async () => b?.close());

  it('maps the sheet columns, imports, and the quote board marks the cheapest landed offer', async () => {
    const { page } = b;
    await page.goto(`${b.url}/signin`);
    await page.getByLabel('Email').fill('buyer@tinbell.example');
    await page.getByLabel('Password').fill(demoPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/boms');

    // The supplier's own headers; the price undercuts every demo offer for this resistor.
    const sheet = ['Our part no,Ccy,Terms,Min order,Reel,Lead time,Break qty,Price each', 'TB-R-10K-0603,CNY,FOB,5000,5000,21,5000,0.0020', 'TB-R-10K-0603,CNY,FOB,5000,5000,21,50000,0.0015'].join('\n');
    await page.getByRole('link', { name: 'Suppliers', exact: true }).click();
    await page.getByRole('button', { name: 'Import quotes' }).click();
    await page.getByLabel('Price list (CSV or XLSX)').setInputFiles({ name: 'pearl-delta-quote.csv', mimeType: 'text/csv', buffer: Buffer.from(sheet) });
    await page.getByRole('button', { name: 'Upload' }).click();
    await page.getByLabel('Internal PN').waitFor();
    await b.shot('mapping');
    // Map the columns the suggestion could not guess.
    await page.getByLabel('Internal PN').selectOption('Our part no');
    await page.getByLabel('Break quantity (required)').selectOption('Break qty');
    await page.getByLabel('Unit price (required)').selectOption('Price each');
    await page.getByLabel('MOQ').selectOption('Min order');
    await page.getByLabel('Order multiple').selectOption('Reel');
    const supplierSelect = page.getByLabel('One supplier for the whole file');
    const pearl = await supplierSelect.locator('option', { hasText: 'Pearl Delta' }).first().getAttribute('value');
    await supplierSelect.selectOption(pearl!);
    await page.getByRole('button', { name: 'Check rows' }).click();
    await page.getByRole('button', { name: 'Import 1 quotes' }).waitFor();
    await b.shot('preview');
    await page.getByRole('button', { name: 'Import 1 quotes' }).click();
    await expect.poll(async () => Number((await b.t.database.db('quotes').where({ source: 'import' }).count('* as n').first())!.n), { timeout: 10_000 }).toBe(1);

    const part = await b.t.database.db('parts').where({ internalPn: 'TB-R-10K-0603' }).first('id');
    const imported = await b.t.database.db('quotes').where({ source: 'import' }).first('id');
    await page.goto(`${b.url}/quote-board?part=${part.id}&qty=10000`);
    const offers = page.getByRole('table', { name: 'Offers' });
    await offers.waitFor();
    const cheapest = offers.getByRole('row').filter({ hasText: 'Cheapest landed' });
    await expect.poll(() => cheapest.count(), { timeout: 10_000 }).toBe(1);
    await b.shot('quote-board');
    // The API agrees: the imported quote is the cheapest landed offer.
    const agent = b.t.agent();
    await agent.post('/api/auth/login').send({ email: 'buyer@tinbell.example', password: demoPassword }).expect(200);
    const board = await agent.get(`/api/parts/${part.id}/offers`).query({ qty: 10000 }).expect(200);
    expect(board.body.cheapestQuoteId).toBe(imported.id);
    expect(await cheapest.textContent()).toContain('Pearl Delta');
  }, 90_000);
});
