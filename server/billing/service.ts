import type Stripe from 'stripe';
import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import { errors } from '../http/errors';
import { audit } from '../audit/repository';
import { plans, planIds, type PlanId } from '../../src/shared/plans';
import { billingOf, effectivePlan, usageOf } from './plan';

export async function billingView(deps: Deps, workspaceId: string) {
  const b = await billingOf(deps.db, workspaceId);
  const { plan, graceEndsAt } = effectivePlan(b, deps.config.BILLING_GRACE_DAYS);
  const usage = await usageOf(deps.db, workspaceId);
  return {
    plan: plan.id,
    planName: plan.name,
    subscribedPlan: b.plan,
    status: b.billingStatus,
    currentPeriodEnd: b.currentPeriodEnd ? new Date(b.currentPeriodEnd).toISOString() : null,
    cancelAtPeriodEnd: b.cancelAtPeriodEnd,
    graceEndsAt: graceEndsAt?.toISOString() ?? null,
    limits: plan.limits,
    usage,
    plans: planIds.map((id) => ({ id, name: plans[id].name, monthlyCents: plans[id].monthlyCents, limits: plans[id].limits })),
  };
}

async function ensureCustomer(deps: Deps, stripe: Stripe, auth: Auth): Promise<string> {
  const b = await billingOf(deps.db, auth.workspaceId);
  if (b.stripeCustomerId) return b.stripeCustomerId;
  const [ws, user] = await Promise.all([
    deps.db('workspaces').where({ id: auth.workspaceId }).first('name'),
    deps.db('users').where({ id: auth.userId }).first('email'),
  ]);
  const customer = await stripe.customers.create(
    { name: ws.name, email: user.email, metadata: { workspaceId: auth.workspaceId } },
    { idempotencyKey: `farthing-customer-${auth.workspaceId}` },
  );
  await deps.db('workspaces').where({ id: auth.workspaceId }).whereNull('stripeCustomerId').update({ stripeCustomerId: customer.id });
  return (await billingOf(deps.db, auth.workspaceId)).stripeCustomerId!;
}

export async function startCheckout(deps: Deps, stripe: Stripe, auth: Auth, planId: PlanId) {
  const plan = plans[planId];
  if (!plan.lookupKey) throw errors.validation('The Bench plan is free: nothing to pay.', [{ path: 'plan', message: 'choose Workshop or Factory' }]);
  const b = await billingOf(deps.db, auth.workspaceId);
  if (b.billingStatus === 'active' && b.plan !== 'bench') throw errors.conflict('This workspace already has a subscription; change the plan in the billing portal.');
  const customer = await ensureCustomer(deps, stripe, auth);
  const prices = await stripe.prices.list({ lookup_keys: [plan.lookupKey], limit: 1 });
  const price = prices.data[0];
  if (!price) throw errors.conflict(`The payment service has no price for ${plan.name}.`);
  const base = deps.config.PUBLIC_URL;
  const session = await stripe.checkout.sessions.create({
    mode: 'subscription',
    customer,
    client_reference_id: auth.workspaceId,
    line_items: [{ price: price.id, quantity: 1 }],
    success_url: `${base}/settings/billing?checkout=success`,
    cancel_url: `${base}/settings/billing?checkout=cancelled`,
    metadata: { workspaceId: auth.workspaceId, plan: planId },
    subscription_data: { metadata: { workspaceId: auth.workspaceId } },
  });
  return { url: session.url! };
}

export async function openPortal(deps: Deps, stripe: Stripe, auth: Auth) {
  const b = await billingOf(deps.db, auth.workspaceId);
  if (!b.stripeCustomerId) throw errors.conflict('This workspace has no subscription yet; choose a plan first.');
  const session = await stripe.billingPortal.sessions.create({ customer: b.stripeCustomerId, return_url: `${deps.config.PUBLIC_URL}/settings/billing` });
  return { url: session.url };
}

