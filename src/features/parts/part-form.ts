import { z } from 'zod';
import { partCreateBody, type PartCreateBody } from '../../shared/schemas/parts';
import { partCategories, mounts, type PartCategory } from '../../shared/schemas/trade';
import type { Part } from './api';
import { ratingsFromTexts, ratingTexts } from './ratings';

/** The part form as typed: every field text, ratings by key. */
export type PartFormValues = {
  internalPn: string;
  mpn: string;
  manufacturer: string;
  category: PartCategory;
  description: string;
  package: string;
  mount: (typeof mounts)[number];
  pins: string;
  hsCode: string;
  unitWeightG: string;
  ratings: Record<string, string>;
};

export const emptyPartForm: PartFormValues = {
  internalPn: '',
  mpn: '',
  manufacturer: '',
  category: 'resistor',
  description: '',
  package: '',
  mount: 'smt',
  pins: '2',
  hsCode: '',
  unitWeightG: '',
  ratings: {},
};

export function partFormValues(part: Part): PartFormValues {
  return {
    internalPn: part.internalPn,
    mpn: part.mpn,
    manufacturer: part.manufacturer,
    category: part.category,
    description: part.description,
    package: part.package,
    mount: part.mount,
    pins: String(part.pins),
    hsCode: part.hsCode ?? '',
    unitWeightG: part.unitWeightG === null ? '' : String(Number(part.unitWeightG)),
    ratings: ratingTexts(part.category, part.ratings),
  };
}

/**
 * From the typed form to the request body, checked by the shared `partCreateBody`
 * and the category's ratings rule, so the form and the server agree on every message.
 * Issue paths are the form's field names (`pins`, `ratings.powerW`).
 */
export const partFormSchema = z
  .object({
    internalPn: z.string(),
    mpn: z.string(),
    manufacturer: z.string(),
    category: z.enum(partCategories),
    description: z.string(),
    package: z.string(),
    mount: z.enum(mounts),
    pins: z.string(),
    hsCode: z.string(),
    unitWeightG: z.string(),
    ratings: z.record(z.string(), z.string()),
  })
  .transform((form, ctx): PartCreateBody => {
    const pinsText = form.pins.trim();
    const pins = /^\d+$/.test(pinsText) ? Number(pinsText) : Number.NaN;
    if (Number.isNaN(pins)) ctx.addIssue({ code: 'custom', path: ['pins'], message: 'must be a whole number' });
    const ratings = ratingsFromTexts(form.category, form.ratings);
    if (!ratings.ok) for (const issue of ratings.issues) ctx.addIssue({ code: 'custom', path: issue.path.split('.'), message: issue.message });

    const body = partCreateBody.safeParse({
      internalPn: form.internalPn,
      mpn: form.mpn,
      manufacturer: form.manufacturer,
      category: form.category,
      description: form.description,
      package: form.package,
      mount: form.mount,
      pins: Number.isNaN(pins) ? 0 : pins,
      hsCode: form.hsCode.trim() || null,
      unitWeightG: form.unitWeightG.trim() || null,
      ratings: ratings.ok ? ratings.value : {},
    });
    if (!body.success) {
      for (const issue of body.error.issues) ctx.addIssue({ code: 'custom', path: issue.path.map(String), message: issue.message });
      return z.NEVER;
    }
    return ratings.ok && !Number.isNaN(pins) ? body.data : z.NEVER;
  });

export type PartFormOutput = z.output<typeof partFormSchema>;

/** The form's fields, for putting a server's field problems in place. */
export const partFormFields = [
  'internalPn', 'mpn', 'manufacturer', 'category', 'description', 'package', 'mount', 'pins', 'hsCode', 'unitWeightG', 'ratings',
] as const;

export const categoryLabels: Record<PartCategory, string> = {
  resistor: 'Resistor',
  capacitor: 'Capacitor',
  bjt: 'Bipolar transistor',
  mosfet: 'MOSFET',
  diode: 'Diode',
  led: 'LED',
  inductor: 'Inductor',
  transformer: 'Transformer',
  switch: 'Switch',
  battery: 'Battery',
  pcb: 'PCB',
  enclosure: 'Enclosure',
  wire: 'Wire',
  packaging: 'Packaging',
  other: 'Other',
};

export const mountLabels: Record<(typeof mounts)[number], string> = {
  smt: 'SMT (placed)',
  tht: 'THT (soldered joints)',
  hand: 'Hand assembly',
  none: 'Not assembled',
};
