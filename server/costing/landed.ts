import { Dec, ONE, ZERO } from './decimal';
import { customsValue, INCOTERM_ADDERS } from './incoterms';
import type { PercentAdders } from './profile';
import type { DutyBasis, Incoterm } from './types';

/** Cargo insurance covers at least 110 % of the value (Incoterms 2020, CIF/CIP). */
export const INSURED_SHARE = new Dec('1.10');

/**
 * What the adder rules need of a number: decimal.js values, or exact scaled integers
 * (`Dec40`, for the lines of a large roll). One set of rules serves both.
 */
export interface Amount<T> {
  plus(b: T): T;
  times(b: T): T;
  isZero(): boolean;
}

export interface AdderInput<T extends Amount<T> = Dec> {
  /** Goods value G of the line, in the currency the adders are wanted in. */
  goods: T;
  incoterm: Incoterm;
  pct: PercentAdders<T>;
  dutyBasis: DutyBasis;
  /** Duty rate as a fraction. */
  dutyRate: T;
  /** The line's share of the build's per-shipment freight (cost roll only). */
  freightShare?: T;
  /** The line's share of the build's per-shipment fees (cost roll only). */
  feesShare?: T;
}

export interface LineAdders<T = Dec> {
  origin: T;
  freight: T;
  insurance: T;
  /** Null under DDP: the seller pays the duty. */
  customsValue: T | null;
  duty: T;
  fees: T;
  destination: T;
  /** G plus every adder. */
  landed: T;
}

// Zero adders are common (terms the Incoterm does not need, profile fields left at 0);
// skipping them saves allocations on every line of a large BOM.
const add = <T extends Amount<T>>(a: T, b: T | undefined): T => (b === undefined || b.isZero() ? a : a.plus(b));

/**
 * The adders on one line: origin = originPct × G; freight = freightPct × G + share;
 * insurance = insurancePct × 1.10 × (G + origin + freight); duty = rate × customs value;
 * fees = share; destination = destinationPct × G. An adder the Incoterm does not need is 0,
 * and so is a share handed in for it.
 */
export function lineAdders(a: AdderInput): LineAdders;
/** Other number types name their zero and bring insurance × 1.10 precomputed. */
export function lineAdders<T extends Amount<T>>(a: AdderInput<T> & { pct: { insured: T } }, zero: T): LineAdders<T>;
export function lineAdders<T extends Amount<T>>(a: AdderInput<T>, zero: T = ZERO as unknown as T): LineAdders<T> {
  const times = (rate: T, value: T): T => (rate.isZero() ? zero : rate.times(value));
  const g = a.goods;
  const needs = INCOTERM_ADDERS[a.incoterm];
  const origin = needs.origin ? times(a.pct.origin, g) : zero;
  const freight = needs.freight ? add(times(a.pct.freight, g), a.freightShare) : zero;
  const carried = add(add(g, origin), freight);
  const insuredRate = a.pct.insured ?? ((a.pct.insurance as unknown as Dec).times(INSURED_SHARE) as unknown as T);
  const insurance = needs.insurance ? times(insuredRate, carried) : zero;
  const cif = add(carried, insurance);
  // Under the CIF basis the customs value is every cost up to the border, and the adders a
  // rule does not need are 0 here, so it equals G + origin + freight + insurance (the test
  // checks this against the customs-value table for every rule); the FOB basis reads the table.
  const cv = a.incoterm === 'DDP' ? null : a.dutyBasis === 'CIF' ? cif : customsValue(a.incoterm, a.dutyBasis, { goods: g, origin, freight, insurance });
  const duty = cv !== null && needs.duty ? times(a.dutyRate, cv) : zero;
  const fees = needs.fees && a.feesShare ? a.feesShare : zero;
  const destination = needs.destination ? times(a.pct.destination, g) : zero;
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
