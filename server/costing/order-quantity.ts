import { ceilInt, Dec, isDecimalText, ONE } from './decimal';
import { CostingInputError } from './errors';
import type { PriceBreak } from './types';

/*
 * Counts and money are kept apart on purpose. R = ceil(q × N × (1 + a)) involves decimals
 * (0.15 m of wire, 2.5 % attrition) and is computed in decimal.js. What follows it — MOQ,
 * order multiple, break minimums, order quantity Q, excess E — are whole numbers of pieces
 * (the API sends them as integer numbers), and the rule that picks Q only compares, adds
 * and rounds them up to a multiple. JavaScript does that exactly for integers below 2^53,
 * which every count is checked to be; it is several times cheaper than decimal objects,
 * which matters when 40,000 quotes are priced per roll. Every price and amount — Q × price,
 * E × price — is decimal.js.
 */

/** Required quantity R = ceil(q × N × (1 + a)), exact decimal; `attrition` is a fraction. */
export function requiredQty(qtyPerUnit: Dec, buildQty: Dec, attrition: Dec): Dec {
  return ceilInt(qtyPerUnit.times(buildQty).times(ONE.plus(attrition)));
}

/** A whole count as an exact JavaScript integer, or an input error. */
export function toCount(value: Dec | number, field: string): number {
  const n = typeof value === 'number' ? value : value.toNumber();
  if (!Number.isSafeInteger(n) || (typeof value !== 'number' && !value.eq(n))) {
    throw new CostingInputError(`must be a whole number below 2^53 (${String(value)})`, field);
  }
  return n;
}

/** Smallest multiple of k that is ≥ x, for whole counts. */
export function ceilToMultipleCount(x: number, k: number): number {
  const r = x % k;
  return r === 0 ? x : x - r + k;
}

interface Tier {
  minQty: number;
  /** The price as quoted; parsed on first use (a large requirement never reads the low tiers). */
  priceText: string;
  price?: Dec;
}

interface BuyUp {
  /** k × ceil(minQty / k) for one break, with its price and spend. */
  qty: number;
  price: Dec;
  spend: Dec;
}

/** A quote's buying terms, parsed once so that many requirements can be priced cheaply. */
export interface OrderTerms {
  tiers: Tier[];
  moq: number;
  multiple: number;
  /** m' = max(MOQ, smallest break's minQty). */
  effectiveMoq: number;
  /** Buy-up candidate per break, fixed for the quote; filled on first use. */
  buyUps: (BuyUp | undefined)[];
}

/** The cheapest order for R without the excess figures: what ranking quotes needs. */
export interface OrderSpend {
  orderQty: number;
  unitPrice: Dec;
  /** G = Q × price(Q), in the quote's currency. */
  goodsValue: Dec;
}

export interface OrderChoice extends OrderSpend {
  required: number;
  excessQty: number;
  /** E × price(Q), in the quote's currency. */
  excessValue: Dec;
}

// Field paths are built only when something is wrong: this runs for every break of every quote.
function positiveCount(value: number, path: () => string): number {
  const n = typeof value === 'string' && isDecimalText(value) ? Number(value) : value;
  if (typeof n === 'number' && Number.isSafeInteger(n) && n >= 1) return n;
  throw new CostingInputError(`must be a whole number ≥ 1 (${String(value)})`, path());
}

function priceOf(t: Tier): Dec {
  return (t.price ??= new Dec(t.priceText));
}

/** The tier price(Q) reads: the break with the greatest minQty ≤ Q (tiers ascending). */
function tierIndex(tiers: Tier[], qty: number): number {
  let i = tiers.length - 1;
  while (i >= 0 && tiers[i].minQty > qty) i--;
  return i;
}

function buyUp(terms: OrderTerms, i: number): BuyUp {
  let b = terms.buyUps[i];
  if (!b) {
    const qty = ceilToMultipleCount(terms.tiers[i].minQty, terms.multiple);
    // Rounding up to the multiple may carry the quantity into a higher tier.
    const price = priceOf(terms.tiers[tierIndex(terms.tiers, qty)]);
    b = terms.buyUps[i] = { qty, price, spend: price.times(qty) };
  }
  return b;
}

