import type { FakeContext } from './context';
import { invalid, noSuch } from './errors';
import { emit } from './events';
import type { CheckoutSession, Customer, Invoice, Metadata, Subscription, SubscriptionItem } from './objects';
import { mergeMetadata } from './params';
import { newId } from './state';

/** Every period is 30 days: the fake has no calendar months. */
export const periodSeconds = 30 * 86400;

export function getSubscription(ctx: FakeContext, id: string, param = 'id'): Subscription {
  const sub = ctx.state.subscriptions.get(id);
  if (!sub) throw noSuch(id, param);
  return sub;
}

function setPeriod(sub: Subscription, start: number): void {
  sub.current_period_start = start;
  sub.current_period_end = start + periodSeconds;
  for (const item of sub.items.data) {
    item.current_period_start = sub.current_period_start;
    item.current_period_end = sub.current_period_end;
  }
}

function createInvoice(ctx: FakeContext, sub: Subscription, reason: Invoice['billing_reason'], paid: boolean): Invoice {
  const now = ctx.clock.seconds();
  const id = newId('in_');
  const lines = sub.items.data.map((item) => ({
    id: newId('il_'), object: 'line_item' as const, amount: item.price.unit_amount * item.quantity, currency: item.price.currency,
    description: `${item.quantity} × ${item.price.nickname ?? item.price.id}`, quantity: item.quantity, price: item.price.id,
    period: { start: sub.current_period_start, end: sub.current_period_end },
  }));
  const amount = lines.reduce((sum, l) => sum + l.amount, 0);
  ctx.state.invoiceCount += 1;
  const invoice: Invoice = {
    id, object: 'invoice', created: now, number: `FAKE-${String(ctx.state.invoiceCount).padStart(4, '0')}`,
    customer: sub.customer, subscription: sub.id,
    parent: { type: 'subscription_details', subscription_details: { subscription: sub.id, metadata: { ...sub.metadata } } },
    status: paid ? 'paid' : 'open', billing_reason: reason, currency: sub.currency,
    amount_due: amount, amount_paid: paid ? amount : 0, amount_remaining: paid ? 0 : amount,
    attempt_count: 1, attempted: true, hosted_invoice_url: `${ctx.publicUrl()}/invoices/${id}`, invoice_pdf: null,
    period_start: sub.current_period_start, period_end: sub.current_period_end,
    status_transitions: { finalized_at: now, paid_at: paid ? now : null },
    lines: { object: 'list', url: `/v1/invoices/${id}/lines`, has_more: false, data: lines },
    livemode: false,
  };
  ctx.state.invoices.set(id, invoice);
  sub.latest_invoice = id;
  return invoice;
}

/**
 * A successful payment on the hosted checkout page: the customer (made from the session's
 * e-mail when the session named none), an active subscription with the session's line
 * items, its first invoice paid, the session complete; then the three events in the order
 * `checkout.session.completed`, `customer.subscription.created`, `invoice.paid`.
 */
export function completeCheckout(ctx: FakeContext, session: CheckoutSession): Subscription {
  const { state, clock } = ctx;
  const plan = state.checkoutPlans.get(session.id)!;
  let customerId = session.customer;
  if (!customerId) {
    const customer: Customer = {
      id: newId('cus_', 14), object: 'customer', created: clock.seconds(), email: session.customer_email, name: null,
      description: null, metadata: {}, livemode: false,
    };
    state.customers.set(customer.id, customer);
    customerId = customer.id;
  }
  const created = clock.tick();
  const id = newId('sub_');
  const items: SubscriptionItem[] = plan.lineItems.map((li) => ({
    id: newId('si_', 14), object: 'subscription_item', created, subscription: id, price: structuredClone(state.prices.get(li.price)!),
    quantity: li.quantity, current_period_start: created, current_period_end: created + periodSeconds, metadata: {},
  }));
  const sub: Subscription = {
    id, object: 'subscription', created, start_date: created, customer: customerId, status: 'active', currency: session.currency,
    collection_method: 'charge_automatically', current_period_start: created, current_period_end: created + periodSeconds,
    billing_cycle_anchor: created, cancel_at_period_end: false, cancel_at: null, canceled_at: null, ended_at: null,
    items: { object: 'list', url: `/v1/subscription_items?subscription=${id}`, has_more: false, data: items },
    latest_invoice: null, metadata: { ...plan.subscriptionMetadata }, livemode: false,
  };
  state.subscriptions.set(id, sub);
  const invoice = createInvoice(ctx, sub, 'subscription_create', true);
  Object.assign(session, { status: 'complete', payment_status: 'paid', customer: customerId, subscription: id, invoice: invoice.id });
  emit(ctx, 'checkout.session.completed', session);
  emit(ctx, 'customer.subscription.created', sub);
  emit(ctx, 'invoice.paid', invoice);
  return sub;
}

