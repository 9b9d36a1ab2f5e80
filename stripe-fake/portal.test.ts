/**
 * Billing portal pages and subscription changes through the API; each change must reach
 * the receiver as an event that the SDK's `webhooks.constructEvent` (stripe 23.1.0) accepts.
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

/** A paid Workshop subscription and its customer. */
async function subscribed() {
  const { customer, session } = await openCheckout(stripe, plans.workshop.lookupKey!);
  await payOnCheckoutPage(session.url!, '4242424242424242');
  const sub = (await stripe.subscriptions.list({ customer: customer.id })).data[0];
  return { customer, sub };
}

async function eventsFor(subId: string, type: string, count: number): Promise<Stripe.Event[]> {
  const matching = () => verifiedEvents(stripe, receiver.accepted()).filter((e) => e.type === type && (e.data.object as { id: string }).id === subId);
  await receiver.waitFor(() => matching().length >= count);
  return matching();
}

const postForm = (url: string, fields: Record<string, string> = {}) =>
  fetch(url, { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: new URLSearchParams(fields).toString(), redirect: 'manual' });

describe('billing portal', () => {
  it('shows the current plan with forms to change plan and cancel, and a link back', async () => {
    const { customer } = await subscribed();
    const portal = await stripe.billingPortal.sessions.create({ customer: customer.id, return_url: 'http://127.0.0.1:4100/settings/billing' });
    expect(portal.id).toMatch(/^bps_/);
    expect(portal.url).toBe(`${fake.url}/portal/${portal.id}`);
    const html = await (await fetch(portal.url)).text();
    expect(html).toContain('<strong>Farthing Workshop</strong>, 29.00 USD a month');
    expect(html).toContain(`<form method="post" action="/portal/${portal.id}/plan">`);
    expect(html).toMatch(/type="radio" name="price" value="price_\w+"> Farthing Factory, 99\.00 USD a month/);
    expect(html).toContain(`<form method="post" action="/portal/${portal.id}/cancel">`);
    expect(html).toContain('<a href="http://127.0.0.1:4100/settings/billing">Back</a>');
  });

  it('changes the plan to Factory and sends customer.subscription.updated with the new price', async () => {
    const { customer, sub } = await subscribed();
    const portal = await stripe.billingPortal.sessions.create({ customer: customer.id });
    const factory = (await stripe.prices.list({ lookup_keys: [plans.factory.lookupKey!] })).data[0];

    const res = await postForm(`${portal.url}/plan`, { price: factory.id });
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`/portal/${portal.id}?done=plan`);
    expect((await stripe.subscriptions.retrieve(sub.id)).items.data[0].price.lookup_key).toBe(plans.factory.lookupKey);

    const [updated] = await eventsFor(sub.id, 'customer.subscription.updated', 1);
    const object = updated.data.object as Stripe.Subscription;
    expect(object.items.data[0].price.lookup_key).toBe(plans.factory.lookupKey);
    const before = updated.data.previous_attributes as { items: Stripe.ApiList<Stripe.SubscriptionItem> };
    expect(before.items.data[0].price.lookup_key).toBe(plans.workshop.lookupKey);
    expect(await (await fetch(`${fake.url}${res.headers.get('location')}`)).text()).toContain('Your plan was changed.');
  });

  it('sets and clears cancel at period end, each with an event', async () => {
    const { customer, sub } = await subscribed();
    const portal = await stripe.billingPortal.sessions.create({ customer: customer.id });
    expect((await postForm(`${portal.url}/cancel`)).status).toBe(303);
    const cancelling = await stripe.subscriptions.retrieve(sub.id);
    expect(cancelling).toMatchObject({ cancel_at_period_end: true, status: 'active' });
    expect(await (await fetch(portal.url)).text()).toContain(`action="/portal/${portal.id}/resume"`);

    expect((await postForm(`${portal.url}/resume`)).status).toBe(303);
    expect((await stripe.subscriptions.retrieve(sub.id)).cancel_at_period_end).toBe(false);
    const events = await eventsFor(sub.id, 'customer.subscription.updated', 2);
    expect(events.map((e) => (e.data.object as Stripe.Subscription).cancel_at_period_end)).toEqual([true, false]);
  });

  it('refuses a price that does not exist', async () => {
    const { customer } = await subscribed();
    const portal = await stripe.billingPortal.sessions.create({ customer: customer.id });
    expect((await postForm(`${portal.url}/plan`, { price: 'price_nope' })).status).toBe(400);
  });
});

describe('subscriptions through the API', () => {
  it('changes the plan with items[0][id] + items[0][price], and sets cancel_at_period_end and metadata', async () => {
    const { sub } = await subscribed();
    const factory = (await stripe.prices.list({ lookup_keys: [plans.factory.lookupKey!] })).data[0];
    const updated = await stripe.subscriptions.update(sub.id, {
      items: [{ id: sub.items.data[0].id, price: factory.id }],
      cancel_at_period_end: true,
      metadata: { note: 'moved up' },
      proration_behavior: 'none',
    });
    expect(updated.items.data[0].price.id).toBe(factory.id);
    expect(updated.cancel_at_period_end).toBe(true);
    expect(updated.metadata).toMatchObject({ note: 'moved up', workspaceId: sub.metadata.workspaceId });
    const [event] = await eventsFor(sub.id, 'customer.subscription.updated', 1);
    expect(Object.keys(event.data.previous_attributes ?? {}).sort()).toEqual(['cancel_at', 'cancel_at_period_end', 'items', 'metadata']);
  });

  it('cancels with DELETE: status canceled, customer.subscription.deleted, left out of the default list', async () => {
    const { customer, sub } = await subscribed();
    const canceled = await stripe.subscriptions.cancel(sub.id);
    expect(canceled.status).toBe('canceled');
    expect(canceled.ended_at).not.toBeNull();
    const [deleted] = await eventsFor(sub.id, 'customer.subscription.deleted', 1);
    expect((deleted.data.object as Stripe.Subscription).status).toBe('canceled');
    expect((await stripe.subscriptions.list({ customer: customer.id })).data).toEqual([]);
    expect((await stripe.subscriptions.list({ customer: customer.id, status: 'canceled' })).data.map((s) => s.id)).toEqual([sub.id]);
    await expect(stripe.subscriptions.update(sub.id, { cancel_at_period_end: true })).rejects.toMatchObject({ statusCode: 400 });
  });
});
