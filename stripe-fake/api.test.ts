/**
 * The JSON API as the official SDK (stripe 23.1.0) sees it. The SDK is the outside
 * reference here: it encodes the requests, parses the answers and picks its error classes
 * from the status and error shape (stack.md §3, verified against the SDK).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { plans } from '../src/shared/plans';
import type { RunningStripeFake } from './server';
import { sdk, secretKey, startFake } from './test-support';

let fake: RunningStripeFake;
let stripe: Stripe;

beforeAll(async () => {
  fake = await startFake();
  stripe = sdk(fake.port);
});
afterAll(() => fake.close());

describe('customers', () => {
  it('creates and retrieves a customer with its e-mail, name and metadata', async () => {
    const before = Math.floor(Date.now() / 1000);
    const created = await stripe.customers.create({ email: 'ana@tinbell.example', name: 'Tinbell Gadgets', metadata: { workspaceId: 'ws-1' } });
    expect(created.id).toMatch(/^cus_[0-9A-Za-z]+$/);
    expect(created.object).toBe('customer');
    expect(created.created).toBeGreaterThanOrEqual(before);
    expect(created.lastResponse.requestId).toMatch(/^req_/);

    const got = await stripe.customers.retrieve(created.id);
    expect(got).toMatchObject({ id: created.id, email: 'ana@tinbell.example', name: 'Tinbell Gadgets', metadata: { workspaceId: 'ws-1' } });
  });

  it('updates a customer, merging metadata and deleting a key given an empty value', async () => {
    const c = await stripe.customers.create({ name: 'Before', metadata: { a: '1', b: '2' } });
    const updated = await stripe.customers.update(c.id, { name: 'After', metadata: { b: '', c: '3' } });
    expect(updated.name).toBe('After');
    expect(updated.metadata).toEqual({ a: '1', c: '3' });
  });

  it('lists every customer exactly once through the SDK auto-pagination (limit and starting_after)', async () => {
    const tag = `batch-${Date.now()}`;
    const made: string[] = [];
    for (let i = 0; i < 23; i++) made.push((await stripe.customers.create({ email: `${tag}-${i}@tinbell.example` })).id);

    const first = await stripe.customers.list({ limit: 10 });
    expect(first.data).toHaveLength(10);
    expect(first.has_more).toBe(true);
    expect(first.data[0].id).toBe(made.at(-1)); // newest first

    const seen: string[] = [];
    for await (const c of stripe.customers.list({ limit: 10 })) seen.push(c.id);
    expect(new Set(seen).size).toBe(seen.length);
    expect(seen.length).toBe(fake.state.customers.size);
    expect(seen.filter((id) => made.includes(id)).reverse()).toEqual(made);
  });
});

describe('prices', () => {
  it('finds each paid plan by its lookup key, with the amount, currency and monthly interval of the plan table', async () => {
    for (const plan of [plans.workshop, plans.factory]) {
      const { data } = await stripe.prices.list({ lookup_keys: [plan.lookupKey!], expand: ['data.product'] });
      expect(data).toHaveLength(1);
      expect(data[0]).toMatchObject({ object: 'price', lookup_key: plan.lookupKey, unit_amount: plan.monthlyCents, currency: 'usd', recurring: { interval: 'month' } });
      expect(data[0].id).toMatch(/^price_/);
      expect((data[0].product as Stripe.Product).name).toContain(plan.name);
    }
    const both = await stripe.prices.list({ lookup_keys: [plans.workshop.lookupKey!, plans.factory.lookupKey!] });
    expect(both.data.map((p) => p.lookup_key).sort()).toEqual([plans.factory.lookupKey, plans.workshop.lookupKey].sort());
    expect((await stripe.prices.list({ lookup_keys: ['no_such_key'] })).data).toEqual([]);
  });
});

describe('errors', () => {
  it('answers a wrong key with 401, which the SDK raises as StripeAuthenticationError', async () => {
    const wrong = sdk(fake.port, 'sk_test_not_the_key');
    const err = await wrong.customers.create({ name: 'x' }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect((err as Stripe.errors.StripeError).statusCode).toBe(401);
    // The key is also checked on reads and on the test-control endpoints.
    const res = await fetch(`${fake.url}/_fake/events`);
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ error: { type: 'authentication_error' } });
  });

  it('answers an unknown id with 404 resource_missing, which the SDK raises as StripeInvalidRequestError', async () => {
    const err = await stripe.subscriptions.retrieve('sub_doesnotexist').catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 404, code: 'resource_missing', rawType: 'invalid_request_error' });
    expect((err as Error).message).toContain('sub_doesnotexist');
    expect((err as Stripe.errors.StripeError).requestId).toMatch(/^req_/);
  });

  it('refuses a missing or an unknown parameter with 400, naming it in bracket notation', async () => {
    const missing = await stripe.checkout.sessions
      .create({ mode: 'subscription', success_url: 'http://127.0.0.1/ok', line_items: [{ quantity: 1 }] })
      .catch((e: unknown) => e);
    expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(missing).toMatchObject({ statusCode: 400, code: 'parameter_missing', param: 'line_items[0][price]' });

    const unknown = await stripe.customers.create({ name: 'x', shipping_speed: 'fast' } as Stripe.CustomerCreateParams).catch((e: unknown) => e);
    expect(unknown).toMatchObject({ statusCode: 400, code: 'parameter_unknown', param: 'shipping_speed' });
  });
});

describe('idempotency', () => {
  it('replays the stored answer for a repeated key and refuses the key with other parameters', async () => {
    const key = `farthing-customer-${Date.now()}`;
    const count = fake.state.customers.size;
    const a = await stripe.customers.create({ name: 'Tinbell Gadgets', email: 'o@tinbell.example' }, { idempotencyKey: key });
    const b = await stripe.customers.create({ name: 'Tinbell Gadgets', email: 'o@tinbell.example' }, { idempotencyKey: key });
    expect(b.id).toBe(a.id);
    expect(b.created).toBe(a.created);
    expect(fake.state.customers.size).toBe(count + 1);

    const clash = await stripe.customers.create({ name: 'Someone else' }, { idempotencyKey: key }).catch((e: unknown) => e);
    expect(clash).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect(clash).toMatchObject({ statusCode: 400, rawType: 'idempotency_error' });
  });

  it('keeps nothing for a request refused by parameter validation, so the key can be used again', async () => {
    const key = `k-${Date.now()}-validation`;
    const refused = await stripe.customers.create({ name: 'x', colour: 'red' } as Stripe.CustomerCreateParams, { idempotencyKey: key }).catch((e: unknown) => e);
    expect(refused).toMatchObject({ statusCode: 400, code: 'parameter_unknown' });
    const ok = await stripe.customers.create({ name: 'x' }, { idempotencyKey: key });
    expect(ok.id).toMatch(/^cus_/);
  });

  it('replays an error answer as well, status and body, marked as a replay', async () => {
    const post = () =>
      fetch(`${fake.url}/v1/billing_portal/sessions`, {
        method: 'POST',
        headers: { authorization: `Bearer ${secretKey}`, 'content-type': 'application/x-www-form-urlencoded', 'idempotency-key': `k-${fake.state.customers.size}-err` },
        body: 'customer=cus_missing',
      });
    const first = await post();
    const again = await post();
    expect(first.status).toBe(404);
    expect(first.headers.get('idempotent-replayed')).toBeNull();
    expect(again.status).toBe(404);
    expect(again.headers.get('idempotent-replayed')).toBe('true');
    expect(await again.json()).toEqual(await first.json());
  });
});

it('answers with JSON 404 for an endpoint it does not emulate', async () => {
  const res = await fetch(`${fake.url}/v1/refunds`, { headers: { authorization: `Bearer ${secretKey}` } });
  expect(res.status).toBe(404);
  expect(res.headers.get('request-id')).toMatch(/^req_/);
  expect(await res.json()).toMatchObject({ error: { type: 'invalid_request_error' } });
});
