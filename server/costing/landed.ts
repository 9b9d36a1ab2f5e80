import { Dec, ONE, ZERO } from './decimal';
import { customsValue, needsAdder } from './incoterms';
import type { PercentAdders } from './profile';
import type { DutyBasis, Incoterm } from './types';

/** Cargo insurance covers at least 110 % of the value (Incoterms 2020, CIF/CIP). */
export const INSURED_SHARE = new Dec('1.10');

export interface AdderInput {
  /** Goods value G of the line, in the currency the adders are wanted in. */
  goods: Dec;
  incoterm: Incoterm;
  pct: PercentAdders;
  dutyBasis: DutyBasis;
  /** Duty rate as a fraction. */
  dutyRate: Dec;
  /** The line's share of the build's per-shipment freight (cost roll only). */
  freightShare?: Dec;
  /** The line's share of the build's per-shipment fees (cost roll only). */
  feesShare?: Dec;
}

export interface LineAdders {
  origin: Dec;
  freight: Dec;
  insurance: Dec;
  /** Null under DDP: the seller pays the duty. */
  customsValue: Dec | null;
  duty: Dec;
  fees: Dec;
  destination: Dec;
  /** G plus every adder. */
  landed: Dec;
}

/**
 * The adders on one line: origin = originPct × G; freight = freightPct × G + share;
 * insurance = insurancePct × 1.10 × (G + origin + freight); duty = rate × customs value;
 * fees = share; destination = destinationPct × G. An adder the Incoterm does not need is 0,
 * and so is a share handed in for it.
 */
export function lineAdders(a: AdderInput): LineAdders {
  const g = a.goods;
  const origin = needsAdder(a.incoterm, 'origin') ? a.pct.origin.times(g) : ZERO;
  const freight = needsAdder(a.incoterm, 'freight') ? a.pct.freight.times(g).plus(a.freightShare ?? ZERO) : ZERO;
  const insurance = needsAdder(a.incoterm, 'insurance')
    ? a.pct.insurance.times(INSURED_SHARE).times(g.plus(origin).plus(freight))
    : ZERO;
  const cv = customsValue(a.incoterm, a.dutyBasis, { goods: g, origin, freight, insurance });
  const duty = cv !== null && needsAdder(a.incoterm, 'duty') ? a.dutyRate.times(cv) : ZERO;
  const fees = needsAdder(a.incoterm, 'fees') ? (a.feesShare ?? ZERO) : ZERO;
  const destination = needsAdder(a.incoterm, 'destination') ? a.pct.destination.times(g) : ZERO;
  return {
    origin,
    freight,
    insurance,
    customsValue: cv,
    duty,
    fees,
    destination,
    landed: g.plus(origin).plus(freight).plus(insurance).plus(duty).plus(fees).plus(destination),
  };
}

/**
 * Landed value per unit of goods value with the percentage adders and duty only (no
 * per-shipment shares): every such adder is proportional to G, so the quote board's
 * landed cost is G × this factor. Computing it once per (Incoterm, duty rate) keeps the
 * choice among thousands of quotes to one multiplication each.
 */
export function boardLandedFactor(incoterm: Incoterm, pct: PercentAdders, dutyBasis: DutyBasis, dutyRate: Dec): Dec {
  return lineAdders({ goods: ONE, incoterm, pct, dutyBasis, dutyRate }).landed;
}
