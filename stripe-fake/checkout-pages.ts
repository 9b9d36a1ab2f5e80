import express, { Router, type Response } from 'express';
import type { FakeContext } from './context';
import { completeCheckout } from './billing';
import { esc, layout, messagePage, money } from './html';
import type { CheckoutSession } from './objects';

/** The test card numbers the hosted page knows (spaces are ignored). */
export const testCards = { succeeds: '4242424242424242', declined: '4000000000000002' } as const;

interface CardInput {
  cardnumber: string;
  exp: string;
  cvc: string;
}

/** Why a card is refused, or null when it is accepted; `status` is the page's HTTP status. */
function checkCard(input: CardInput, nowMs: number): { status: number; message: string } | null {
  const number = input.cardnumber.replace(/\s+/g, '');
  if (number !== testCards.succeeds && number !== testCards.declined) return { status: 400, message: 'Your card number is incorrect.' };
  const exp = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(input.exp);
  const month = exp ? Number(exp[1]) : 0;
  if (!exp || month < 1 || month > 12) return { status: 400, message: 'Enter the expiry date as MM/YY.' };
  const year = exp[2].length === 2 ? 2000 + Number(exp[2]) : Number(exp[2]);
  // A card is valid through the last day of its expiry month.
  if (Date.UTC(year, month, 1) <= nowMs) return { status: 400, message: 'Your card has expired.' };
  if (!/^\d{3,4}$/.test(input.cvc.trim())) return { status: 400, message: 'Enter the 3 or 4 digit security code (CVC).' };
  if (number === testCards.declined) return { status: 402, message: 'Your card was declined.' };
  return null;
}

function render(ctx: FakeContext, session: CheckoutSession, opts: { error?: string; values?: Partial<CardInput> } = {}): string {
  const plan = ctx.state.checkoutPlans.get(session.id)!;
  const lines = plan.lineItems.map((li) => {
    const price = ctx.state.prices.get(li.price)!;
    const product = ctx.state.products.get(price.product);
    return { name: product?.name ?? price.id, quantity: li.quantity, price };
  });
  const title = lines.map((l) => (l.quantity > 1 ? `${l.quantity} × ${l.name}` : l.name)).join(', ');
  const perMonth = `${money(session.amount_total, session.currency)} a month`;
  const v = opts.values ?? {};
  return layout(`Subscribe to ${title}`, `
<h1>Subscribe to ${esc(title)}</h1>
<p class="muted">${esc(perMonth)}, renewed every 30 days${session.customer_email ? ` · ${esc(session.customer_email)}` : ''}</p>
${opts.error ? `<p class="alert" role="alert">${esc(opts.error)}</p>` : ''}
<form method="post" action="/checkout/${esc(session.id)}">
  <label for="cardnumber">Card number</label>
  <input type="text" id="cardnumber" name="cardnumber" inputmode="numeric" autocomplete="cc-number" placeholder="1234 1234 1234 1234" value="${esc(v.cardnumber)}" required>
  <div class="row">
    <div><label for="exp">Expiry (MM/YY)</label>
    <input type="text" id="exp" name="exp" inputmode="numeric" autocomplete="cc-exp" placeholder="MM/YY" value="${esc(v.exp)}" required></div>
    <div><label for="cvc">Security code (CVC)</label>
    <input type="text" id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" placeholder="123" required></div>
  </div>
  <button type="submit">Pay ${esc(perMonth)} for ${esc(title)}</button>
</form>
<p class="muted">Test cards: 4242 4242 4242 4242 is accepted, 4000 0000 0000 0002 is declined; any future expiry, any 3 digits.</p>
${session.cancel_url ? `<p class="links"><a href="${esc(session.cancel_url)}">Cancel</a></p>` : ''}`);
}

function successUrl(session: CheckoutSession): string {
  return session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id);
}

/** `GET /checkout/:id` (the payment form) and `POST /checkout/:id` (pay with a test card). */
export function checkoutPages(ctx: FakeContext): Router {
  const router = Router();
  const find = (id: string, res: Response): CheckoutSession | null => {
    const session = ctx.state.checkoutSessions.get(id);
    if (!session) res.status(404).type('html').send(messagePage('Checkout not found', 'This checkout link is not valid.'));
    return session ?? null;
  };

  router.get('/checkout/:id', (req, res) => {
    const session = find(req.params.id, res);
    if (!session) return;
    if (session.status === 'complete') {
      res.type('html').send(messagePage('Payment complete', 'This checkout is already paid.', { href: successUrl(session), text: 'Continue' }));
      return;
    }
    res.type('html').send(render(ctx, session));
  });

  router.post('/checkout/:id', express.urlencoded({ extended: false }), (req, res) => {
    const session = find(req.params.id, res);
    if (!session) return;
    // A repeated submit (a double click, a reload) changes nothing and lands on the same page.
    if (session.status === 'complete') {
      res.redirect(303, successUrl(session));
      return;
    }
    const body = (req.body ?? {}) as Record<string, unknown>;
    const input: CardInput = { cardnumber: String(body.cardnumber ?? ''), exp: String(body.exp ?? ''), cvc: String(body.cvc ?? '') };
    const refusal = checkCard(input, ctx.now());
    if (refusal) {
      res.status(refusal.status).type('html').send(render(ctx, session, { error: refusal.message, values: input }));
      return;
    }
    completeCheckout(ctx, session);
    res.redirect(303, successUrl(session));
  });
  return router;
}
