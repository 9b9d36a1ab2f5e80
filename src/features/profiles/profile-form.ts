import { z } from 'zod';
import { profileCreateBody, type ProfileCreateBody } from '../../shared/schemas/profiles';
import { partCategories, type PartCategory } from '../../shared/schemas/trade';
import { trimDecimal } from '../../lib/money';
import type { Profile } from './api';

/** The profile form as typed: every number as text, duty rates as rows, attrition by category. */
export type ProfileFormValues = {
  name: string;
  currency: string;
  originPct: string;
  freightPct: string;
  freightPerShipment: string;
  freightCurrency: string;
  shipments: string;
  freightBasis: 'value' | 'weight';
  insurancePct: string;
  dutyBasis: 'FOB' | 'CIF';
  dutyRates: { hsPrefix: string; ratePct: string }[];
  defaultDutyPct: string;
  feesPerShipment: string;
  destinationPct: string;
  maxLeadTimeDays: string;
  attritionPct: Record<PartCategory, string>;
  smtRatePerPlacement: string;
  thtRatePerJoint: string;
  handRatePerOp: string;
  notes: string;
};

const noAttrition = Object.fromEntries(partCategories.map((c) => [c, ''])) as Record<PartCategory, string>;

export function emptyProfileForm(currency = ''): ProfileFormValues {
  return {
    name: '',
    currency,
    originPct: '0',
    freightPct: '0',
    freightPerShipment: '0',
    freightCurrency: '',
    shipments: '1',
    freightBasis: 'value',
    insurancePct: '0',
    dutyBasis: 'CIF',
    dutyRates: [],
    defaultDutyPct: '0',
    feesPerShipment: '0',
    destinationPct: '0',
    maxLeadTimeDays: '',
    attritionPct: { ...noAttrition },
    smtRatePerPlacement: '0',
    thtRatePerJoint: '0',
    handRatePerOp: '0',
    notes: '',
  };
}

export function profileFormValues(p: Profile): ProfileFormValues {
  const attrition = { ...noAttrition };
  for (const c of partCategories) attrition[c] = trimDecimal(p.attritionPct?.[c] ?? null);
  return {
    name: p.name,
    currency: p.currency,
    originPct: trimDecimal(p.originPct),
    freightPct: trimDecimal(p.freightPct),
    freightPerShipment: trimDecimal(p.freightPerShipment),
    freightCurrency: p.freightCurrency ?? '',
    shipments: String(p.shipments),
    freightBasis: p.freightBasis,
    insurancePct: trimDecimal(p.insurancePct),
    dutyBasis: p.dutyBasis,
    dutyRates: (p.dutyRates ?? []).map((r) => ({ hsPrefix: r.hsPrefix, ratePct: trimDecimal(r.ratePct) })),
    defaultDutyPct: trimDecimal(p.defaultDutyPct),
    feesPerShipment: trimDecimal(p.feesPerShipment),
    destinationPct: trimDecimal(p.destinationPct),
    maxLeadTimeDays: p.maxLeadTimeDays === null ? '' : String(p.maxLeadTimeDays),
    attritionPct: attrition,
    smtRatePerPlacement: trimDecimal(p.smtRatePerPlacement),
    thtRatePerJoint: trimDecimal(p.thtRatePerJoint),
    handRatePerOp: trimDecimal(p.handRatePerOp),
    notes: p.notes,
  };
}

const text = z.string();

/**
 * From the typed form to the body, checked by the shared `profileCreateBody`. Empty
 * amounts are 0 (as the costing rules default them), an empty lead-time limit is none,
 * and a category left empty takes no attrition.
 */
export const profileFormSchema = z
  .object({
    name: text,
    currency: text,
    originPct: text,
    freightPct: text,
    freightPerShipment: text,
    freightCurrency: text,
    shipments: text,
    freightBasis: z.enum(['value', 'weight']),
    insurancePct: text,
    dutyBasis: z.enum(['FOB', 'CIF']),
    dutyRates: z.array(z.object({ hsPrefix: text, ratePct: text })),
    defaultDutyPct: text,
    feesPerShipment: text,
    destinationPct: text,
    maxLeadTimeDays: text,
    attritionPct: z.record(z.string(), text),
    smtRatePerPlacement: text,
    thtRatePerJoint: text,
    handRatePerOp: text,
    notes: text,
  })
  .transform((form, ctx): ProfileCreateBody => {
    const problem = (path: (string | number)[], message: string) => ctx.addIssue({ code: 'custom', path, message });
    const zeroIfEmpty = (s: string) => s.trim() || '0';
    const whole = (name: 'shipments' | 'maxLeadTimeDays', empty: number | null) => {
      const t = form[name].trim();
      if (!t) return empty;
      if (!/^\d+$/.test(t)) {
        problem([name], 'must be a whole number');
        return empty;
      }
      return Number(t);
    };
    const shipments = whole('shipments', 0);
    const maxLeadTimeDays = whole('maxLeadTimeDays', null);
    const attritionPct = Object.fromEntries(Object.entries(form.attritionPct).filter(([, v]) => v.trim() !== '').map(([k, v]) => [k, v.trim()]));

    const body = profileCreateBody.safeParse({
      name: form.name,
      currency: form.currency,
      originPct: zeroIfEmpty(form.originPct),
      freightPct: zeroIfEmpty(form.freightPct),
      freightPerShipment: zeroIfEmpty(form.freightPerShipment),
      freightCurrency: form.freightCurrency.trim() || null,
      shipments: shipments ?? 0,
      freightBasis: form.freightBasis,
      insurancePct: zeroIfEmpty(form.insurancePct),
      dutyBasis: form.dutyBasis,
      dutyRates: form.dutyRates.map((r) => ({ hsPrefix: r.hsPrefix, ratePct: r.ratePct.trim() })),
      defaultDutyPct: zeroIfEmpty(form.defaultDutyPct),
      feesPerShipment: zeroIfEmpty(form.feesPerShipment),
      destinationPct: zeroIfEmpty(form.destinationPct),
      maxLeadTimeDays,
      attritionPct,
      smtRatePerPlacement: zeroIfEmpty(form.smtRatePerPlacement),
      thtRatePerJoint: zeroIfEmpty(form.thtRatePerJoint),
      handRatePerOp: zeroIfEmpty(form.handRatePerOp),
      notes: form.notes,
    });
    if (!body.success) {
      for (const issue of body.error.issues) problem(issue.path.map((p) => (typeof p === 'number' ? p : String(p))), issue.message);
      return z.NEVER;
    }
    // The same HS prefix twice would leave the longest-match rule with two answers.
    const seen = new Map<string, number>();
    body.data.dutyRates.forEach((r, i) => {
      if (seen.has(r.hsPrefix)) problem(['dutyRates', i, 'hsPrefix'], `repeats the prefix of row ${seen.get(r.hsPrefix)! + 1}`);
      else seen.set(r.hsPrefix, i);
    });
    return body.data;
  });

export type ProfileFormOutput = z.output<typeof profileFormSchema>;

export const profileFormFields = [
  'name', 'currency', 'originPct', 'freightPct', 'freightPerShipment', 'freightCurrency', 'shipments', 'freightBasis', 'insurancePct',
  'dutyBasis', 'dutyRates', 'defaultDutyPct', 'feesPerShipment', 'destinationPct', 'maxLeadTimeDays', 'attritionPct',
  'smtRatePerPlacement', 'thtRatePerJoint', 'handRatePerOp', 'notes',
] as const;
