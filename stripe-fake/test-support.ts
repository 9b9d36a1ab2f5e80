import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { startStripeFake, type RunningStripeFake } from './server';
import type { StripeFakeOptions } from './app';

export const secretKey = 'sk_test_fake_suite';
export const webhookSecret = 'whsec_fake_suite_signing';

/** The official SDK pointed at the fake, configured as stack.md §3 verified. */
export function sdk(port: number, key = secretKey): Stripe {
  return new Stripe(key, { host: '127.0.0.1', port, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
}

export function startFake(opts: Partial<StripeFakeOptions> = {}): Promise<RunningStripeFake> {
  return startStripeFake({ secretKey, webhookSecret, ...opts });
}

export interface Delivery {
  body: string;
  signature: string;
  /** The status the receiver answered. */
  status: number;
}

export interface Receiver {
  url: string;
  deliveries: Delivery[];
  /** Deliveries the receiver accepted (2xx), in arrival order. */
  accepted(): Delivery[];
  waitFor(done: (deliveries: Delivery[]) => boolean, timeoutMs?: number): Promise<void>;
  close(): Promise<void>;
}

/**
 * A webhook endpoint on 127.0.0.1 that keeps the raw bytes and the signature header of
 * every delivery; `answer(n)` picks the status of the n-th delivery (from 0).
 */
export async function startReceiver(answer: (n: number, body: string) => number | Promise<number> = () => 200): Promise<Receiver> {
  const deliveries: Delivery[] = [];
  const server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', async () => {
      const body = Buffer.concat(chunks).toString('utf8');
      const n = deliveries.length;
      const delivery = { body, signature: String(req.headers['stripe-signature'] ?? ''), status: 0 };
      deliveries.push(delivery);
      delivery.status = await answer(n, body);
      res.statusCode = delivery.status;
      res.end();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/webhook`,
    deliveries,
    accepted: () => deliveries.filter((d) => d.status >= 200 && d.status < 300),
    async waitFor(done, timeoutMs = 5000) {
      const until = Date.now() + timeoutMs;
      while (!done(deliveries)) {
        if (Date.now() > until) {
          const seen = deliveries.map((d) => `${(JSON.parse(d.body) as { type: string }).type}→${d.status}`).join(', ');
          throw new Error(`the webhook receiver did not see what was expected within ${timeoutMs} ms; it saw: ${seen || 'nothing'}`);
        }
        await new Promise((r) => setTimeout(r, 20));
      }
    },
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

/** Submits the hosted checkout form as a browser without JavaScript would; redirects are not followed. */
export function payOnCheckoutPage(checkoutUrl: string, card: string, exp = '12/34', cvc = '123'): Promise<Response> {
  return fetch(checkoutUrl, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ cardnumber: card, exp, cvc }).toString(),
    redirect: 'manual',
  });
}

/** A customer with an open checkout session for a plan's price, found by its lookup key. */
export async function openCheckout(stripe: Stripe, lookupKey: string, extra: { email?: string; workspaceId?: string } = {}) {
  const workspaceId = extra.workspaceId ?? `ws-${Math.random().toString(36).slice(2, 10)}`;
  const customer = await stripe.customers.create({ email: extra.email ?? 'owner@tinbell.example', name: 'Tinbell Gadgets', metadata: { workspaceId } });
  const prices = await stripe.prices.list({ lookup_keys: [lookupKey], limit: 1 });
  const session = await stripe.checkout.sessions.create({
    mode: 'subscription',
    customer: customer.id,
    client_reference_id: workspaceId,
    line_items: [{ price: prices.data[0].id, quantity: 1 }],
    success_url: 'http://127.0.0.1:4100/settings/billing?checkout=success&session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:4100/settings/billing?checkout=cancelled',
    metadata: { workspaceId, plan: 'workshop' },
    subscription_data: { metadata: { workspaceId } },
  });
  return { customer, price: prices.data[0], session, workspaceId };
}

/** Parses deliveries through the SDK's own verifier; throws if any signature does not verify. */
export function verifiedEvents(stripe: Stripe, deliveries: Delivery[]): Stripe.Event[] {
  return deliveries.map((d) => stripe.webhooks.constructEvent(d.body, d.signature, webhookSecret));
}
