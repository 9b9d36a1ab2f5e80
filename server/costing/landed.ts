import { Dec, ONE, ZERO } from './decimal';
import { customsValue, INCOTERM_ADDERS } from './incoterms';
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

// Zero adders are common (terms the Incoterm does not need, profile fields left at 0);
// skipping them saves decimal allocations on every line of a large BOM.
const add = (a: Dec, b: Dec | undefined): Dec => (b === undefined || b.isZero() ? a : a.plus(b));
const times = (rate: Dec, value: Dec): Dec => (rate.isZero() ? ZERO : rate.times(value));

/**
 * The adders on one line: origin = originPct × G; freight = freightPct × G + share;
 * insurance = insurancePct × 1.10 × (G + origin + freight); duty = rate × customs value;
 * fees = share; destination = destinationPct × G. An adder the Incoterm does not need is 0,
 * and so is a share handed in for it.
 */
export function lineAdders(a: AdderInput): LineAdders {
  const g = a.goods;
  const needs = INCOTERM_ADDERS[a.incoterm];
  const origin = needs.origin ? times(a.pct.origin, g) : ZERO;
  const freight = needs.freight ? add(times(a.pct.freight, g), a.freightShare) : ZERO;
  const carried = add(add(g, origin), freight);
  const insuredRate = a.pct.insured ?? a.pct.insurance.times(INSURED_SHARE);
  const insurance = needs.insurance ? times(insuredRate, carried) : ZERO;
  const cif = add(carried, insurance);
  // Under the CIF basis the customs value is every cost up to the border, and the adders a
  // rule does not need are 0 here, so it equals G + origin + freight + insurance (the test
  // checks this against the customs-value table for every rule); the FOB basis reads the table.
  const cv = a.incoterm === 'DDP' ? null : a.dutyBasis === 'CIF' ? cif : customsValue(a.incoterm, a.dutyBasis, { goods: g, origin, freight, insurance });
  const duty = cv !== null && needs.duty ? times(a.dutyRate, cv) : ZERO;
  const fees = needs.fees && a.feesShare ? a.feesShare : ZERO;
  const destination = needs.destination ? times(a.pct.destination, g) : ZERO;
  return {
    origin,
    freight,
    insurance,
    customsValue: cv,
    duty,
    fees,
    destination,
    landed: add(add(add(cif, duty), fees), destination),
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
