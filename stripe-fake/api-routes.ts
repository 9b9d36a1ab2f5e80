import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import type { FakeContext } from './context';
import { cancelSubscription, getSubscription, updateSubscription } from './billing';
import { FakeApiError, invalid, noSuch } from './errors';
import { expandPaths } from './expand';
import { page } from './lists';
import type { CheckoutSession, Customer, PortalSession } from './objects';
import { bool, initialMetadata, integer, listParams, mergeMetadata, metadata, nonEmpty, parseParams, stringList, text } from './params';
import { findObject, newId, newestFirst } from './state';

/** The `/v1` JSON API: the resources and parameters listed in the README, nothing more. */
export function apiRouter(ctx: FakeContext): Router {
  const { state, clock } = ctx;
  const router = Router();
  const send = (res: Response, value: object, expand: string[]) => res.json(expandPaths(value, expand, (id) => findObject(state, id)));
  const retrieveOnly = z.strictObject({});
  const bodyOf = (req: Request) => req.body ?? {};

  function getFrom<T>(map: Map<string, T>, id: string, param = 'id'): T {
    const found = map.get(id);
    if (!found) throw noSuch(id, param);
    return found;
  }

  // Customers
  const customerFields = { email: text.optional(), name: text.optional(), description: text.optional(), metadata: metadata.optional() };
  router.post('/customers', (req, res) => {
    const { params, expand } = parseParams(z.strictObject(customerFields), bodyOf(req));
    const customer: Customer = {
      id: newId('cus_', 14), object: 'customer', created: clock.seconds(), email: params.email || null, name: params.name || null,
      description: params.description || null, metadata: initialMetadata(params.metadata), livemode: false,
    };
    state.customers.set(customer.id, customer);
    send(res, customer, expand);
  });
  router.get('/customers', (req, res) => {
    const { params, expand } = parseParams(z.strictObject({ email: text.optional(), ...listParams }), req.query);
    const all = newestFirst(state.customers.values()).filter((c) => params.email === undefined || c.email === params.email);
    send(res, page(all, params, '/v1/customers'), expand);
  });
  router.get('/customers/:id', (req, res) => {
    const { expand } = parseParams(retrieveOnly, req.query);
    send(res, getFrom(state.customers, req.params.id), expand);
  });
  router.post('/customers/:id', (req, res) => {
    const customer = getFrom(state.customers, req.params.id);
    const { params, expand } = parseParams(z.strictObject(customerFields), bodyOf(req));
    if (params.email !== undefined) customer.email = params.email || null;
    if (params.name !== undefined) customer.name = params.name || null;
    if (params.description !== undefined) customer.description = params.description || null;
    customer.metadata = mergeMetadata(customer.metadata, params.metadata);
    send(res, customer, expand);
  });

  // Products and prices (seeded from the plan table; read-only)
  router.get('/products', (req, res) => {
    const { params, expand } = parseParams(z.strictObject({ active: bool.optional(), ...listParams }), req.query);
    const all = newestFirst(state.products.values()).filter((p) => params.active === undefined || p.active === params.active);
    send(res, page(all, params, '/v1/products'), expand);
  });
  router.get('/products/:id', (req, res) => {
    const { expand } = parseParams(retrieveOnly, req.query);
    send(res, getFrom(state.products, req.params.id), expand);
  });
  router.get('/prices', (req, res) => {
    const schema = z.strictObject({ lookup_keys: stringList.optional(), active: bool.optional(), product: text.optional(), type: z.literal('recurring').optional(), ...listParams });
    const { params, expand } = parseParams(schema, req.query);
    const all = newestFirst(state.prices.values()).filter(
      (p) =>
        (params.lookup_keys === undefined || (p.lookup_key !== null && params.lookup_keys.includes(p.lookup_key))) &&
        (params.active === undefined || p.active === params.active) &&
        (params.product === undefined || p.product === params.product),
    );
    send(res, page(all, params, '/v1/prices'), expand);
  });
  router.get('/prices/:id', (req, res) => {
    const { expand } = parseParams(retrieveOnly, req.query);
    send(res, getFrom(state.prices, req.params.id), expand);
  });

  // Checkout sessions (subscription mode only)
  const checkoutSchema = z.strictObject({
    mode: z.literal('subscription'),
    customer: nonEmpty.optional(),
    customer_email: nonEmpty.optional(),
    line_items: z.array(z.strictObject({ price: nonEmpty, quantity: integer(1, 10_000).optional() })).min(1),
    success_url: nonEmpty,
    cancel_url: nonEmpty.optional(),
    client_reference_id: nonEmpty.optional(),
    metadata: metadata.optional(),
    subscription_data: z.strictObject({ metadata: metadata.optional() }).optional(),
  });
  router.post('/checkout/sessions', (req, res) => {
    const { params, expand } = parseParams(checkoutSchema, bodyOf(req));
    if (params.customer && params.customer_email) throw invalid('You may only specify one of these parameters: customer, customer_email.', 'customer_email');
    if (params.customer) getFrom(state.customers, params.customer, 'customer');
    const lineItems = params.line_items.map((li, i) => ({ price: getFrom(state.prices, li.price, `line_items[${i}][price]`), quantity: li.quantity ?? 1 }));
    const currency = lineItems[0].price.currency;
    if (lineItems.some((li) => li.price.currency !== currency)) throw invalid('All line items must share one currency.', 'line_items');
    const amount = lineItems.reduce((sum, li) => sum + li.price.unit_amount * li.quantity, 0);
    const created = clock.seconds();
    const id = newId('cs_test_', 58);
    const session: CheckoutSession = {
      id, object: 'checkout.session', created, expires_at: created + 24 * 3600, mode: 'subscription', status: 'open', payment_status: 'unpaid',
      customer: params.customer ?? null, customer_email: params.customer_email ?? (params.customer ? state.customers.get(params.customer)!.email : null),
      client_reference_id: params.client_reference_id ?? null, success_url: params.success_url, cancel_url: params.cancel_url ?? null,
      url: `${ctx.publicUrl()}/checkout/${id}`, currency, amount_subtotal: amount, amount_total: amount, subscription: null, invoice: null,
      metadata: initialMetadata(params.metadata), livemode: false,
    };
    state.checkoutSessions.set(id, session);
    state.checkoutPlans.set(id, {
      lineItems: lineItems.map((li) => ({ price: li.price.id, quantity: li.quantity })),
      subscriptionMetadata: initialMetadata(params.subscription_data?.metadata),
    });
    send(res, session, expand);
  });
  router.get('/checkout/sessions/:id', (req, res) => {
    const { expand } = parseParams(retrieveOnly, req.query);
    send(res, getFrom(state.checkoutSessions, req.params.id), expand);
  });

  // Billing portal sessions
  router.post('/billing_portal/sessions', (req, res) => {
    const { params, expand } = parseParams(z.strictObject({ customer: nonEmpty, return_url: nonEmpty.optional() }), bodyOf(req));
    getFrom(state.customers, params.customer, 'customer');
    const id = newId('bps_');
    const session: PortalSession = {
      id, object: 'billing_portal.session', created: clock.seconds(), customer: params.customer, return_url: params.return_url ?? null,
      url: `${ctx.publicUrl()}/portal/${id}`, livemode: false,
    };
    state.portalSessions.set(id, session);
    send(res, session, expand);
  });

  // Subscriptions
  router.get('/subscriptions', (req, res) => {
    const schema = z.strictObject({ customer: text.optional(), status: z.enum(['active', 'past_due', 'canceled', 'all']).optional(), ...listParams });
    const { params, expand } = parseParams(schema, req.query);
    const all = newestFirst(state.subscriptions.values()).filter(
      (s) =>
        (params.customer === undefined || s.customer === params.customer) &&
        // Without a status filter the service leaves canceled subscriptions out.
        (params.status === 'all' || (params.status === undefined ? s.status !== 'canceled' : s.status === params.status)),
    );
    send(res, page(all, params, '/v1/subscriptions'), expand);
  });
  router.get('/subscriptions/:id', (req, res) => {
    const { expand } = parseParams(retrieveOnly, req.query);
    send(res, getSubscription(ctx, req.params.id), expand);
  });
  const updateSchema = z.strictObject({
    cancel_at_period_end: bool.optional(),
    items: z.array(z.strictObject({ id: nonEmpty, price: nonEmpty })).optional(),
    metadata: metadata.optional(),
    // Accepted so that callers can say what they want; this fake never prorates.
    proration_behavior: z.enum(['create_prorations', 'none', 'always_invoice']).optional(),
  });
  router.post('/subscriptions/:id', (req, res) => {
    const sub = getSubscription(ctx, req.params.id);
    const { params, expand } = parseParams(updateSchema, bodyOf(req));
    updateSubscription(ctx, sub, { items: params.items, cancelAtPeriodEnd: params.cancel_at_period_end, metadata: params.metadata });
    send(res, sub, expand);
  });
  router.delete('/subscriptions/:id', (req, res) => {
    const sub = getSubscription(ctx, req.params.id);
    const { expand } = parseParams(z.strictObject({ invoice_now: bool.optional(), prorate: bool.optional() }), req.query);
    cancelSubscription(ctx, sub);
    send(res, sub, expand);
  });

  // Invoices (made by the fake's billing; read-only here)
  router.get('/invoices', (req, res) => {
    const schema = z.strictObject({ customer: text.optional(), subscription: text.optional(), status: z.enum(['open', 'paid']).optional(), ...listParams });
    const { params, expand } = parseParams(schema, req.query);
    const all = newestFirst(state.invoices.values()).filter(
      (i) =>
        (params.customer === undefined || i.customer === params.customer) &&
        (params.subscription === undefined || i.subscription === params.subscription) &&
        (params.status === undefined || i.status === params.status),
    );
    send(res, page(all, params, '/v1/invoices'), expand);
  });
  router.get('/invoices/:id', (req, res) => {
    const { expand } = parseParams(retrieveOnly, req.query);
    send(res, getFrom(state.invoices, req.params.id), expand);
  });

  // Events (what was sent to the webhook endpoint)
  router.get('/events', (req, res) => {
    const { params, expand } = parseParams(z.strictObject({ type: text.optional(), ...listParams }), req.query);
    const all = newestFirst(state.events.map((r) => r.event)).filter((e) => params.type === undefined || e.type === params.type);
    send(res, page(all, params, '/v1/events'), expand);
  });
  router.get('/events/:id', (req, res) => {
    const { expand } = parseParams(retrieveOnly, req.query);
    const record = state.events.find((r) => r.event.id === req.params.id);
    if (!record) throw noSuch(req.params.id);
    send(res, record.event, expand);
  });

  router.use((req) => {
    const path = req.originalUrl.split('?')[0];
    throw new FakeApiError(404, {
      type: 'invalid_request_error',
      message: `Unrecognized request URL (${req.method}: ${path}). This local fake emulates only the endpoints listed in its README.`,
    });
  });
  return router;
}
