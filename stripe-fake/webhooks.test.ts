/**
 * Webhook delivery: signatures checked with the SDK's own `webhooks.constructEvent`
 * (stripe 23.1.0; scheme in stack.md §3), redelivery after a refusal, order per
 * subscription, and the test-control endpoints that make payments fail and periods renew.
 */
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterEach, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { plans } from '../src/shared/plans';
import type { RunningStripeFake } from './server';
import { openCheckout, payOnCheckoutPage, sdk, secretKey, startFake, startReceiver, verifiedEvents, webhookSecret, type Receiver } from './test-support';
import { signatureHeader } from './webhooks';

const cleanups: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (cleanups.length) await cleanups.pop()!();
});

async function setUp(answer?: (n: number) => number, retryDelaysMs = [50, 50, 50]) {
  const receiver = await startReceiver(answer);
  const fake = await startFake({ webhookUrl: receiver.url, retryDelaysMs });
  cleanups.push(() => receiver.close(), () => fake.close());
  return { receiver, fake, stripe: sdk(fake.port) };
}

async function subscribe(stripe: Stripe) {
  const { customer, session } = await openCheckout(stripe, plans.workshop.lookupKey!);
  expect((await payOnCheckoutPage(session.url!, '4242424242424242')).status).toBe(303);
  return { customer, sub: (await stripe.subscriptions.list({ customer: customer.id })).data[0] };
}

const control = (fake: RunningStripeFake, path: string, method = 'POST') =>
  fetch(`${fake.url}/_fake${path}`, { method, headers: { authorization: `Bearer ${secretKey}` } });

const types = (stripe: Stripe, r: Receiver) => verifiedEvents(stripe, r.accepted()).map((e) => e.type);

