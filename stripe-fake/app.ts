import express, { type Express } from 'express';
import { apiRouter } from './api-routes';
import { requireSecretKey } from './auth';
import { checkoutPages } from './checkout-pages';
import type { FakeContext } from './context';
import { controlRouter } from './control-routes';
import { jsonErrorHandler } from './errors';
import { idempotency } from './idempotency';
import { invoicePage } from './invoice-page';
import { portalPages } from './portal-pages';
import { createClock, createState, newId, type FakeState } from './state';
import { createWebhookDispatcher } from './webhooks';

export interface StripeFakeOptions {
  /** The only key accepted as `Authorization: Bearer <key>` on `/v1` and `/_fake`. */
  secretKey: string;
  /** Where events are POSTed; without it they are only recorded. */
  webhookUrl?: string;
  /** The signing secret (`whsec_…`) the receiver verifies with. */
  webhookSecret: string;
  /** Base of the hosted pages' URLs (`url` of sessions, `hosted_invoice_url`). */
  publicUrl?: string;
  /** Waits before each redelivery of an event the receiver did not accept. */
  retryDelaysMs?: number[];
  /** Unix milliseconds; drives `created`, periods and expiry checks (signatures use the wall clock). */
  now?: () => number;
  /** One line per delivery attempt; silent by default. */
  log?: (line: string) => void;
}

export interface StripeFake {
  app: Express;
  state: FakeState;
  setPublicUrl(url: string): void;
  /** Stops webhook retries and aborts deliveries in flight. */
  close(): Promise<void>;
}

export const defaultRetryDelaysMs = [500, 2000, 8000, 30000];

/**
 * The local stand-in for the part of the payment service's HTTP API that Farthing uses,
 * as an Express app without a listener (see server.ts). State lives in memory.
 */
export function createStripeFake(opts: StripeFakeOptions): StripeFake {
  const now = opts.now ?? Date.now;
  const clock = createClock(now);
  const state = createState(clock);
  let publicUrl = (opts.publicUrl ?? 'http://127.0.0.1').replace(/\/+$/, '');
  const webhooks = createWebhookDispatcher({
    url: opts.webhookUrl,
    secret: opts.webhookSecret,
    retryDelaysMs: opts.retryDelaysMs ?? defaultRetryDelaysMs,
    records: state.events,
    log: opts.log ?? (() => undefined),
  });
  const ctx: FakeContext = { state, clock, now, publicUrl: () => publicUrl, webhooks, hasEndpoint: Boolean(opts.webhookUrl) };

  const app = express();
  app.disable('x-powered-by');
  // GET parameters use the same bracket notation as bodies (`lookup_keys[0]=…`).
  app.set('query parser', 'extended');
  app.use((_req, res, next) => {
    res.set('request-id', newId('req_', 14));
    next();
  });
  const auth = requireSecretKey(opts.secretKey);
  const form = express.urlencoded({ extended: true });
  app.use('/v1', auth, form, idempotency(now), apiRouter(ctx), jsonErrorHandler);
  app.use('/_fake', auth, form, controlRouter(ctx), jsonErrorHandler);
  app.use(checkoutPages(ctx), portalPages(ctx), invoicePage(ctx));

  return {
    app,
    state,
    setPublicUrl(url) {
      publicUrl = url.replace(/\/+$/, '');
    },
    close: () => webhooks.close(),
  };
}
