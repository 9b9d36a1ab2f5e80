import { z } from 'zod';
import { idParam } from './common';
import { isoDate } from './decimal';
import { currency, incoterm } from './trade';
import { priceBreaks } from './quotes';

export const rfqCreateBody = z
  .strictObject({
    title: z.string().trim().min(1, 'is required').max(160),
    bomId: idParam.nullable().default(null),
    /** Parts to quote; with a BOM and no parts, every part line of the BOM. */
    partIds: z.array(idParam).max(2000).default([]),
    supplierIds: z.array(idParam).min(1, 'choose at least one supplier').max(50),
    quantities: z.array(z.number().int().min(1).max(100_000_000)).min(1, 'give at least one quantity').max(8),
    replyBy: isoDate,
    message: z.string().max(2000).default(''),
  })
  .refine((b) => b.bomId || b.partIds.length, { path: ['partIds'], message: 'choose parts or a BOM' });
export type RfqCreateBody = z.infer<typeof rfqCreateBody>;

/** One supplier's answer for one requested part. */
export const rfqAnswerItem = z.discriminatedUnion('declined', [
  z.strictObject({ itemId: idParam, declined: z.literal(true), note: z.string().max(500).optional() }),
  z
    .strictObject({
      itemId: idParam,
      declined: z.literal(false),
      currency,
      incoterm,
      moq: z.number().int().min(1).max(1e12),
      orderMultiple: z.number().int().min(1).max(1e9),
      leadTimeDays: z.number().int().min(0).max(3650),
      validUntil: isoDate,
      priceBreaks,
      note: z.string().max(500).optional(),
    }),
]);

export const rfqAnswerBody = z.strictObject({
  items: z.array(rfqAnswerItem).min(1, 'answer at least one part').max(2000),
});
export type RfqAnswerBody = z.infer<typeof rfqAnswerBody>;

