import { z } from 'zod';
import { quoteCreateBody, type QuoteCreateBody } from '../../shared/schemas/quotes';
import { incoterms } from '../../shared/schemas/trade';
import type { Quote } from './api';
import { checkPriceBreaks, readQty, type PriceBreakRow } from './price-breaks';

/** The quote editor as typed: every field text. */
export type QuoteFormValues = {
  partId: string;
  supplierId: string;
  currency: string;
  incoterm: (typeof incoterms)[number];
  moq: string;
  orderMultiple: string;
  leadTimeDays: string;
  validFrom: string;
  validUntil: string;
  priceBreaks: PriceBreakRow[];
  note: string;
};

export function emptyQuoteForm(defaults: Partial<QuoteFormValues> = {}): QuoteFormValues {
  return {
    partId: '',
    supplierId: '',
    currency: '',
    incoterm: 'FOB',
    moq: '1',
    orderMultiple: '1',
    leadTimeDays: '',
    validFrom: '',
    validUntil: '',
    priceBreaks: [{ minQty: '1', unitPrice: '' }],
    note: '',
    ...defaults,
  };
}

export function quoteFormValues(quote: Quote): QuoteFormValues {
  return {
    partId: quote.partId,
    supplierId: quote.supplierId,
    currency: quote.currency,
    incoterm: quote.incoterm,
    moq: String(quote.moq),
    orderMultiple: String(quote.orderMultiple),
    leadTimeDays: quote.leadTimeDays === null ? '' : String(quote.leadTimeDays),
    validFrom: quote.validFrom ?? '',
    validUntil: quote.validUntil ?? '',
    priceBreaks: quote.priceBreaks.map((b) => ({ minQty: String(b.minQty), unitPrice: b.unitPrice })),
    note: quote.note,
  };
}

const formShape = z.object({
  partId: z.string(),
  supplierId: z.string(),
  currency: z.string(),
  incoterm: z.enum(incoterms),
  moq: z.string(),
  orderMultiple: z.string(),
  leadTimeDays: z.string(),
  validFrom: z.string(),
  validUntil: z.string(),
  priceBreaks: z.array(z.object({ minQty: z.string(), unitPrice: z.string() })),
  note: z.string(),
});

/**
 * From the typed editor to the request body, checked by the shared `quoteCreateBody`
 * (and the price-break rule row by row), with every problem on the field it concerns:
 * `moq`, `priceBreaks.2.unitPrice`, `validUntil`.
 */
export const quoteFormSchema = formShape.transform((form, ctx): QuoteCreateBody => {
  const problem = (path: (string | number)[], message: string) => ctx.addIssue({ code: 'custom', path, message });
  const whole = (name: 'moq' | 'orderMultiple' | 'leadTimeDays', empty: number | null): number | null => {
    const text = form[name].trim();
    if (!text) return empty;
    const value = readQty(text);
    if (value === null) problem([name], 'must be a whole number');
    return value ?? empty;
  };
  if (!form.partId) problem(['partId'], 'choose the part');
  if (!form.supplierId) problem(['supplierId'], 'choose the supplier');
  const moq = whole('moq', 1);
  const orderMultiple = whole('orderMultiple', 1);
  const leadTimeDays = whole('leadTimeDays', null);
  const breaks = checkPriceBreaks(form.priceBreaks);
  if (!breaks.ok) {
    for (const p of breaks.problems) problem(p.index < 0 ? ['priceBreaks'] : ['priceBreaks', p.index, p.field ?? 'minQty'], p.message);
  }

  const body = quoteCreateBody.safeParse({
    partId: form.partId || '0',
    supplierId: form.supplierId || '0',
    currency: form.currency,
    incoterm: form.incoterm,
    moq,
    orderMultiple,
    leadTimeDays,
    validFrom: form.validFrom || null,
    validUntil: form.validUntil || null,
    priceBreaks: breaks.ok ? breaks.value : [{ minQty: 1, unitPrice: '1' }],
    note: form.note,
  });
  if (!body.success) {
    for (const issue of body.error.issues) {
      const [head] = issue.path;
      // The part, supplier and breaks were checked above in plainer words.
      if (head === 'partId' || head === 'supplierId' || head === 'priceBreaks') continue;
      problem(issue.path.map((p) => (typeof p === 'number' ? p : String(p))), issue.message);
    }
    return z.NEVER;
  }
  return body.data;
});

export type QuoteFormOutput = z.output<typeof quoteFormSchema>;

/** A quote's body as a change (PATCH): the part stays, the source stays. */
export function quotePatch(body: QuoteFormOutput, version: number) {
  const { partId: _partId, source: _source, ...changes } = body;
  return { ...changes, version };
}

export const quoteFormFields = [
  'partId', 'supplierId', 'currency', 'incoterm', 'moq', 'orderMultiple', 'leadTimeDays', 'validFrom', 'validUntil', 'priceBreaks', 'note',
] as const;
