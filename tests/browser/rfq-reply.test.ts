import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { canRunBrowser, startBrowserApp, type BrowserApp } from '../helpers/browser';
import { signUp, waitForMail } from '../helpers/app';
import { makePart, makeSupplier } from '../helpers/factories';

const day = (offset: number) => new Date(Date.now() + offset * 86400_000).toISOString().slice(0, 10);
const tokenIn = (text: string) => {
  const m = /\/rfq\/(rfq_[A-Za-z0-9_-]+)/.exec(text);
  if (!m) throw new Error('no RFQ link in the mail');
  return m[1];
};

let b: BrowserApp;
/**
 * Waits until the element is on screen (screens load their code on first visit, and a
 * webhook takes a moment); on failure the page is kept as a screenshot beside the others.
 */
async function shown(locator: Locator, timeout = 20_000) {
  try {
    await expect.poll(() => locator.isVisible(), { timeout, message: String(locator) }).toBe(true);
  } catch (error) {
    await locator.page().screenshot({ path: join('test-artifacts', 'rfq-reply', `failed-${Date.now()}.png`), fullPage: true }).catch(() => undefined);
    throw error;
  }
}
describe.skipIf(!canRunBrowser)('a supplier answers an RFQ on a phone and the buyer sees the offer (browser)', () => {
  beforeAll(async () => {
    b = await startBrowserApp('rfq-reply');
  }, 60_000);
  afterAll(async () => b?.close());

  it('prices one part with two breaks, declines another, and the offer reaches the quote board', async () => {
    // The buyer's workspace, set up through the API (Tinbell Gadgets demo names, invented).
    const buyer = await signUp(b.t, { workspaceName: 'Tinbell Gadgets (demo)', name: 'Bea Buyer' });
    const capacitor = await makePart(buyer.agent, {
      internalPn: 'TB-C-HV1', mpn: 'DEMO-1N0-3KV', manufacturer: 'Demo Ceramics', category: 'capacitor', package: 'Disc 7 mm',
      description: 'HV capacitor 1 nF 3 kV, arc lighter multiplier', ratings: { capacitanceF: '1nF', ratedVoltageV: '3kV' },
    });
    const bleeder = await makePart(buyer.agent, { internalPn: 'TB-R-BLD', mpn: 'DEMO-10M-1206', description: 'Bleeder resistor 10 MΩ 1206', package: '1206' });
    const supplier = await makeSupplier(buyer.agent, { name: 'Lantern Passives (demo)', currency: 'CNY', defaultIncoterm: 'FOB', contactEmails: ['quotes@lantern.example'] });
    const sent = await buyer.agent
      .post('/api/rfqs')
      .send({
        title: 'Arc lighter HV passives',
        partIds: [capacitor.id, bleeder.id],
        supplierIds: [supplier.id],
        quantities: [10000, 50000, 100000],
        replyBy: day(14),
        message: 'Reels or bulk bags are both fine. Please quote FOB Shenzhen.',
      })
      .expect(201);
    const rfqId = sent.body.id as string;

    // The link arrives by mail, through the job queue.
    const mail = await waitForMail(b.t.sink, 'quotes@lantern.example', 10_000, 'Arc lighter HV passives');
    const token = tokenIn(mail.text);

    // The supplier: no account, a phone-sized screen.
    const phone = await b.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });
    await phone.route(/^(?!http:\/\/127\.0\.0\.1[:/]).*/, (route) => {
      throw new Error(`unexpected outbound request: ${route.request().url()}`);
    });
    const page = await phone.newPage();
    let n = 100;
    const shot = async (p: Page, name: string) => {
      n++;
      await p.screenshot({ path: join('test-artifacts', 'rfq-reply', `${n}-${name}.png`), fullPage: true });
    };

    await page.goto(`${b.url}/rfq/${token}`);
    await shown(page.getByRole('heading', { name: 'Arc lighter HV passives' }));
    await shown(page.getByText('Tinbell Gadgets (demo)').first());
    await shown(page.getByText('Reels or bulk bags are both fine.'));
    // Nothing overflows sideways on a phone.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await shot(page, 'supplier-opens-link');

    const capCard = page.getByRole('region', { name: /TB-C-HV1/ });
    const bleederCard = page.getByRole('region', { name: /TB-R-BLD/ });
    await shown(capCard.getByText('Maker Demo Ceramics · Package Disc 7 mm'));
    // The supplier's own currency and Incoterm are the defaults; one break per requested quantity.
    expect(await capCard.getByLabel('Currency').inputValue()).toBe('CNY');
    expect(await capCard.getByLabel('Incoterm').inputValue()).toBe('FOB');
    expect(await capCard.getByLabel('Break 3 from quantity').inputValue()).toBe('100000');

    await capCard.getByLabel('MOQ (pcs)').fill('5k');
    await capCard.getByLabel('Order multiple (pcs)').fill('5,000');
    await capCard.getByLabel('Lead time (days)').fill('21');
    await capCard.getByLabel('Valid until').fill(day(60));
    await capCard.getByLabel('Break 1 unit price').fill('0.0215');
    // Seven decimals: refused beside the field by the schema the server uses too.
    await capCard.getByLabel('Break 2 unit price').fill('0.0168001');
    await capCard.getByRole('button', { name: 'Remove break 3' }).click();
    await bleederCard.getByLabel('Decline this part').check();
    await page.getByRole('button', { name: 'Submit quotation' }).click();
    await shown(capCard.getByText('Break 2 unit price must be a decimal number with at most 6 decimals'));
    expect(await capCard.getByLabel('Break 2 unit price').getAttribute('aria-invalid')).toBe('true');
    await shot(page, 'supplier-field-error');

    await capCard.getByLabel('Break 2 unit price').fill('0.0168');
    await page.getByRole('button', { name: 'Submit quotation' }).click();
    await shown(page.getByRole('heading', { name: /Thank you/ }));
    const sentList = page.getByRole('list', { name: 'What was sent' });
    await shown(sentList.getByRole('listitem').filter({ hasText: 'TB-C-HV1' }).getByText('Offer sent'));
    await shown(sentList.getByText('10,000 pcs at 0.0215 CNY, 50,000 pcs at 0.0168 CNY'));
    await shown(sentList.getByRole('listitem').filter({ hasText: 'TB-R-BLD' }).getByText('Declined'));
    await shot(page, 'supplier-thank-you');

    // An unknown link gets a page of its own.
    await page.goto(`${b.url}/rfq/rfq_${'x'.repeat(43)}`);
    await shown(page.getByRole('heading', { name: 'This link is not valid' }));
    await shot(page, 'supplier-unknown-link');

    // The buyer, signed in on a desktop screen: the RFQ page shows the answer, the quote board the offer.
    const desk = b.page;
    await desk.goto(`${b.url}/signin`);
    await desk.getByLabel('Email').fill(buyer.body.email);
    await desk.getByLabel('Password').fill(buyer.body.password);
    await desk.getByRole('button', { name: 'Sign in' }).click();
    await desk.waitForURL('**/boms');
    await desk.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'RFQs', exact: true }).click();
    await desk.waitForURL('**/rfqs');
    const rfqRow = desk.getByRole('row').filter({ hasText: 'Arc lighter HV passives' });
    await shown(rfqRow.getByText('1 of 1'));
    await b.shot('buyer-rfq-list');
    await rfqRow.getByRole('link', { name: 'Arc lighter HV passives' }).click();
    await desk.waitForURL(`**/rfqs/${rfqId}`);
    const asked = desk.getByRole('list', { name: 'Suppliers asked' }).getByRole('listitem', { name: 'Lantern Passives (demo)' });
    await shown(asked.getByText('Answered', { exact: true }));
    await shown(asked.getByText('1 of 2 priced, 1 declined'));
    const grid = desk.getByRole('table', { name: 'Answers by part' });
    await shown(grid.getByRole('row', { name: /TB-R-BLD/ }).getByText('Declined'));
    await b.shot('buyer-rfq-answered');

    await grid.getByRole('link', { name: 'Offer from Lantern Passives (demo) for TB-C-HV1 on the quote board' }).click();
    await desk.waitForURL(`**/quote-board?part=${capacitor.id}`);
    const offers = desk.getByRole('table', { name: 'Offers' });
    await shown(offers.getByText('Lantern Passives (demo)'));
    await b.shot('buyer-quote-board');
    // The same offer through the API: an RFQ quote from that supplier with the two breaks as typed.
    const quotes = await buyer.agent.get(`/api/parts/${capacitor.id}/quotes`).expect(200);
    const fromRfq = quotes.body.items.filter((q: { source: string; supplierId: string }) => q.source === 'rfq' && q.supplierId === supplier.id);
    expect(fromRfq).toHaveLength(1);
    expect(fromRfq[0]).toMatchObject({ currency: 'CNY', incoterm: 'FOB', moq: 5000, orderMultiple: 5000, leadTimeDays: 21, validUntil: day(60) });
    expect(fromRfq[0].priceBreaks.map((p: { minQty: number; unitPrice: string }) => [p.minQty, Number(p.unitPrice)])).toEqual([
      [10000, 0.0215],
      [50000, 0.0168],
    ]);

    // Closing the request: the supplier's link then says so in the server's words (410).
    await desk.goBack();
    await desk.waitForURL(`**/rfqs/${rfqId}`);
    await desk.getByRole('button', { name: 'Close RFQ' }).click();
    await desk.getByRole('dialog').getByRole('button', { name: 'Close RFQ' }).click();
    await shown(desk.getByText('This request is closed'));
    await page.goto(`${b.url}/rfq/${token}`);
    await shown(page.getByRole('heading', { name: 'This link no longer works' }));
    await shown(page.getByText(/request for quotation is closed/));
    await shot(page, 'supplier-closed-link');
    await phone.close();
  }, 90_000);

  it('a buyer sends an RFQ from the New RFQ screen: parts, suppliers with an e-mail, quantities as chips', async () => {
    const buyer = await signUp(b.t, { workspaceName: 'Tinbell Gadgets (demo) 2', name: 'Bea Buyer' });
    await makePart(buyer.agent, { internalPn: 'TB-D-HV', mpn: 'DEMO-HV-DIODE', category: 'diode', ratings: {}, description: 'HV diode, ioniser multiplier' });
    await makeSupplier(buyer.agent, { name: 'Harbour Semis (demo)', currency: 'USD', contactEmails: ['rfq@harbour.example'] });
    await makeSupplier(buyer.agent, { name: 'Quiet Metals (demo)', currency: 'EUR' });
    const page = b.page;
    await page.context().clearCookies();
    await page.goto(`${b.url}/signin`);
    await page.getByLabel('Email').fill(buyer.body.email);
    await page.getByLabel('Password').fill(buyer.body.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/boms');
    await page.goto(`${b.url}/rfqs`);
    await page.getByRole('link', { name: 'New RFQ' }).click();
    await page.waitForURL('**/rfqs/new');
    const form = page.getByRole('form', { name: 'New RFQ' });
    await form.getByLabel('Title').fill('Ioniser diodes, spring build');
    // No BOM in this workspace: the parts are picked from the library.
    await form.getByLabel('Parts I choose').check();
    await form.getByLabel('Find parts').fill('TB-D-HV');
    await form.getByRole('button', { name: 'Add TB-D-HV' }).click();
    await shown(form.getByRole('list', { name: 'Parts to quote' }).getByText('TB-D-HV'));
    // A supplier without a contact e-mail is there, but cannot be asked, and says why.
    const quiet = form.getByLabel('Quiet Metals (demo)');
    expect(await quiet.isDisabled()).toBe(true);
    await shown(form.getByText(/No contact e-mail/));
    await form.getByLabel('Harbour Semis (demo)').check();
    await form.getByLabel('Quantities (pcs)').fill('10k / 50k / 100k');
    await form.getByLabel('Quantities (pcs)').press('Enter');
    await shown(form.getByRole('list', { name: 'Quantities' }).getByText('100,000'));
    expect(await form.getByRole('list', { name: 'Quantities' }).getByRole('listitem').allTextContents()).toEqual(['10,000×', '50,000×', '100,000×']);
    await form.getByLabel('Message to the suppliers').fill('Please quote bulk packing.');
    await b.shot('buyer-new-rfq');
    await form.getByRole('button', { name: 'Send RFQ' }).click();

    await page.waitForURL(/\/rfqs\/\d+$/);
    await shown(page.getByRole('heading', { name: 'Ioniser diodes, spring build' }));
    const asked = page.getByRole('list', { name: 'Suppliers asked' }).getByRole('listitem', { name: 'Harbour Semis (demo)' });
    await shown(asked.getByText('Sent', { exact: true }));
    await b.shot('buyer-rfq-sent');
    const mail = await waitForMail(b.t.sink, 'rfq@harbour.example', 10_000, 'Ioniser diodes, spring build');
    expect(mail.text).toContain('10,000 / 50,000 / 100,000');
  }, 90_000);
});
