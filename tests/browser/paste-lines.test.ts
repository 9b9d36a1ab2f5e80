import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { canRunBrowser, startBrowserApp, type BrowserApp } from '../helpers/browser';
import { withTsx } from '../helpers/tsx';
import { seedConfig } from '../../server/db/migrate';
import { demoPassword } from '../../seeds/01_demo_workspace';

let b: BrowserApp;
describe.skipIf(!canRunBrowser)('a designer pastes lines from a spreadsheet (browser)', () => {
  beforeAll(async () => {
    b = await startBrowserApp('paste-lines');
    await withTsx(() => b.t.database.db.seed.run(seedConfig));
  }, 90_000);
  afterAll(async () => b?.close());

  it('pastes 20 lines, edits one quantity, sees the landed cost per unit change, opens the volume curve', async () => {
    const { page } = b;
    const agent = b.t.agent();
    await agent.post('/api/auth/login').send({ email: 'designer@tinbell.example', password: demoPassword }).expect(200);
    const profile = (await agent.get('/api/landed-cost-profiles').expect(200)).body.items[0];
    const bom = (await agent.post('/api/boms').send({ name: 'Pasted torch', reportingCurrency: 'USD', profileId: profile.id, plannedQty: 10000 }).expect(201)).body;

    await page.goto(`${b.url}/signin`);
    await page.getByLabel('Email').fill('designer@tinbell.example');
    await page.getByLabel('Password').fill(demoPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/boms');
    await page.goto(`${b.url}/boms/${bom.id}/lines`);
    const grid = page.getByRole('grid', { name: 'Lines' });
    await grid.waitFor();

    // Twenty rows copied from a spreadsheet: Ref des, Part, Kind, Qty per unit (tab-separated).
    const parts = ['TB-R-10K-0603', 'TB-R-1K-0603', 'TB-C-100N-16V-0603', 'TB-L-R-0603', 'TB-R-4K7-0603'];
    const tsv = Array.from({ length: 20 }, (_, i) => `X${i + 1}\t${parts[i % parts.length]}\tpart\t1`).join('\r\n');
    await grid.evaluate((el, text) => {
      const data = new DataTransfer();
      data.setData('text/plain', text);
      el.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
    }, tsv);
    await expect.poll(() => page.getByText('20 lines').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    expect(Number((await b.t.database.db('bom_lines').where({ bomId: bom.id }).count('* as n').first())!.n)).toBe(20);
    await b.shot('pasted');

    const panel = page.getByRole('region', { name: 'Running total' });
    await expect.poll(async () => (await panel.textContent()) ?? '', { timeout: 15_000 }).toMatch(/Landed cost per unit[\s\S]*\d/);
    const before = await panel.textContent();

    // Edit the first line's quantity: move to the Qty column and type.
    await grid.getByRole('gridcell').first().click();
    for (let i = 0; i < 3; i++) await page.keyboard.press('ArrowRight');
    await page.keyboard.type('40');
    await page.keyboard.press('Enter');
    await expect.poll(async () => (await b.t.database.db('bom_lines').where({ bomId: bom.id, refDes: 'X1' }).first()).qtyPerUnit, { timeout: 10_000 }).toBe('40.000000');
    await expect.poll(async () => panel.textContent(), { timeout: 15_000 }).not.toBe(before);
    await b.shot('edited');

    await page.getByRole('link', { name: 'Volume curve', exact: true }).click();
    await page.getByRole('table', { name: 'Volume curve' }).waitFor({ timeout: 15_000 });
    await b.shot('volume-curve');
  }, 120_000);
});
