import { z } from 'zod';
import { supplierCreateBody, type SupplierCreateBody } from '../../shared/schemas/suppliers';
import { incoterms } from '../../shared/schemas/trade';
import type { Supplier } from './api';

export type SupplierFormValues = {
  name: string;
  country: string;
  currency: string;
  defaultIncoterm: (typeof incoterms)[number];
  /** One address per line (commas and semicolons work too). */
  contactEmails: string;
  active: boolean;
  notes: string;
};

export const emptySupplierForm: SupplierFormValues = {
  name: '',
  country: '',
  currency: '',
  defaultIncoterm: 'FOB',
  contactEmails: '',
  active: true,
  notes: '',
};

export function supplierFormValues(supplier: Supplier): SupplierFormValues {
  return {
    name: supplier.name,
    country: supplier.country,
    currency: supplier.currency,
    defaultIncoterm: supplier.defaultIncoterm,
    contactEmails: supplier.contactEmails.join('\n'),
    active: supplier.active,
    notes: supplier.notes,
  };
}

/** The addresses in a contacts box, as people paste them: lines, commas, semicolons. */
export function splitEmails(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((s) => s.trim())
    .filter(Boolean);
}

/**
 * From the typed form to the body, checked by the shared `supplierCreateBody`. A bad
 * address is reported on the contacts box, naming the address.
 */
export const supplierFormSchema = z
  .object({
    name: z.string(),
    country: z.string(),
    currency: z.string(),
    defaultIncoterm: z.enum(incoterms),
    contactEmails: z.string(),
    active: z.boolean(),
    notes: z.string(),
  })
  .transform((form, ctx): SupplierCreateBody => {
    const emails = splitEmails(form.contactEmails);
    const body = supplierCreateBody.safeParse({ ...form, contactEmails: emails });
    if (body.success) return body.data;
    for (const issue of body.error.issues) {
      const [head, index] = issue.path;
      if (head === 'contactEmails' && typeof index === 'number') {
        ctx.addIssue({ code: 'custom', path: ['contactEmails'], message: `“${emails[index]}” is not an e-mail address` });
      } else {
        ctx.addIssue({ code: 'custom', path: issue.path.map((p) => (typeof p === 'number' ? p : String(p))), message: issue.message });
      }
    }
    return z.NEVER;
  });

export type SupplierFormOutput = z.output<typeof supplierFormSchema>;

export const supplierFormFields = ['name', 'country', 'currency', 'defaultIncoterm', 'contactEmails', 'active', 'notes'] as const;
