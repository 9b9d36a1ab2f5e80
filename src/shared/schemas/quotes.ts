import { z } from 'zod';
import { currency, incoterm } from './trade';
import { unitPrice, isoDate } from './decimal';
import { idParam, version } from './common';

export const quoteSources = ['manual', 'import', 'rfq'] as const;

export const priceBreak = z.strictObject({
  minQty: z.number().int('must be a whole number of pieces').min(1, 'must be at least 1').max(1e12),
  unitPrice,
});

/** Price breaks: at least one, strictly ascending minimum quantities. */
export const priceBreaks = z
  .array(priceBreak)
  .min(1, 'needs at least one price break')
  .max(50)
  .superRefine((breaks, ctx) => {
    for (let i = 1; i < breaks.length; i++) {
      if (breaks[i].minQty <= breaks[i - 1].minQty) {
        ctx.addIssue({ code: 'custom', path: [i, 'minQty'], message: 'must be greater than the break above it' });
      }
    }
  });

const fields = {
  partId: idParam,
  supplierId: idParam,
  currency,
  incoterm,
  moq: z.number().int().min(1).max(1e12),
  orderMultiple: z.number().int().min(1).max(1e9),
  leadTimeDays: z.number().int().min(0).max(3650).nullable(),
  validFrom: isoDate.nullable(),
  validUntil: isoDate.nullable(),
  priceBreaks,
  source: z.enum(quoteSources),
  note: z.string().max(1000),
};

const datesInOrder = (q: { validFrom?: string | null; validUntil?: string | null }) =>
  !q.validFrom || !q.validUntil || q.validFrom <= q.validUntil;

export const quoteCreateBody = z
  .strictObject({
    ...fields,
    moq: fields.moq.default(1),
    orderMultiple: fields.orderMultiple.default(1),
    leadTimeDays: fields.leadTimeDays.default(null),
    validFrom: fields.validFrom.default(null),
    validUntil: fields.validUntil.default(null),
    source: fields.source.default('manual'),
    note: fields.note.default(''),
  })
  .refine(datesInOrder, { path: ['validUntil'], message: 'must not be before validFrom' });
export type QuoteCreateBody = z.infer<typeof quoteCreateBody>;

export const quotePatchBody = z
  .strictObject({
    currency: fields.currency.optional(),
    incoterm: fields.incoterm.optional(),
    moq: fields.moq.optional(),
    orderMultiple: fields.orderMultiple.optional(),
    leadTimeDays: fields.leadTimeDays.optional(),
    validFrom: fields.validFrom.optional(),
    validUntil: fields.validUntil.optional(),
    priceBreaks: fields.priceBreaks.optional(),
    supplierId: fields.supplierId.optional(),
    note: fields.note.optional(),
    version,
  })
  .refine(datesInOrder, { path: ['validUntil'], message: 'must not be before validFrom' });
export type QuotePatchBody = z.infer<typeof quotePatchBody>;

export const quoteOut = z.object({
  id: z.string(),
  partId: z.string(),
  supplierId: z.string(),
  supplierName: z.string().optional(),
  currency: z.string(),
  incoterm,
  moq: z.number(),
  orderMultiple: z.number(),
  leadTimeDays: z.number().nullable(),
  validFrom: z.string().nullable(),
  validUntil: z.string().nullable(),
  priceBreaks: z.array(z.object({ minQty: z.number(), unitPrice: z.string() })),
  source: z.enum(quoteSources),
  note: z.string(),
  expired: z.boolean(),
  createdAt: z.string(),
  version: z.number(),
});
export type QuoteOut = z.infer<typeof quoteOut>;

export const offersQuery = z.strictObject({
  qty: z.coerce.number().int().min(1).max(1e9),
  currency: currency.optional(),
  profileId: idParam.optional(),
  date: isoDate.optional(),
});
