import { Dec, decOr, pctToFraction, ZERO } from './decimal';
import { INSURED_SHARE } from './landed';
import { createDutyTable, type DutyTable } from './duty';
import { CostingInputError } from './errors';
import type { CurrencyCode, DutyBasis, FreightBasis, LandedCostProfile } from './types';

/** The percentage adders as fractions of goods value. */
export interface PercentAdders<T = Dec> {
  origin: T;
  freight: T;
  insurance: T;
  destination: T;
  /** insurance × 1.10, when precomputed. */
  insured?: T;
}

/** A landed-cost profile parsed once: fractions instead of percent strings, defaults filled in. */
export interface PreparedProfile {
  /** Currency of assembly rates and per-shipment fees; null = the reporting currency. */
  currency: CurrencyCode | null;
  pct: PercentAdders;
  dutyBasis: DutyBasis;
  freightBasis: FreightBasis;
  duty: DutyTable;
  freightPerShipment: Dec;
  freightCurrency: CurrencyCode | null;
  shipments: Dec;
  feesPerShipment: Dec;
  maxLeadTimeDays: number | null;
  /** Attrition fractions by part category. */
  attrition: ReadonlyMap<string, Dec>;
  smtRatePerPlacement: Dec;
  thtRatePerJoint: Dec;
  handRatePerOp: Dec;
}

function nonNegative(value: Dec, field: string): Dec {
  if (value.isNeg()) throw new CostingInputError('must not be negative', field);
  return value;
}

export function prepareProfile(p: LandedCostProfile): PreparedProfile {
  const dutyBasis = p.dutyBasis ?? 'CIF';
  if (dutyBasis !== 'CIF' && dutyBasis !== 'FOB') throw new CostingInputError(`unknown duty basis ${dutyBasis}`, 'dutyBasis');
  const freightBasis = p.freightBasis ?? 'value';
  if (freightBasis !== 'value' && freightBasis !== 'weight') {
    throw new CostingInputError(`unknown freight basis ${freightBasis}`, 'freightBasis');
  }
  const attrition = new Map<string, Dec>();
  for (const [category, pct] of Object.entries(p.attritionPct ?? {})) {
    if (pct !== null && pct !== undefined && pct !== '') attrition.set(category, pctToFraction(pct, `attritionPct.${category}`));
  }
  const shipments = decOr(p.shipments, ZERO, 'shipments');
  const insurance = nonNegative(pctToFraction(p.insurancePct, 'insurancePct'), 'insurancePct');
  if (!shipments.isInteger() || shipments.isNeg()) throw new CostingInputError('must be a whole number ≥ 0', 'shipments');
  return {
    currency: p.currency ?? null,
    pct: {
      origin: nonNegative(pctToFraction(p.originPct, 'originPct'), 'originPct'),
      freight: nonNegative(pctToFraction(p.freightPct, 'freightPct'), 'freightPct'),
      insurance,
      insured: insurance.times(INSURED_SHARE),
      destination: nonNegative(pctToFraction(p.destinationPct, 'destinationPct'), 'destinationPct'),
    },
    dutyBasis,
    freightBasis,
    duty: createDutyTable(p.dutyRates, p.defaultDutyPct),
    freightPerShipment: nonNegative(decOr(p.freightPerShipment, ZERO, 'freightPerShipment'), 'freightPerShipment'),
    freightCurrency: p.freightCurrency ?? p.currency ?? null,
    shipments,
    feesPerShipment: nonNegative(decOr(p.feesPerShipment, ZERO, 'feesPerShipment'), 'feesPerShipment'),
    maxLeadTimeDays: p.maxLeadTimeDays ?? null,
    attrition,
    smtRatePerPlacement: decOr(p.smtRatePerPlacement, ZERO, 'smtRatePerPlacement'),
    thtRatePerJoint: decOr(p.thtRatePerJoint, ZERO, 'thtRatePerJoint'),
    handRatePerOp: decOr(p.handRatePerOp, ZERO, 'handRatePerOp'),
  };
}
