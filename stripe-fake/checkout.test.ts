/**
 * Hosted checkout: the SDK creates the session, a browser without JavaScript pays on the
 * form, and the receiver verifies each event with the SDK's own `webhooks.constructEvent`
 * (stripe 23.1.0), the check Farthing's server makes.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type Stripe from 'stripe';
import { plans } from '../src/shared/plans';
import type { RunningStripeFake } from './server';
import { openCheckout, payOnCheckoutPage, sdk, startFake, startReceiver, verifiedEvents, type Receiver } from './test-support';

let fake: RunningStripeFake;
let stripe: Stripe;
let receiver: Receiver;

beforeAll(async () => {
  receiver = await startReceiver();
  fake = await startFake({ webhookUrl: receiver.url });
  stripe = sdk(fake.port);
});
afterAll(async () => {
  await fake.close();
  await receiver.close();
});

const eventsAbout = (stripeClient: Stripe, id: string) =>
  verifiedEvents(stripeClient, receiver.accepted()).filter((e) => JSON.stringify(e.data.object).includes(id));

describe('hosted checkout page', () => {
  it('is a plain form with labelled card fields, a Pay button with plan and price, and a Cancel link', async () => {
    const { session } = await openCheckout(stripe, plans.workshop.lookupKey!);
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.url).toBe(`${fake.url}/checkout/${session.id}`);

    const res = await fetch(session.url!);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/text\/html/);
    const html = await res.text();
    expect(html).toMatch(new RegExp(`<form method="post" action="/checkout/${session.id}">`));
    for (const [id, label] of [['cardnumber', 'Card number'], ['exp', 'Expiry'], ['cvc', 'CVC']]) {
      expect(html).toMatch(new RegExp(`<label for="${id}">[^<]*${label}`));
      expect(html).toContain(`id="${id}" name="${id}"`);
    }
    expect(html).toMatch(/<button type="submit">Pay 29\.00 USD a month for Farthing Workshop<\/button>/);
    expect(html).toContain('<a href="http://127.0.0.1:4100/settings/billing?checkout=cancelled">Cancel</a>');
    expect(html).not.toMatch(/<script/i);
  });

  it('takes 4242 4242 4242 4242: active subscription, paid invoice, three verified events in order, 303 to success_url', async () => {
    const { customer, session, workspaceId } = await openCheckout(stripe, plans.workshop.lookupKey!);
    const res = await payOnCheckoutPage(session.url!, '4242 4242 4242 4242');
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`http://127.0.0.1:4100/settings/billing?checkout=success&session=${session.id}`);

    const done = await stripe.checkout.sessions.retrieve(session.id, { expand: ['subscription'] });
    expect(done).toMatchObject({ status: 'complete', payment_status: 'paid', customer: customer.id, client_reference_id: workspaceId });
    const sub = done.subscription as Stripe.Subscription;
    expect(sub.id).toMatch(/^sub_/);
    expect(sub).toMatchObject({ object: 'subscription', status: 'active', customer: customer.id, cancel_at_period_end: false, metadata: { workspaceId } });
    const item = sub.items.data[0];
    expect(item.id).toMatch(/^si_/);
    expect(item.price).toMatchObject({ lookup_key: plans.workshop.lookupKey, unit_amount: 2900 });
    expect(item.current_period_end - item.current_period_start).toBe(30 * 86400);
    const legacy = sub as unknown as { current_period_start: number; current_period_end: number };
    expect(legacy.current_period_end - legacy.current_period_start).toBe(30 * 86400);

    await receiver.waitFor(() => eventsAbout(stripe, sub.id).length >= 3);
    const events = eventsAbout(stripe, sub.id);
    expect(events.map((e) => e.type)).toEqual(['checkout.session.completed', 'customer.subscription.created', 'invoice.paid']);
    for (const e of events) {
      expect(e.id).toMatch(/^evt_/);
      expect(e.object).toBe('event');
    }
    expect(events[0].data.object).toMatchObject({ id: session.id, subscription: sub.id, customer: customer.id, client_reference_id: workspaceId });
    expect(events[1].data.object).toMatchObject({ id: sub.id, status: 'active' });
    expect(events[2].data.object).toMatchObject({ object: 'invoice', status: 'paid', subscription: sub.id, amount_paid: 2900 });
    // Strictly increasing, so that a receiver can tell the newer state.
    expect(events[0].created).toBeLessThan(events[1].created);
    expect(events[1].created).toBeLessThan(events[2].created);
  });

  it('turns down 4000 0000 0000 0002 with a 402 page and makes no subscription or event', async () => {
    const { customer, session } = await openCheckout(stripe, plans.factory.lookupKey!);
    const eventsBefore = fake.state.events.length;
    const res = await payOnCheckoutPage(session.url!, '4000 0000 0000 0002');
    expect(res.status).toBe(402);
    const html = await res.text();
    expect(html).toContain('Your card was declined.');
    expect(html).toContain('<form method="post"'); // the page again, to try another card
    expect((await stripe.subscriptions.list({ customer: customer.id, status: 'all' })).data).toEqual([]);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    expect(fake.state.events.length).toBe(eventsBefore);
  });

  it('calls any other number incorrect (400), and refuses an expired card or a missing CVC', async () => {
    const { customer, session } = await openCheckout(stripe, plans.workshop.lookupKey!);
    const wrong = await payOnCheckoutPage(session.url!, '4242 4242 4242 4241');
    expect(wrong.status).toBe(400);
    expect(await wrong.text()).toContain('Your card number is incorrect.');
    const expired = await payOnCheckoutPage(session.url!, '4242424242424242', '01/20');
    expect(expired.status).toBe(400);
    expect(await expired.text()).toContain('Your card has expired.');
    const noCvc = await payOnCheckoutPage(session.url!, '4242424242424242', '12/34', '');
    expect(noCvc.status).toBe(400);
    expect((await stripe.subscriptions.list({ customer: customer.id, status: 'all' })).data).toEqual([]);
  });

  it('does not subscribe twice when the form is submitted again', async () => {
    const { customer, session } = await openCheckout(stripe, plans.workshop.lookupKey!);
    expect((await payOnCheckoutPage(session.url!, '4242424242424242')).status).toBe(303);
    expect((await payOnCheckoutPage(session.url!, '4242424242424242')).status).toBe(303);
    expect((await stripe.subscriptions.list({ customer: customer.id })).data).toHaveLength(1);
  });

  it('answers the HTTP request before the webhook receiver has answered', async () => {
    const slow = await startReceiver(() => new Promise((r) => setTimeout(() => r(200), 1500)));
    const other = await startFake({ webhookUrl: slow.url });
    try {
      const { session } = await openCheckout(sdk(other.port), plans.workshop.lookupKey!);
      const t0 = Date.now();
      expect((await payOnCheckoutPage(session.url!, '4242424242424242')).status).toBe(303);
      expect(Date.now() - t0).toBeLessThan(1000);
      await slow.waitFor((d) => d.length >= 1);
      expect(slow.accepted()).toHaveLength(0); // the first delivery is still waiting for its answer
    } finally {
      await other.close();
      await slow.close();
    }
  });
});

describe('after checkout', () => {
  it('retrieves and lists the subscription and lists its paid invoice with a hosted page', async () => {
    const { customer, session } = await openCheckout(stripe, plans.factory.lookupKey!);
    await payOnCheckoutPage(session.url!, '4242424242424242');
    const subs = await stripe.subscriptions.list({ customer: customer.id });
    expect(subs).toMatchObject({ object: 'list', url: '/v1/subscriptions', has_more: false });
    expect(subs.data).toHaveLength(1);
    const sub = await stripe.subscriptions.retrieve(subs.data[0].id);
    expect(sub.items.data[0].price.lookup_key).toBe(plans.factory.lookupKey);

    const invoices = await stripe.invoices.list({ customer: customer.id, limit: 24 });
    expect(invoices.data).toHaveLength(1);
    const inv = invoices.data[0];
    expect(inv.id).toMatch(/^in_/);
    expect(inv).toMatchObject({ object: 'invoice', status: 'paid', amount_paid: 9900, amount_due: 9900, currency: 'usd', customer: customer.id });
    expect(inv.period_end - inv.period_start).toBe(30 * 86400);
    expect(inv.parent?.subscription_details?.subscription).toBe(sub.id);
    expect(sub.latest_invoice).toBe(inv.id);
    const page = await fetch(inv.hosted_invoice_url!);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('99.00 USD');
  });
});
