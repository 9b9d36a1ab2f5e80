import { Router } from 'express';
import type { FakeContext } from './context';
import { FakeApiError } from './errors';
import { cancelSubscription, failPayment, getSubscription, renew } from './billing';

/**
 * `/_fake`: what tests and the demo use to make time pass and payments fail. Not part of
 * the payment service's API; the SDK never calls these.
 */
export function controlRouter(ctx: FakeContext): Router {
  const router = Router();
  const actions = { 'payment-failed': failPayment, renew, delete: cancelSubscription } as const;
  for (const [name, action] of Object.entries(actions)) {
    router.post(`/subscriptions/:id/${name}`, (req, res) => {
      res.json(structuredClone(action(ctx, getSubscription(ctx, req.params.id))));
    });
  }
  router.get('/events', (_req, res) => {
    res.json({
      object: 'list',
      data: ctx.state.events.map((r) => ({ id: r.event.id, type: r.event.type, created: r.event.created, delivery: r.delivery, attempts: r.attempts, event: r.event })),
    });
  });
  router.use((req) => {
    throw new FakeApiError(404, { type: 'invalid_request_error', message: `Unrecognized test-control URL (${req.method}: ${req.originalUrl.split('?')[0]}).` });
  });
  return router;
}
