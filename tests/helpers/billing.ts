import type { Server } from 'node:http';
import Stripe from 'stripe';
import { startStripeFake, type RunningStripeFake } from '../../stripe-fake/server';
import { startTestApp, type TestApp } from './app';
import { freePort } from './ports';

export const stripeKey = 'sk_test_farthing_suite';
export const webhookSecret = 'whsec_farthing_suite';

export interface BillingHarness {
  t: TestApp;
  fake: RunningStripeFake;
  stripe: Stripe;
  url: string;
  close(): Promise<void>;
}

/** The app listening on loopback (the fake posts webhooks to it) and our payment-service fake. */
export async function startBillingHarness(env: Record<string, string> = {}): Promise<BillingHarness> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const fake = await startStripeFake({ secretKey: stripeKey, webhookSecret, webhookUrl: `${url}/api/billing/webhook`, retryDelaysMs: [200, 500, 1000] });
  const t = await startTestApp({ STRIPE_API_URL: fake.url, STRIPE_SECRET_KEY: stripeKey, STRIPE_WEBHOOK_SECRET: webhookSecret, PUBLIC_URL: url, ...env });
  const server: Server = await new Promise((resolve) => {
    const s = t.farthing.app.listen(port, '127.0.0.1', () => resolve(s));
  });
  const stripe = new Stripe(stripeKey, { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
  return {
    t, fake, stripe, url,
    close: async () => {
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      await fake.close();
      await t.close();
    },
  };
}

/** Pays on the fake's hosted checkout page as a browser without JavaScript would. */
export function payOnCheckoutPage(checkoutUrl: string, card: string, exp = '12/34', cvc = '123') {
  return fetch(checkoutUrl, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ cardnumber: card, exp, cvc }).toString(),
    redirect: 'manual',
  });
}
