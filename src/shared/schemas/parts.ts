import { z } from 'zod';
import { valueField } from '../units';
import { partCategory, mount, hsCode, type PartCategory } from './trade';
import { decimalString } from './decimal';
import { version } from './common';

const opt = <S extends z.ZodType>(s: S) => s.nullable().optional();
const plain = (min = 0, max = 1e6) => z.number().min(min).max(max);

export const dielectrics = ['c0g', 'x7r', 'x5r', 'y5v', 'hv_ceramic', 'film', 'al_electrolytic', 'tantalum'] as const;

/** Ratings by category (HTTP contract); values accept the trade's notations ("2kV", "1/4W"). */
export const ratingsByCategory = {
  resistor: z.strictObject({
    resistanceOhm: opt(valueField('resistance')),
    powerW: opt(valueField('power')),
    levV: opt(valueField('voltage')),
    tolerancePct: opt(plain(0, 100)),
    derateKneeC: opt(valueField('temperature')),
    zeroPowerC: opt(valueField('temperature')),
  }),
  capacitor: z.strictObject({
    capacitanceF: opt(valueField('capacitance')),
    ratedVoltageV: opt(valueField('voltage')),
    dielectric: opt(z.enum(dielectrics)),
  }),
  bjt: z.strictObject({
    icMaxA: opt(valueField('current')),
    vceoMaxV: opt(valueField('voltage')),
    pdMaxW: opt(valueField('power')),
    tjMaxC: opt(valueField('temperature')),
    rthJaCPerW: opt(plain(0, 10000)),
  }),
  mosfet: z.strictObject({
    idMaxA: opt(valueField('current')),
    vdsMaxV: opt(valueField('voltage')),
    pdMaxW: opt(valueField('power')),
    tjMaxC: opt(valueField('temperature')),
    rthJaCPerW: opt(plain(0, 10000)),
  }),
  diode: z.strictObject({
    vrrmV: opt(valueField('voltage')),
    ifAvA: opt(valueField('current')),
    tjMaxC: opt(valueField('temperature')),
  }),
  led: z.strictObject({
    ifMaxA: opt(valueField('current')),
    vfV: opt(valueField('voltage')),
  }),
} as const;

export type RatedCategory = keyof typeof ratingsByCategory;
export const isRated = (c: string): c is RatedCategory => c in ratingsByCategory;

/** Validates ratings for a category; unrated categories carry none. */
export function parseRatings(category: PartCategory, ratings: unknown): { ok: true; value: Record<string, unknown> } | { ok: false; issues: { path: string; message: string }[] } {
  if (!isRated(category)) {
    if (ratings === undefined || ratings === null || (typeof ratings === 'object' && Object.keys(ratings).length === 0)) return { ok: true, value: {} };
    return { ok: false, issues: [{ path: 'ratings', message: `a ${category} part carries no ratings` }] };
  }
  const r = ratingsByCategory[category].safeParse(ratings ?? {});
  if (r.success) {
    const clean = Object.fromEntries(Object.entries(r.data).filter(([, v]) => v !== undefined && v !== null));
    return { ok: true, value: clean };
  }
  return {
    ok: false,
    issues: r.error.issues.map((i) => ({ path: ['ratings', ...i.path].join('.'), message: i.message })),
  };
}

const partFields = {
  internalPn: z.string().trim().min(1, 'is required').max(40),
  mpn: z.string().trim().max(80),
  manufacturer: z.string().trim().max(80),
  category: partCategory,
  description: z.string().trim().max(500),
  package: z.string().trim().max(40),
  mount,
  pins: z.number().int().min(0).max(10000),
  hsCode: hsCode.nullable(),
  unitWeightG: decimalString({ scale: 4, min: 'nonNegative', maxIntDigits: 8 }).nullable(),
  ratings: z.record(z.string(), z.unknown()),
};

export const partCreateBody = z.strictObject({
  ...partFields,
  mpn: partFields.mpn.default(''),
  manufacturer: partFields.manufacturer.default(''),
  description: partFields.description.default(''),
  package: partFields.package.default(''),
  mount: partFields.mount.default('smt'),
  pins: partFields.pins.default(2),
  hsCode: partFields.hsCode.default(null),
  unitWeightG: partFields.unitWeightG.default(null),
  ratings: partFields.ratings.default({}),
});
export type PartCreateBody = z.infer<typeof partCreateBody>;

export const partPatchBody = z.strictObject({
  ...Object.fromEntries(Object.entries(partFields).map(([k, s]) => [k, (s as z.ZodType).optional()])) as {
    [K in keyof typeof partFields]: z.ZodOptional<(typeof partFields)[K]>;
  },
  version,
});
export type PartPatchBody = z.infer<typeof partPatchBody>;

export const partListQuery = z.strictObject({
  q: z.string().max(200).optional(),
  /** Comma-separated ids: the parts a BOM's lines name, in one request. */
  ids: z
    .string()
    .max(200_000)
    .regex(/^[1-9][0-9]{0,17}(,[1-9][0-9]{0,17})*$/, 'must be comma-separated ids')
    .transform((s) => s.split(','))
    .optional(),
  category: partCategory.optional(),
  limit: z.coerce.number().int().min(1).max(20000).default(500),
  cursor: z.string().regex(/^\d+$/).optional(),
});

export const partOut = z.object({
  id: z.string(),
  internalPn: z.string(),
  mpn: z.string(),
  manufacturer: z.string(),
  category: partCategory,
  description: z.string(),
  package: z.string(),
  mount,
  pins: z.number(),
  hsCode: z.string().nullable(),
  unitWeightG: z.string().nullable(),
  ratings: z.record(z.string(), z.unknown()),
  version: z.number(),
});
export type PartOut = z.infer<typeof partOut>;