export interface SubscriptionChanges {
  /** Replace the price of existing items (a plan change); no proration in this fake. */
  items?: { id: string; price: string }[];
  cancelAtPeriodEnd?: boolean;
  metadata?: Metadata | '';
}

/** Applies changes and sends `customer.subscription.updated` with `previous_attributes`, when anything changed. */
export function updateSubscription(ctx: FakeContext, sub: Subscription, changes: SubscriptionChanges): Subscription {
  if (sub.status === 'canceled' && (changes.items || changes.cancelAtPeriodEnd !== undefined)) {
    throw invalid(`The subscription ${sub.id} is canceled; only its metadata can change.`);
  }
  // Validate everything before changing anything.
  const replacements = (changes.items ?? []).map((change, i) => {
    const item = sub.items.data.find((it) => it.id === change.id);
    if (!item) throw invalid(`The subscription ${sub.id} has no item '${change.id}'.`, `items[${i}][id]`);
    const price = ctx.state.prices.get(change.price);
    if (!price) throw noSuch(change.price, `items[${i}][price]`);
    return { item, price };
  });
  const before = structuredClone(sub);
  for (const { item, price } of replacements) item.price = structuredClone(price);
  if (changes.cancelAtPeriodEnd !== undefined) {
    sub.cancel_at_period_end = changes.cancelAtPeriodEnd;
    sub.cancel_at = changes.cancelAtPeriodEnd ? sub.current_period_end : null;
  }
  sub.metadata = mergeMetadata(sub.metadata, changes.metadata);
  const previous = changedFields(before, sub);
  if (Object.keys(previous).length) emit(ctx, 'customer.subscription.updated', sub, previous);
  return sub;
}

function assertLive(sub: Subscription): void {
  if (sub.status === 'canceled') throw invalid(`The subscription ${sub.id} is already canceled.`, 'id');
}

/** Ends the subscription now and sends `customer.subscription.deleted`. */
export function cancelSubscription(ctx: FakeContext, sub: Subscription): Subscription {
  assertLive(sub);
  const now = ctx.clock.seconds();
  Object.assign(sub, { status: 'canceled', canceled_at: now, ended_at: now });
  emit(ctx, 'customer.subscription.deleted', sub);
  return sub;
}

/**
 * The renewal charge fails: the period rolls over, its invoice stays open and the
 * subscription goes past due (`invoice.payment_failed`, then `customer.subscription.updated`).
 * On a subscription already past due it is one more failed attempt on the open invoice.
 */
export function failPayment(ctx: FakeContext, sub: Subscription): Subscription {
  assertLive(sub);
  const open = openInvoiceOf(ctx, sub);
  if (open) {
    open.attempt_count += 1;
    emit(ctx, 'invoice.payment_failed', open);
    return sub;
  }
  const before = structuredClone(sub);
  setPeriod(sub, sub.current_period_end);
  const invoice = createInvoice(ctx, sub, 'subscription_cycle', false);
  sub.status = 'past_due';
  emit(ctx, 'invoice.payment_failed', invoice);
  emit(ctx, 'customer.subscription.updated', sub, changedFields(before, sub));
  return sub;
}

/**
 * A successful charge: on a past-due subscription the open invoice is paid (the period
 * already rolled over when it failed); otherwise the period rolls over and a new invoice is
 * paid. Sends `invoice.paid`, then `customer.subscription.updated`. A subscription set to
 * cancel at period end ends instead (`customer.subscription.deleted`).
 */
export function renew(ctx: FakeContext, sub: Subscription): Subscription {
  assertLive(sub);
  if (sub.cancel_at_period_end) return cancelSubscription(ctx, sub);
  const before = structuredClone(sub);
  let invoice = openInvoiceOf(ctx, sub);
  if (invoice) {
    const now = ctx.clock.seconds();
    Object.assign(invoice, { status: 'paid', amount_paid: invoice.amount_due, amount_remaining: 0, attempt_count: invoice.attempt_count + 1 });
    invoice.status_transitions.paid_at = now;
  } else {
    setPeriod(sub, sub.current_period_end);
    invoice = createInvoice(ctx, sub, 'subscription_cycle', true);
  }
  sub.status = 'active';
  emit(ctx, 'invoice.paid', invoice);
  emit(ctx, 'customer.subscription.updated', sub, changedFields(before, sub));
  return sub;
}

/** `previous_attributes`: the earlier value of each top-level field that changed. */
function changedFields(before: Subscription, after: Subscription): Record<string, unknown> {
  const previous: Record<string, unknown> = {};
  for (const key of Object.keys(before) as (keyof Subscription)[]) {
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) previous[key] = before[key];
  }
  return previous;
}

function openInvoiceOf(ctx: FakeContext, sub: Subscription): Invoice | undefined {
  return [...ctx.state.invoices.values()].find((i) => i.subscription === sub.id && i.status === 'open');
}
