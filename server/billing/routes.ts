import { z } from 'zod';
import type Stripe from 'stripe';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { planIds } from '../../src/shared/plans';
import { billingView, startCheckout, openPortal, listInvoices, applyEvent } from './service';

export const billingRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/billing', access: 'workspace.read', tag: 'Billing',
    summary: 'The workspace plan, status, renewal date, limits and usage (every member sees the limits before hitting them).',
    handler: async ({ auth, deps }) => billingView(deps, auth.workspaceId),
  }),
  route({
    method: 'post', path: '/api/billing/checkout', access: 'billing.manage', tag: 'Billing',
    summary: "Start an upgrade: answers the payment service's hosted checkout page to send the owner to.",
    body: z.strictObject({ plan: z.enum(planIds) }),
    handler: async ({ auth, body, deps }) => startCheckout(deps, deps.stripe, auth, body.plan),
  }),
  route({
    method: 'post', path: '/api/billing/portal', access: 'billing.manage', tag: 'Billing',
    summary: "Open the payment service's billing portal (change plan, cancel at period end).",
    handler: async ({ auth, deps }) => openPortal(deps, deps.stripe, auth),
  }),
  route({
    method: 'get', path: '/api/billing/invoices', access: 'billing.manage', tag: 'Billing',
    summary: 'Invoices of the workspace subscription.',
    handler: async ({ auth, deps }) => listInvoices(deps, deps.stripe, auth.workspaceId),
  }),
  route({
    method: 'post', path: '/api/billing/webhook', access: 'public', tag: 'Billing', bodyKind: 'raw',
    summary: "Payment-service events (raw body, signature verified; not for browsers). Each event is applied once; the subscription's current state wins over arrival order.",
    handler: async ({ req, deps }) => {
      const signature = req.get('stripe-signature');
      if (!signature || !Buffer.isBuffer(req.body)) throw errors.validation('Missing signature or body.', [{ path: 'stripe-signature', message: 'is required' }]);
      let event: Stripe.Event;
      try {
        event = deps.stripe.webhooks.constructEvent(req.body, signature, deps.config.STRIPE_WEBHOOK_SECRET);
      } catch {
        throw errors.validation('The event signature is not valid or too old.', [{ path: 'stripe-signature', message: 'does not verify' }]);
      }
      return { received: true, result: await applyEvent(deps, deps.stripe, event) };
    },
  }),
];