/**
 * Parses a quote's price breaks, MOQ and order multiple. Breaks are sorted by minQty;
 * when two breaks share a minQty the lower price is kept (the buyer would take it).
 */
export function prepareOrderTerms(priceBreaks: PriceBreak[], moq: number, orderMultiple: number, field = 'quote'): OrderTerms {
  if (!Array.isArray(priceBreaks) || priceBreaks.length === 0) {
    throw new CostingInputError('a quote needs at least one price break', `${field}.priceBreaks`);
  }
  let tiers: Tier[] = priceBreaks.map((b, i) => {
    const minQty = positiveCount(b.minQty, () => `${field}.priceBreaks.${i}.minQty`);
    const priceText = typeof b.unitPrice === 'string' ? b.unitPrice.trim() : String(b.unitPrice);
    if (!isDecimalText(priceText) || priceText.startsWith('-')) {
      throw new CostingInputError(`not a price (${JSON.stringify(b.unitPrice)})`, `${field}.priceBreaks.${i}.unitPrice`);
    }
    return { minQty, priceText };
  });
  // Quotes usually list breaks in ascending order; sort and de-duplicate only when not.
  let ascending = true;
  for (let i = 1; i < tiers.length && ascending; i++) ascending = tiers[i - 1].minQty < tiers[i].minQty;
  if (!ascending) {
    const sorted = [...tiers].sort((a, b) => a.minQty - b.minQty || priceOf(a).cmp(priceOf(b)));
    tiers = [];
    for (const t of sorted) {
      if (tiers.length === 0 || tiers[tiers.length - 1].minQty !== t.minQty) tiers.push(t);
    }
  }
  const moqCount = positiveCount(moq, () => `${field}.moq`);
  const multiple = positiveCount(orderMultiple, () => `${field}.orderMultiple`);
  return {
    tiers,
    moq: moqCount,
    multiple,
    effectiveMoq: Math.max(moqCount, tiers[0].minQty),
    buyUps: new Array<BuyUp | undefined>(tiers.length),
  };
}

/** price(Q) for a prepared quote; undefined below the smallest break. */
export function priceAt(terms: OrderTerms, qty: number): Dec | undefined {
  const i = tierIndex(terms.tiers, qty);
  return i < 0 ? undefined : priceOf(terms.tiers[i]);
}

/**
 * The order quantity for a requirement R:
 * Q0 = k × ceil(max(R, m') / k); candidates Q0 and k × ceil(minQty / k) for every break
 * above Q0; the lowest spend Q × price(Q) wins, a tie goes to the smaller Q. Buying up to
 * the next break therefore happens only when it lowers total spend.
 */
export function orderSpend(terms: OrderTerms, required: number): OrderSpend {
  const base = ceilToMultipleCount(Math.max(required, terms.effectiveMoq), terms.multiple);
  if (!Number.isSafeInteger(base)) throw new CostingInputError(`order quantity beyond 2^53 (${base})`, 'requiredQty');
  const { tiers } = terms;
  // base ≥ m' ≥ the smallest break, so it always has a tier.
  const i = tierIndex(tiers, base);
  let orderQty = base;
  let unitPrice = priceOf(tiers[i]);
  let goodsValue = unitPrice.times(base);
  // Every break above Q0's tier has minQty > Q0: those are the buy-up candidates. They are
  // ascending, so a strict "<" keeps the smaller Q on a tie.
  for (let j = i + 1; j < tiers.length; j++) {
    const b = buyUp(terms, j);
    if (b.spend.lt(goodsValue)) {
      orderQty = b.qty;
      unitPrice = b.price;
      goodsValue = b.spend;
    }
  }
  return { orderQty, unitPrice, goodsValue };
}

/** `orderSpend` plus the excess E = Q − R and its value E × price(Q). */
export function chooseOrder(terms: OrderTerms, required: number): OrderChoice {
  const o = orderSpend(terms, required);
  const excessQty = o.orderQty - required;
  return { required, ...o, excessQty, excessValue: o.unitPrice.times(excessQty) };
}
