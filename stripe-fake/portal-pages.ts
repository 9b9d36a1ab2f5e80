import express, { Router, type Response } from 'express';
import type { FakeContext } from './context';
import { updateSubscription } from './billing';
import { day, esc, layout, messagePage, money } from './html';
import type { PortalSession, Subscription } from './objects';
import { newestFirst } from './state';

const notices: Record<string, string> = {
  plan: 'Your plan was changed.',
  cancel: 'Your subscription will end at the end of the period.',
  resume: 'Your subscription will renew.',
  same: 'That is already your plan.',
};

const statusNames: Record<Subscription['status'], string> = { active: 'Active', past_due: 'Payment overdue', canceled: 'Ended' };

/** The subscription the portal manages: the customer's newest one still running, else the newest. */
function currentSubscription(ctx: FakeContext, customer: string): Subscription | undefined {
  const mine = newestFirst(ctx.state.subscriptions.values()).filter((s) => s.customer === customer);
  return mine.find((s) => s.status !== 'canceled') ?? mine[0];
}

function render(ctx: FakeContext, session: PortalSession, notice?: string, error?: string): string {
  const customer = ctx.state.customers.get(session.customer);
  const sub = currentSubscription(ctx, session.customer);
  const back = session.return_url ? `<p class="links"><a href="${esc(session.return_url)}">Back</a></p>` : '';
  const head = `<h1>Your subscription</h1><p class="muted">${esc(customer?.name ?? '')}${customer?.email ? ` · ${esc(customer.email)}` : ''}</p>
${notice ? `<p class="notice" role="status">${esc(notice)}</p>` : ''}${error ? `<p class="alert" role="alert">${esc(error)}</p>` : ''}`;
  if (!sub) return layout('Your subscription', `${head}<p>There is no subscription yet.</p>${back}`);

  const item = sub.items.data[0];
  const productName = (priceProduct: string) => ctx.state.products.get(priceProduct)?.name ?? priceProduct;
  const summary = `<p><strong>${esc(productName(item.price.product))}</strong>, ${esc(money(item.price.unit_amount * item.quantity, item.price.currency))} a month</p>
<p class="muted">Status: ${esc(statusNames[sub.status])}. ${
    sub.status === 'canceled' ? `Ended on ${day(sub.ended_at ?? sub.current_period_end)}.`
    : sub.cancel_at_period_end ? `Ends on ${day(sub.current_period_end)}.`
    : `Renews on ${day(sub.current_period_end)}.`
  }</p>`;
  const invoices = newestFirst(ctx.state.invoices.values()).filter((i) => i.subscription === sub.id);
  const invoiceTable = invoices.length
    ? `<h2>Invoices</h2><table><thead><tr><th>Date</th><th>Amount</th><th>Status</th></tr></thead><tbody>${invoices
        .map((i) => `<tr><td><a href="${esc(i.hosted_invoice_url)}">${day(i.created)}</a></td><td>${esc(money(i.amount_due, i.currency))}</td><td>${esc(i.status)}</td></tr>`)
        .join('')}</tbody></table>`
    : '';
  if (sub.status === 'canceled') return layout('Your subscription', `${head}${summary}${invoiceTable}${back}`);

  const prices = [...ctx.state.prices.values()].filter((p) => p.active);
  const choices = prices
    .map((p) => `<label class="choice"><input type="radio" name="price" value="${esc(p.id)}"${p.id === item.price.id ? ' checked' : ''}> ${esc(productName(p.product))}, ${esc(money(p.unit_amount, p.currency))} a month</label>`)
    .join('');
  const id = esc(session.id);
  const planForm = `<h2>Change plan</h2><form method="post" action="/portal/${id}/plan">${choices}<button type="submit">Change plan</button></form>`;
  const cancelForm = sub.cancel_at_period_end
    ? `<h2>Keep the subscription</h2><form method="post" action="/portal/${id}/resume"><button type="submit" class="secondary">Keep my subscription</button></form>`
    : `<h2>Cancel</h2><p class="muted">The plan stays until ${day(sub.current_period_end)}, then ends.</p><form method="post" action="/portal/${id}/cancel"><button type="submit" class="secondary">Cancel at period end</button></form>`;
  return layout('Your subscription', `${head}${summary}${planForm}${cancelForm}${invoiceTable}${back}`);
}

/** `GET /portal/:id` and its forms: change plan, cancel at period end, keep the subscription. */
export function portalPages(ctx: FakeContext): Router {
  const router = Router();
  const find = (id: string, res: Response): PortalSession | null => {
    const session = ctx.state.portalSessions.get(id);
    if (!session) res.status(404).type('html').send(messagePage('Portal not found', 'This billing link is not valid.'));
    return session ?? null;
  };
  const live = (session: PortalSession, res: Response): Subscription | null => {
    const sub = currentSubscription(ctx, session.customer);
    if (!sub || sub.status === 'canceled') {
      res.status(409).type('html').send(render(ctx, session, undefined, 'There is no running subscription to change.'));
      return null;
    }
    return sub;
  };
  const done = (res: Response, session: PortalSession, what: keyof typeof notices) => res.redirect(303, `/portal/${session.id}?done=${what}`);

  router.get('/portal/:id', (req, res) => {
    const session = find(req.params.id, res);
    if (!session) return;
    const what = typeof req.query.done === 'string' ? req.query.done : '';
    res.type('html').send(render(ctx, session, notices[what]));
  });

  const form = express.urlencoded({ extended: false });
  router.post('/portal/:id/plan', form, (req, res) => {
    const session = find(req.params.id, res);
    const sub = session && live(session, res);
    if (!session || !sub) return;
    const priceId = String((req.body as Record<string, unknown> | undefined)?.price ?? '');
    if (!ctx.state.prices.has(priceId)) {
      res.status(400).type('html').send(render(ctx, session, undefined, 'Choose one of the plans.'));
      return;
    }
    if (sub.items.data[0].price.id === priceId) return done(res, session, 'same');
    updateSubscription(ctx, sub, { items: [{ id: sub.items.data[0].id, price: priceId }] });
    done(res, session, 'plan');
  });
  for (const [action, cancelAtPeriodEnd] of [['cancel', true], ['resume', false]] as const) {
    router.post(`/portal/:id/${action}`, form, (req, res) => {
      const session = find(req.params.id, res);
      const sub = session && live(session, res);
      if (!session || !sub) return;
      updateSubscription(ctx, sub, { cancelAtPeriodEnd });
      done(res, session, action);
    });
  }
  return router;
}
