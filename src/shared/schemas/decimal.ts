import { z } from 'zod';

/**
 * Money, prices, rates and percentages travel as decimal strings (never binary floats).
 * Numbers are accepted on input and turned into their exact decimal text.
 */
export function decimalString(opts: { scale: number; min?: 'positive' | 'nonNegative'; maxIntDigits?: number; label?: string }) {
  const intDigits = opts.maxIntDigits ?? 12;
  const re = new RegExp(`^-?\\d{1,${intDigits}}(\\.\\d{1,${opts.scale}})?$`);
  return z
    .union([z.string().trim(), z.number()], { error: 'expected a decimal number such as "0.000810"' })
    .transform((v) => (typeof v === 'number' ? (Number.isFinite(v) ? String(v) : 'NaN') : v))
    .superRefine((v, ctx) => {
      if (!re.test(v)) {
        ctx.addIssue({ code: 'custom', message: `must be a decimal number with at most ${opts.scale} decimals` });
        return;
      }
      const n = Number(v);
      if (opts.min === 'positive' && !(n > 0)) ctx.addIssue({ code: 'custom', message: 'must be greater than 0' });
      if (opts.min === 'nonNegative' && n < 0) ctx.addIssue({ code: 'custom', message: 'must not be negative' });
    });
}

/** Unit prices: positive, at most 6 decimals (a chip resistor costs 0.0008). */
export const unitPrice = decimalString({ scale: 6, min: 'positive' });
/** Money amounts in a currency: not negative, 6 decimals carried. */
export const money = decimalString({ scale: 6, min: 'nonNegative', maxIntDigits: 14 });
/** Percent as text: "3.7" means 3.7 %. */
export const percent = decimalString({ scale: 4, min: 'nonNegative', maxIntDigits: 4 });
/** FX rates keep their published precision. */
export const fxRate = decimalString({ scale: 10, min: 'positive', maxIntDigits: 10 });

export const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date YYYY-MM-DD')
  .refine((s) => {
    const d = new Date(`${s}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
  }, 'is not a real calendar date');
