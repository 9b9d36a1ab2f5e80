import { z } from 'zod';
import { currency } from './trade';
import { fxRate, isoDate } from './decimal';

/** 1 `base` = `rate` `quote` on `date`. */
export const fxRateBody = z
  .strictObject({ date: isoDate, base: currency, quote: currency, rate: fxRate })
  .refine((r) => r.base !== r.quote, { path: ['quote'], message: 'must differ from base' });
export type FxRateBody = z.infer<typeof fxRateBody>;

export const fxRateOut = z.object({ id: z.string(), date: z.string(), base: z.string(), quote: z.string(), rate: z.string(), source: z.string() });

export const fxListQuery = z.strictObject({
  from: isoDate.optional(),
  to: isoDate.optional(),
  currency: currency.optional(),
  limit: z.coerce.number().int().min(1).max(5000).default(1000),
});
