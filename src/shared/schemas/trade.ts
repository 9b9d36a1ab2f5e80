import { z } from 'zod';
import { MINOR_UNITS } from '../minor-units';

/** Incoterms 2020 (ICC), the eleven three-letter rules. */
export const incoterms = ['EXW', 'FCA', 'FAS', 'FOB', 'CFR', 'CPT', 'CIF', 'CIP', 'DAP', 'DPU', 'DDP'] as const;
export const incoterm = z.enum(incoterms);

export const currency = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{3}$/, 'must be an ISO 4217 code such as USD')
  .refine((c) => c in MINOR_UNITS, 'is not an ISO 4217 currency we know');

export const country = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{2}$/, 'must be an ISO 3166-1 alpha-2 code such as CN');

export const partCategories = [
  'resistor', 'capacitor', 'bjt', 'mosfet', 'diode', 'led', 'inductor', 'transformer',
  'switch', 'battery', 'pcb', 'enclosure', 'wire', 'packaging', 'other',
] as const;
export const partCategory = z.enum(partCategories);
export type PartCategory = z.infer<typeof partCategory>;

export const mounts = ['smt', 'tht', 'hand', 'none'] as const;
export const mount = z.enum(mounts);

/** HS codes: 4 to 10 digits; dots and spaces as people write them are dropped. */
export const hsCode = z
  .string()
  .trim()
  .transform((s) => s.replace(/[.\s]/g, ''))
  .pipe(z.string().regex(/^\d{4,10}$/, 'must be 4 to 10 digits such as 8533.21'));
