import { z } from 'zod';
import { currency } from './trade';
import { percent, money } from './decimal';
import { partCategories } from './trade';
import { version } from './common';

export const dutyRate = z.strictObject({
  hsPrefix: z.string().trim().transform((s) => s.replace(/[.\s]/g, '')).pipe(z.string().regex(/^\d{2,10}$/, 'must be 2 to 10 digits')),
  ratePct: percent,
});

/** A landed-cost profile: the adders of the costing rules, all optional (0 when absent). */
const fields = {
  name: z.string().trim().min(1, 'is required').max(80),
  currency,
  originPct: percent,
  freightPct: percent,
  freightPerShipment: money,
  freightCurrency: currency.nullable(),
  shipments: z.number().int().min(0).max(10000),
  freightBasis: z.enum(['value', 'weight']),
  insurancePct: percent,
  dutyBasis: z.enum(['FOB', 'CIF']),
  dutyRates: z.array(dutyRate).max(500),
  defaultDutyPct: percent,
  feesPerShipment: money,
  destinationPct: percent,
  maxLeadTimeDays: z.number().int().min(0).max(3650).nullable(),
  attritionPct: z.partialRecord(z.enum(partCategories), percent),
  smtRatePerPlacement: money,
  thtRatePerJoint: money,
  handRatePerOp: money,
  notes: z.string().max(2000),
};

export const profileCreateBody = z.strictObject({
  name: fields.name,
  currency: fields.currency,
  originPct: fields.originPct.default('0'),
  freightPct: fields.freightPct.default('0'),
  freightPerShipment: fields.freightPerShipment.default('0'),
  freightCurrency: fields.freightCurrency.default(null),
  shipments: fields.shipments.default(1),
  freightBasis: fields.freightBasis.default('value'),
  insurancePct: fields.insurancePct.default('0'),
  dutyBasis: fields.dutyBasis.default('CIF'),
  dutyRates: fields.dutyRates.default([]),
  defaultDutyPct: fields.defaultDutyPct.default('0'),
  feesPerShipment: fields.feesPerShipment.default('0'),
  destinationPct: fields.destinationPct.default('0'),
  maxLeadTimeDays: fields.maxLeadTimeDays.default(null),
  attritionPct: fields.attritionPct.default({}),
  smtRatePerPlacement: fields.smtRatePerPlacement.default('0'),
  thtRatePerJoint: fields.thtRatePerJoint.default('0'),
  handRatePerOp: fields.handRatePerOp.default('0'),
  notes: fields.notes.default(''),
});
export type ProfileCreateBody = z.infer<typeof profileCreateBody>;

export const profilePatchBody = z.strictObject({
  ...(Object.fromEntries(Object.entries(fields).map(([k, s]) => [k, (s as z.ZodType).optional()])) as {
    [K in keyof typeof fields]: z.ZodOptional<(typeof fields)[K]>;
  }),
  version,
});