describe('signatures', () => {
  it('are accepted by constructEvent with the endpoint secret and rejected once the payload or secret differs', async () => {
    const { receiver, stripe } = await setUp();
    await subscribe(stripe);
    await receiver.waitFor((d) => d.length >= 3);
    const { body, signature } = receiver.deliveries[0];
    expect(signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    expect(stripe.webhooks.constructEvent(body, signature, webhookSecret).type).toBe('checkout.session.completed');
    expect(stripe.webhooks.constructEvent(Buffer.from(body), signature, webhookSecret).id).toMatch(/^evt_/);

    // A forged event: the same header on a changed payload.
    const forged = body.replace('"status": "complete"', '"status": "open"');
    expect(forged).not.toBe(body);
    expect(() => stripe.webhooks.constructEvent(forged, signature, webhookSecret)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    // Signed with another secret, or verified with another secret.
    const t = Math.floor(Date.now() / 1000);
    expect(() => stripe.webhooks.constructEvent(body, signatureHeader(body, 'whsec_someone_else', t), webhookSecret)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => stripe.webhooks.constructEvent(body, signature, 'whsec_wrong')).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it('match the SDK test header for the same payload, secret and time', () => {
    const stripe = sdk(1);
    const payload = JSON.stringify({ id: 'evt_x', object: 'event' });
    const timestamp = 1_900_000_000;
    expect(signatureHeader(payload, webhookSecret, timestamp)).toBe(stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret, timestamp }));
  });
});

describe('delivery', () => {
  it('sends an event again after the receiver answers 500, and records both attempts', async () => {
    const { receiver, fake, stripe } = await setUp((n) => (n === 0 ? 500 : 200));
    await subscribe(stripe);
    await receiver.waitFor(() => receiver.accepted().length >= 3);
    expect(receiver.deliveries.map((d) => d.status)).toEqual([500, 200, 200, 200]);
    expect(receiver.deliveries[0].body).toBe(receiver.deliveries[1].body); // the same event, byte for byte
    // The later events of the subscription waited for the retried one: order is kept.
    expect(types(stripe, receiver)).toEqual(['checkout.session.completed', 'customer.subscription.created', 'invoice.paid']);

    const log = (await (await control(fake, '/events', 'GET')).json()) as { data: { type: string; delivery: string; attempts: { status: number | null }[] }[] };
    const first = log.data.find((e) => e.type === 'checkout.session.completed')!;
    expect(first.delivery).toBe('delivered');
    expect(first.attempts.map((a) => a.status)).toEqual([500, 200]);
  });

  it('retries a receiver that cannot be reached, then records the event as failed', async () => {
    // A port that was free a moment ago: nothing listens there.
    const probe = createServer();
    await new Promise<void>((r) => probe.listen(0, '127.0.0.1', r));
    const { port } = probe.address() as AddressInfo;
    await new Promise<void>((r) => probe.close(() => r()));
    const fake = await startFake({ webhookUrl: `http://127.0.0.1:${port}/webhook`, retryDelaysMs: [20, 20] });
    cleanups.push(() => fake.close());
    await subscribe(sdk(fake.port));
    const record = fake.state.events[0];
    for (let i = 0; i < 100 && record.delivery === 'pending'; i++) await new Promise((r) => setTimeout(r, 20));
    expect(record.delivery).toBe('failed');
    expect(record.attempts).toHaveLength(3);
    expect(record.attempts.every((a) => a.status === null && a.error)).toBe(true);
  });
});

describe('test-control endpoints', () => {
  it('payment-failed: open invoice, invoice.payment_failed, past_due, customer.subscription.updated', async () => {
    const { receiver, fake, stripe } = await setUp();
    const { customer, sub } = await subscribe(stripe);
    const res = await control(fake, `/subscriptions/${sub.id}/payment-failed`);
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ id: sub.id, status: 'past_due' });
    await receiver.waitFor(() => receiver.accepted().length >= 5);
    expect(types(stripe, receiver).slice(3)).toEqual(['invoice.payment_failed', 'customer.subscription.updated']);

    const after = await stripe.subscriptions.retrieve(sub.id);
    expect(after.status).toBe('past_due');
    const open = (await stripe.invoices.list({ customer: customer.id, status: 'open' })).data;
    expect(open).toHaveLength(1);
    expect(open[0]).toMatchObject({ amount_due: 2900, amount_paid: 0 });
    expect(after.latest_invoice).toBe(open[0].id);
  });

  it('renew: a new 30-day period, a paid invoice, invoice.paid then customer.subscription.updated', async () => {
    const { receiver, fake, stripe } = await setUp();
    const { customer, sub } = await subscribe(stripe);
    expect((await control(fake, `/subscriptions/${sub.id}/renew`)).status).toBe(200);
    const after = await stripe.subscriptions.retrieve(sub.id);
    expect(after.items.data[0].current_period_start).toBe(sub.items.data[0].current_period_end);
    expect(after.items.data[0].current_period_end).toBe(sub.items.data[0].current_period_end + 30 * 86400);
    expect((await stripe.invoices.list({ customer: customer.id })).data.map((i) => i.status)).toEqual(['paid', 'paid']);
    await receiver.waitFor(() => receiver.accepted().length >= 5);
    expect(types(stripe, receiver).slice(3)).toEqual(['invoice.paid', 'customer.subscription.updated']);
  });

  it('renew after a failed payment pays the open invoice and makes the subscription active again', async () => {
    const { receiver, fake, stripe } = await setUp();
    const { customer, sub } = await subscribe(stripe);
    await control(fake, `/subscriptions/${sub.id}/payment-failed`);
    await control(fake, `/subscriptions/${sub.id}/renew`);
    expect((await stripe.subscriptions.retrieve(sub.id)).status).toBe('active');
    expect((await stripe.invoices.list({ customer: customer.id })).data.map((i) => i.status)).toEqual(['paid', 'paid']);
    await receiver.waitFor(() => receiver.accepted().length >= 7);
    const updates = verifiedEvents(stripe, receiver.accepted()).filter((e) => e.type === 'customer.subscription.updated');
    expect(updates.map((e) => (e.data.object as Stripe.Subscription).status)).toEqual(['past_due', 'active']);
  });

  it('delete: status canceled and customer.subscription.deleted', async () => {
    const { receiver, fake, stripe } = await setUp();
    const { sub } = await subscribe(stripe);
    expect((await control(fake, `/subscriptions/${sub.id}/delete`)).status).toBe(200);
    expect((await stripe.subscriptions.retrieve(sub.id)).status).toBe('canceled');
    await receiver.waitFor(() => receiver.accepted().length >= 4);
    expect(types(stripe, receiver)[3]).toBe('customer.subscription.deleted');
    // A second delete is refused in the service's error shape.
    const again = await control(fake, `/subscriptions/${sub.id}/delete`);
    expect(again.status).toBe(400);
    expect(await again.json()).toMatchObject({ error: { type: 'invalid_request_error' } });
  });

  it('answers 404 in the error shape for an unknown subscription', async () => {
    const { fake } = await setUp();
    const res = await control(fake, '/subscriptions/sub_nope/renew');
    expect(res.status).toBe(404);
    expect(await res.json()).toMatchObject({ error: { type: 'invalid_request_error', code: 'resource_missing' } });
  });
});
