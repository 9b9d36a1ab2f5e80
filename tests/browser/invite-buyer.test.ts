import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { canRunBrowser, startBrowserApp, type BrowserApp } from '../helpers/browser';
import { waitForMail, linkIn } from '../helpers/app';

let b: BrowserApp;
describe.skipIf(!canRunBrowser)('a new owner invites a buyer (browser)', () => {
  beforeAll(async () => {
    b = await startBrowserApp('invite-buyer');
  }, 60_000);
  afterAll(async () => b?.close());

  it('signs up, lands on the empty BOMs page, invites a buyer who accepts and sees the buyer navigation', async () => {
    const { page } = b;
    const owner = `owner-${Date.now()}@tinbell.example`;
    await page.goto(`${b.url}/signup`);
    await b.shot('sign-up');
    await page.getByLabel('Your name').fill('Ada Owner');
    await page.getByLabel('Email').fill(owner);
    await page.getByLabel('Password').fill('owner password 1');
    await page.getByLabel('Workspace name').fill('Browser Gadgets');
    await page.getByRole('button', { name: 'Create workspace' }).click();
    await page.waitForURL('**/boms');
    await expect.poll(() => page.getByText('No BOMs in this workspace yet.').isVisible()).toBe(true);
    await b.shot('empty-boms');

    await page.getByRole('link', { name: 'Members' }).click();
    await page.waitForURL('**/settings/members');
    const buyer = `buyer-${Date.now()}@tinbell.example`;
    const form = page.locator('form').filter({ has: page.getByRole('button', { name: 'Send invite' }) });
    await form.getByLabel('Email').fill(buyer);
    await form.getByLabel('Invite as').selectOption('buyer');
    await form.getByRole('button', { name: 'Send invite' }).click();
    await expect.poll(() => page.getByText(buyer).count()).toBeGreaterThan(0);
    await b.shot('members-invited');

    // The invitation arrives at the real mail sink; its link is the way in.
    const mail = await waitForMail(b.t.sink, buyer);
    const token = linkIn(mail.text, '/invite');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/signin');
    await page.goto(`${b.url}/invite/${token}`);
    await expect.poll(() => page.getByText('Browser Gadgets').first().isVisible()).toBe(true);
    await b.shot('accept-invite');
    await page.getByLabel('Your name').fill('Bea Buyer');
    await page.getByLabel('Password').fill('buyer password 1');
    await page.getByRole('button', { name: 'Accept invite' }).click();
    await page.waitForURL('**/boms');

    // Sign out and back in as the buyer.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/signin');
    await page.getByLabel('Email').fill(buyer);
    await page.getByLabel('Password').fill('buyer password 1');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/boms');
    const nav = page.getByRole('navigation', { name: 'Main' });
    for (const area of ['BOMs', 'Parts', 'Suppliers', 'Quote board', 'RFQs', 'FX rates', 'Landed-cost profiles', 'Members', 'API tokens']) {
      await expect.poll(() => nav.getByRole('link', { name: area, exact: true }).count(), { message: area }).toBe(1);
    }
    expect(await nav.getByRole('link', { name: 'Plan & billing' }).count()).toBe(0);
    await b.shot('buyer-navigation');
    await page.getByRole('link', { name: 'Members' }).click();
    await page.waitForURL('**/settings/members');
    expect(await page.getByRole('button', { name: 'Send invite' }).count()).toBe(0);
    await b.shot('buyer-members');
  }, 60_000);
});
