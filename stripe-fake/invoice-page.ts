import { Router } from 'express';
import type { FakeContext } from './context';
import { day, esc, layout, messagePage, money } from './html';

/** `GET /invoices/:id`: where an invoice's `hosted_invoice_url` points. */
export function invoicePage(ctx: FakeContext): Router {
  const router = Router();
  router.get('/invoices/:id', (req, res) => {
    const invoice = ctx.state.invoices.get(req.params.id);
    if (!invoice) {
      res.status(404).type('html').send(messagePage('Invoice not found', 'This invoice link is not valid.'));
      return;
    }
    const customer = ctx.state.customers.get(invoice.customer);
    const rows = invoice.lines.data
      .map((l) => `<tr><td>${esc(l.description)}</td><td>${day(l.period.start)} to ${day(l.period.end)}</td><td>${esc(money(l.amount, l.currency))}</td></tr>`)
      .join('');
    res.type('html').send(
      layout(`Invoice ${invoice.number}`, `
<h1>Invoice ${esc(invoice.number)}</h1>
<p class="muted">${esc(customer?.name ?? invoice.customer)} · issued ${day(invoice.created)} · ${invoice.status === 'paid' ? 'Paid' : 'Open: payment due'}</p>
<table><thead><tr><th>Item</th><th>Period</th><th>Amount</th></tr></thead><tbody>${rows}</tbody></table>
<p><strong>Amount due: ${esc(money(invoice.amount_due, invoice.currency))}</strong> · paid ${esc(money(invoice.amount_paid, invoice.currency))}</p>`),
    );
  });
  return router;
}
