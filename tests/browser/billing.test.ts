import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { startStripeFake, type RunningStripeFake } from '../../stripe-fake/server';
import { canRunBrowser, startBrowserAppWith, type BrowserApp } from '../helpers/browser';
import { signUp, type Agent } from '../helpers/app';
import { stripeKey, webhookSecret } from '../helpers/billing';

let b: BrowserApp;
/**
 * Waits until the element is on screen (screens load their code on first visit, and a
 * webhook takes a moment); on failure the page is kept as a screenshot beside the others.
 */
async function shown(locator: Locator, timeout = 20_000) {
  try {
    await expect.poll(() => locator.isVisible(), { timeout, message: String(locator) }).toBe(true);
  } catch (error) {
    await locator.page().screenshot({ path: join('test-artifacts', 'billing', `failed-${Date.now()}.png`), fullPage: true }).catch(() => undefined);
    throw error;
  }
}
let fake: RunningStripeFake | undefined;

/** A Bench workspace at its BOM limit, and its owner's sign-in. */
async function benchOwnerWithThreeBoms(workspaceName: string) {
  const owner = await signUp(b.t, { plan: 'bench', workspaceName });
  for (const name of ['USB arc lighter', 'Clip-on LED book light', 'Desk ioniser']) {
    await owner.agent.post('/api/boms').send({ name: `${name} (demo)`, reportingCurrency: 'USD' }).expect(201);
  }
  return owner;
}

async function signIn(page: Page, email: string, password: string) {
  // Whoever was signed in before is forgotten: each case is its own owner.
  await page.context().clearCookies();
  await page.goto(`${b.url}/signin`);
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL('**/boms');
}

const planOf = async (agent: Agent) => (await agent.get('/api/billing').expect(200)).body as { plan: string; status: string };
const banner = (page: Page) => page.getByRole('region', { name: 'Plan limit' });

describe.skipIf(!canRunBrowser)('an owner upgrades from Bench on the hosted checkout page (browser)', () => {
  beforeAll(async () => {
    // The payment-service fake posts its webhooks to the app, so it needs the app's address first.
    b = await startBrowserAppWith('billing', async (url) => {
      fake = await startStripeFake({ secretKey: stripeKey, webhookSecret, webhookUrl: `${url}/api/billing/webhook`, retryDelaysMs: [200, 500, 1000] });
      return { STRIPE_API_URL: fake.url, STRIPE_SECRET_KEY: stripeKey, STRIPE_WEBHOOK_SECRET: webhookSecret };
    });
  }, 60_000);
  afterAll(async () => {
    await b?.close();
    await fake?.close();
  });

  it('pays with the accepted test card: the plan becomes Workshop and the BOM limit banner goes away', async () => {
    const { page } = b;
    const owner = await benchOwnerWithThreeBoms('Tinbell Gadgets (demo)');
    await signIn(page, owner.body.email, owner.body.password);
    await expect.poll(() => banner(page).textContent(), { timeout: 10_000 }).toContain('Bench plan: 3 of 3 BOMs used — upgrade to Workshop for more.');
    await b.shot('bench-limit-banner');

    await banner(page).getByRole('link', { name: 'Plan & billing' }).click();
    await page.waitForURL('**/settings/billing');
    await shown(page.getByLabel('Usage').getByText('3 / 3'));
    await b.shot('billing-bench');
    await page.getByRole('button', { name: 'Upgrade to Workshop' }).click();

    // The fake's hosted page (on loopback, like everything this browser may reach).
    await page.waitForURL(`${fake!.url}/checkout/**`);
    await page.getByLabel('Card number').fill('4242 4242 4242 4242');
    await page.getByLabel('Expiry (MM/YY)').fill('12/34');
    await page.getByLabel('Security code (CVC)').fill('123');
    await b.shot('hosted-checkout');
    await page.getByRole('button', { name: /^Pay/ }).click();

    await page.waitForURL('**/settings/billing?checkout=success');
    await shown(page.getByText("You're on Workshop."));
    await shown(page.getByRole('listitem', { name: 'Workshop plan' }).getByText('Current plan'));
    await shown(page.getByRole('table', { name: 'Invoices' }).getByRole('cell', { name: 'Paid', exact: true }));
    await b.shot('billing-workshop');
    expect(await planOf(owner.agent)).toMatchObject({ plan: 'workshop', status: 'active' });

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'BOMs', exact: true }).click();
    await page.waitForURL('**/boms');
    await shown(page.getByText('Desk ioniser (demo)'));
    expect(await banner(page).count()).toBe(0);
    await b.shot('boms-without-banner');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/signin');
  }, 90_000);

  it('a declined card leaves the workspace on Bench with the banner still there', async () => {
    const { page } = b;
    const owner = await benchOwnerWithThreeBoms('Second Gadgets (demo)');
    await signIn(page, owner.body.email, owner.body.password);
    await expect.poll(() => banner(page).textContent(), { timeout: 10_000 }).toContain('3 of 3 BOMs used');
    await page.goto(`${b.url}/settings/billing`);
    await page.getByRole('button', { name: 'Upgrade to Workshop' }).click();
    await page.waitForURL(`${fake!.url}/checkout/**`);
    await page.getByLabel('Card number').fill('4000 0000 0000 0002');
    await page.getByLabel('Expiry (MM/YY)').fill('12/34');
    await page.getByLabel('Security code (CVC)').fill('123');
    await page.getByRole('button', { name: /^Pay/ }).click();
    await expect.poll(() => page.getByRole('alert').textContent(), { timeout: 10_000 }).toContain('Your card was declined.');
    await b.shot('hosted-checkout-declined');

    // Back to Farthing by the page's own way out.
    await page.getByRole('link', { name: 'Cancel' }).click();
    await page.waitForURL('**/settings/billing?checkout=cancelled');
    await shown(page.getByText('Checkout was cancelled and nothing was charged.'));
    await shown(page.getByRole('listitem', { name: 'Bench plan' }).getByText('Current plan'));
    await b.shot('billing-cancelled');
    expect(await planOf(owner.agent)).toMatchObject({ plan: 'bench' });

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'BOMs', exact: true }).click();
    await page.waitForURL('**/boms');
    await expect.poll(() => banner(page).textContent(), { timeout: 10_000 }).toContain('Bench plan: 3 of 3 BOMs used');
    await b.shot('boms-banner-still-there');

    // Bench has no RFQs: "New RFQ" is there but disabled, with the reason.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'RFQs', exact: true }).click();
    await page.waitForURL('**/rfqs');
    await expect.poll(() => banner(page).textContent(), { timeout: 10_000 }).toContain('The Bench plan does not include requests for quotation');
    const newRfq = page.getByRole('button', { name: 'New RFQ' });
    expect(await newRfq.isDisabled()).toBe(true);
    expect(await newRfq.getAttribute('aria-describedby')).toBeTruthy();
    await b.shot('rfqs-not-on-bench');

    // Nor API tokens: "Create token" is disabled, the reason beside it.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'API tokens', exact: true }).click();
    await page.waitForURL('**/settings/tokens');
    await shown(page.getByText('The Bench plan does not include API tokens; upgrade to Factory to create API tokens.'));
    expect(await page.getByRole('button', { name: 'Create token' }).isDisabled()).toBe(true);
    await b.shot('tokens-not-on-bench');
  }, 90_000);
});