export async function listInvoices(deps: Deps, stripe: Stripe, workspaceId: string) {
  const b = await billingOf(deps.db, workspaceId);
  if (!b.stripeCustomerId) return { items: [], nextCursor: null };
  const invoices = await stripe.invoices.list({ customer: b.stripeCustomerId, limit: 24 });
  return {
    items: invoices.data.map((i) => ({
      id: i.id, status: i.status, amountDue: i.amount_due, amountPaid: i.amount_paid, currency: i.currency,
      created: new Date(i.created * 1000).toISOString(), url: i.hosted_invoice_url ?? null,
    })),
    nextCursor: null,
  };
}

const planOfPrice = (lookupKey: string | null | undefined): PlanId | null => planIds.find((id) => plans[id].lookupKey === lookupKey) ?? null;

/**
 * Applies one verified event, once. For anything about a subscription the current state is
 * read back from the payment service and written whole: the service's present state wins,
 * whatever order the events arrived in.
 */
export async function applyEvent(deps: Deps, stripe: Stripe, event: Stripe.Event): Promise<'applied' | 'duplicate' | 'ignored'> {
  const inserted = await deps.db('billing_events').insert({ id: event.id, type: event.type }).onConflict('id').ignore().returning('id');
  if (!inserted.length) return 'duplicate';
  const obj = event.data.object as unknown as Record<string, unknown>;
  let subscriptionId: string | null;
  const customerId: string | null = typeof obj.customer === 'string' ? obj.customer : null;
  switch (event.type) {
    case 'checkout.session.completed':
      subscriptionId = typeof obj.subscription === 'string' ? obj.subscription : null;
      if (customerId && typeof obj.client_reference_id === 'string') {
        await deps.db('workspaces').where({ id: obj.client_reference_id }).whereNull('stripeCustomerId').update({ stripeCustomerId: customerId });
      }
      break;
    case 'customer.subscription.created':
    case 'customer.subscription.updated':
    case 'customer.subscription.deleted':
      subscriptionId = String(obj.id);
      break;
    case 'invoice.paid':
    case 'invoice.payment_failed':
      subscriptionId = typeof obj.subscription === 'string' ? obj.subscription : null;
      break;
    default:
      return 'ignored';
  }
  if (!customerId) return 'ignored';
  const ws = await deps.db('workspaces').where({ stripeCustomerId: customerId }).first('id', 'stripeSubscriptionId');
  if (!ws) return 'ignored';
  await deps.db('billing_events').where({ id: event.id }).update({ workspaceId: ws.id });
  subscriptionId ??= ws.stripeSubscriptionId;
  if (!subscriptionId) return 'applied';
  const sub = await stripe.subscriptions.retrieve(subscriptionId);
  const item = sub.items?.data?.[0];
  const plan = planOfPrice(item?.price?.lookup_key) ?? 'bench';
  const status = sub.status === 'active' || sub.status === 'trialing' ? 'active' : sub.status === 'past_due' || sub.status === 'unpaid' ? 'past_due' : 'canceled';
  const periodEnd = (item as unknown as { current_period_end?: number })?.current_period_end ?? (sub as unknown as { current_period_end?: number }).current_period_end;
  await deps.db.transaction(async (trx) => {
    const before = await trx('workspaces').where({ id: ws.id }).forUpdate().first('plan', 'billingStatus', 'pastDueSince');
    await trx('workspaces').where({ id: ws.id }).update({
      plan: status === 'canceled' ? 'bench' : plan,
      billingStatus: status,
      stripeSubscriptionId: sub.id,
      currentPeriodEnd: periodEnd ? new Date(periodEnd * 1000) : null,
      cancelAtPeriodEnd: Boolean(sub.cancel_at_period_end),
      pastDueSince: status === 'past_due' ? (before.pastDueSince ?? new Date()) : null,
    });
    await audit(trx, { workspaceId: ws.id, userId: null, action: 'billing', entity: 'workspace', entityId: ws.id, changes: { event: event.type, plan: [before.plan, plan], status: [before.billingStatus, status] } });
  });
  return 'applied';
}
