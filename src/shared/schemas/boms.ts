import { z } from 'zod';
import { currency } from './trade';
import { money, percent, isoDate, decimalString } from './decimal';
import { idParam, version } from './common';
import { valueField } from '../units';

export const bomStates = ['draft', 'in_review', 'released'] as const;
export const bomState = z.enum(bomStates);
export type BomState = z.infer<typeof bomState>;

export const shelf = z.strictObject({
  price: money.nullable().default(null),
  vatPct: percent.default('0'),
  retailerMarginPct: percent.default('0'),
  importerMarginPct: percent.default('0'),
  freightToStorePerUnit: money.default('0'),
});

const fields = {
  name: z.string().trim().min(1, 'is required').max(120),
  reportingCurrency: currency,
  profileId: idParam.nullable(),
  stressPolicyId: idParam.nullable(),
  ambientC: valueField('temperature').pipe(z.number().min(-60).max(200)),
  plannedQty: z.number().int().min(1).max(100_000_000),
  targetUnitCost: money.nullable(),
  amortisationQty: z.number().int().min(1).max(1_000_000_000).nullable(),
  shelf,
  notes: z.string().max(4000),
};

export const bomCreateBody = z.strictObject({
  name: fields.name,
  reportingCurrency: fields.reportingCurrency,
  profileId: fields.profileId.default(null),
  stressPolicyId: fields.stressPolicyId.default(null),
  ambientC: fields.ambientC.default(25),
  plannedQty: fields.plannedQty.default(10000),
  targetUnitCost: fields.targetUnitCost.default(null),
  amortisationQty: fields.amortisationQty.default(null),
  shelf: fields.shelf.default({ price: null, vatPct: '0', retailerMarginPct: '0', importerMarginPct: '0', freightToStorePerUnit: '0' }),
  notes: fields.notes.default(''),
});
export type BomCreateBody = z.infer<typeof bomCreateBody>;

export const bomPatchBody = z.strictObject({
  name: fields.name.optional(),
  reportingCurrency: fields.reportingCurrency.optional(),
  profileId: fields.profileId.optional(),
  stressPolicyId: fields.stressPolicyId.optional(),
  ambientC: fields.ambientC.optional(),
  plannedQty: fields.plannedQty.optional(),
  targetUnitCost: fields.targetUnitCost.optional(),
  amortisationQty: fields.amortisationQty.optional(),
  shelf: fields.shelf.optional(),
  notes: fields.notes.optional(),
  version,
});

export const stateBody = z.strictObject({
  state: bomState,
  version: version.optional(),
});

export const lineKinds = ['part', 'labour', 'packaging', 'test', 'tooling', 'other'] as const;
export const lineKind = z.enum(lineKinds);

/** An operating point in the trade's notations: "1.9kV", "700mA", "250mW". */
export const operatingPoint = z.strictObject({
  voltageV: valueField('voltage').nullable().optional(),
  currentA: valueField('current').nullable().optional(),
  powerW: valueField('power').nullable().optional(),
  ambientC: valueField('temperature').nullable().optional(),
});

const qtyPerUnit = decimalString({ scale: 6, min: 'positive', maxIntDigits: 8 });

const lineFields = {
  position: z.number().int().min(0).max(1_000_000),
  kind: lineKind,
  refDes: z.string().trim().max(2000),
  partId: idParam.nullable(),
  qtyPerUnit,
  attritionPct: percent.nullable(),
  pinnedQuoteId: idParam.nullable(),
  dnp: z.boolean(),
  note: z.string().max(1000),
  unitCost: money.nullable(),
  oneTimeCost: money.nullable(),
  currency: currency.nullable(),
  operatingPoint,
  unresolved: z.string().max(200).nullable(),
};

export const lineCreateBody = z.strictObject({
  position: lineFields.position.optional(),
  kind: lineFields.kind.default('part'),
  refDes: lineFields.refDes.default(''),
  partId: lineFields.partId.default(null),
  qtyPerUnit: lineFields.qtyPerUnit.default('1'),
  attritionPct: lineFields.attritionPct.default(null),
  pinnedQuoteId: lineFields.pinnedQuoteId.default(null),
  dnp: lineFields.dnp.default(false),
  note: lineFields.note.default(''),
  unitCost: lineFields.unitCost.default(null),
  oneTimeCost: lineFields.oneTimeCost.default(null),
  currency: lineFields.currency.default(null),
  operatingPoint: lineFields.operatingPoint.default({}),
  unresolved: lineFields.unresolved.default(null),
});
export type LineCreateBody = z.infer<typeof lineCreateBody>;

export const linePatchBody = z.strictObject({
  ...(Object.fromEntries(Object.entries(lineFields).map(([k, s]) => [k, (s as z.ZodType).optional()])) as {
    [K in keyof typeof lineFields]: z.ZodOptional<(typeof lineFields)[K]>;
  }),
  version,
});
export type LinePatchBody = z.infer<typeof linePatchBody>;

/** Many line changes in one transaction: all apply or none. */
export const bulkBody = z.strictObject({
  create: z.array(lineCreateBody).max(20000).default([]),
  update: z.array(linePatchBody.and(z.object({ id: idParam }))).max(20000).default([]),
  delete: z.array(z.strictObject({ id: idParam, version })).max(20000).default([]),
});

export const lineParams = z.strictObject({ id: idParam, lineId: idParam });

export const costQuery = z.strictObject({
  qty: z.coerce.number().int().min(1).max(100_000_000).optional(),
  date: isoDate.optional(),
  /** `totals` leaves the per-line rows out (the running panel needs only the totals). */
  view: z.enum(['full', 'totals']).default('full'),
});

export const curveQuery = z.strictObject({
  qty: z
    .string()
    .max(400)
    .transform((s, ctx) => {
      const list = s.split(',').map((x) => x.trim()).filter(Boolean).map(Number);
      if (!list.length || list.length > 40 || list.some((n) => !Number.isInteger(n) || n < 1 || n > 100_000_000)) {
        ctx.addIssue({ code: 'custom', message: 'must be 1 to 40 whole quantities, comma-separated (e.g. 1000,5000,10000)' });
        return z.NEVER;
      }
      return [...new Set(list)].sort((a, b) => a - b);
    })
    .optional(),
  date: isoDate.optional(),
});

export const snapshotBody = z.strictObject({
  name: z.string().trim().min(1).max(120),
  qty: z.number().int().min(1).max(100_000_000).optional(),
  date: isoDate.optional(),
});

export const compareQuery = z.strictObject({
  left: z.string().regex(/^(snapshot|bom):[1-9]\d{0,17}$/, 'must be snapshot:<id> or bom:<id>'),
  right: z.string().regex(/^(snapshot|bom):[1-9]\d{0,17}$/, 'must be snapshot:<id> or bom:<id>'),
  qty: z.coerce.number().int().min(1).max(100_000_000).optional(),
});

/**
 * The lines list, a page at a time in position order (keyset paging): `cursor` is the
 * `nextCursor` of the page before, opaque to clients. 500 lines a page unless asked.
 */
export const lineListQuery = z.strictObject({
  limit: z.coerce.number().int().min(1).max(5000).default(500),
  cursor: z.string().regex(/^[0-9]{1,10}\.[1-9][0-9]{0,17}\.[0-9]{1,19}$/, 'must be a nextCursor from the page before').optional(),
});
