import { z } from 'zod';
import { currency, country, incoterm } from './trade';
import { email, version } from './common';

const fields = {
  name: z.string().trim().min(1, 'is required').max(120),
  country,
  currency,
  defaultIncoterm: incoterm,
  contactEmails: z.array(email).max(20),
  active: z.boolean(),
  notes: z.string().max(4000),
};

export const supplierCreateBody = z.strictObject({
  ...fields,
  contactEmails: fields.contactEmails.default([]),
  active: fields.active.default(true),
  notes: fields.notes.default(''),
});
export const supplierPatchBody = z.strictObject({
  name: fields.name.optional(),
  country: fields.country.optional(),
  currency: fields.currency.optional(),
  defaultIncoterm: fields.defaultIncoterm.optional(),
  contactEmails: fields.contactEmails.optional(),
  active: fields.active.optional(),
  notes: fields.notes.optional(),
  version,
});
export type SupplierCreateBody = z.infer<typeof supplierCreateBody>;

export const supplierOut = z.object({
  id: z.string(),
  name: z.string(),
  country: z.string(),
  currency: z.string(),
  defaultIncoterm: incoterm,
  contactEmails: z.array(z.string()),
  active: z.boolean(),
  notes: z.string(),
  version: z.number(),
});
export type SupplierOut = z.infer<typeof supplierOut>;
