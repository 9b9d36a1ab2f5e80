import { z } from 'zod';
import { shelf } from '../../shared/schemas/boms';
import type { Shelf } from './api';
import { trimDecimal } from '../../lib/money';

/** The shelf-price inputs as typed; read by the shared `shelf` schema. */
export type ShelfFormValues = {
  price: string;
  vatPct: string;
  retailerMarginPct: string;
  importerMarginPct: string;
  freightToStorePerUnit: string;
};

export function shelfFormValues(value: Shelf): ShelfFormValues {
  return {
    price: trimDecimal(value.price),
    vatPct: trimDecimal(value.vatPct),
    retailerMarginPct: trimDecimal(value.retailerMarginPct),
    importerMarginPct: trimDecimal(value.importerMarginPct),
    freightToStorePerUnit: trimDecimal(value.freightToStorePerUnit),
  };
}

const clean = (text: string) => text.trim().replace(/[,\s]/g, '').replace(/%$/, '');

export const shelfFormSchema = z
  .object({ price: z.string(), vatPct: z.string(), retailerMarginPct: z.string(), importerMarginPct: z.string(), freightToStorePerUnit: z.string() })
  .transform((form, ctx): Shelf => {
    if (!clean(form.price)) {
      ctx.addIssue({ code: 'custom', path: ['price'], message: 'is required for the ladder' });
      return z.NEVER;
    }
    const result = shelf.safeParse({
      price: clean(form.price),
      vatPct: clean(form.vatPct) || '0',
      retailerMarginPct: clean(form.retailerMarginPct) || '0',
      importerMarginPct: clean(form.importerMarginPct) || '0',
      freightToStorePerUnit: clean(form.freightToStorePerUnit) || '0',
    });
    if (!result.success) {
      for (const issue of result.error.issues) ctx.addIssue({ code: 'custom', path: [String(issue.path[0] ?? 'price')], message: issue.message });
      return z.NEVER;
    }
    for (const key of ['retailerMarginPct', 'importerMarginPct'] as const) {
      if (Number(result.data[key]) >= 100) ctx.addIssue({ code: 'custom', path: [key], message: 'must be below 100 %' });
    }
    return result.data;
  });

export const shelfFormFields = ['price', 'vatPct', 'retailerMarginPct', 'importerMarginPct', 'freightToStorePerUnit'] as const;
