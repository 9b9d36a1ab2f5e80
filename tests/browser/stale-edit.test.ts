import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { canRunBrowser, startBrowserApp, type BrowserApp } from '../helpers/browser';
import { makeSupplier } from '../helpers/factories';
import { signUp } from '../helpers/app';

let b: BrowserApp;
describe.skipIf(!canRunBrowser)('two people edit the same supplier (browser)', () => {
  beforeAll(async () => {
    b = await startBrowserApp('stale-edit');
  }, 60_000);
  afterAll(async () => b?.close());

  it('the second save is refused with a clear notice; Reload brings their changes back and the next save works', async () => {
    const { page } = b;
    const owner = await signUp(b.t, { email: `stale-${Date.now()}@tinbell.example`, password: 'stale password 1', workspaceName: 'Stale Co' });
    const supplier = await makeSupplier(owner.agent, { name: 'Shenzhen Reel Co', currency: 'CNY' });
    await page.goto(`${b.url}/signin`);
    await page.getByLabel('Email').fill(owner.body.email);
    await page.getByLabel('Password').fill('stale password 1');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/boms');
    await page.goto(`${b.url}/suppliers/${supplier.id}`);
    await page.getByRole('button', { name: 'Edit supplier' }).click();
    // The dialog, not the form's name: the name follows the supplier's as it is refetched.
    const form = page.getByRole('dialog');
    expect(await page.getByRole('form', { name: 'Edit Shenzhen Reel Co' }).count()).toBe(1);
    await form.getByLabel('Notes').fill('Ships reels only');

    // Meanwhile a colleague renames the supplier.
    await owner.agent.patch(`/api/suppliers/${supplier.id}`).send({ name: 'Shenzhen Reel Trading', version: supplier.version }).expect(200);
    await form.getByRole('button', { name: 'Save supplier' }).click();
    await expect.poll(() => form.getByText('This record was changed by someone else').isVisible()).toBe(true);
    await b.shot('stale-notice');

    await form.getByRole('button', { name: 'Reload' }).click();
    await expect.poll(() => form.getByLabel('Name').inputValue()).toBe('Shenzhen Reel Trading');
    expect(await form.getByText('This record was changed by someone else').count()).toBe(0);
    await form.getByLabel('Notes').fill('Ships reels only');
    await form.getByRole('button', { name: 'Save supplier' }).click();
    await expect.poll(async () => (await owner.agent.get(`/api/suppliers/${supplier.id}`)).body, { timeout: 10_000 })
      .toMatchObject({ name: 'Shenzhen Reel Trading', notes: 'Ships reels only', version: supplier.version + 2 });
  }, 60_000);
});
