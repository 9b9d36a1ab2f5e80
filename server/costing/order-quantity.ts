import { ceilInt, ceilToMultiple, Dec, isDecimalText, maxDec, ONE } from './decimal';
import { CostingInputError } from './errors';
import type { PriceBreak } from './types';

/**
 * Required quantity R = ceil(q × N × (1 + a)), exact decimal; `attrition` is a fraction.
 */
export function requiredQty(qtyPerUnit: Dec, buildQty: Dec, attrition: Dec): Dec {
  return ceilInt(qtyPerUnit.times(buildQty).times(ONE.plus(attrition)));
}

interface Tier {
  minQty: Dec;
  /** The price as quoted; parsed on first use (a large requirement never reads the low tiers). */
  priceText: string;
  price?: Dec;
}

interface BuyUp {
  /** k × ceil(minQty / k) for one break, with its price and spend. */
  qty: Dec;
  price: Dec;
  spend: Dec;
}

/** A quote's buying terms, parsed once so that many requirements can be priced cheaply. */
export interface OrderTerms {
  tiers: Tier[];
  moq: Dec;
  multiple: Dec;
  multipleIsOne: boolean;
  /** m' = max(MOQ, smallest break's minQty). */
  effectiveMoq: Dec;
  /** Buy-up candidate per break, fixed for the quote; filled on first use. */
  buyUps: (BuyUp | undefined)[];
}

/** The cheapest order for R without the excess figures: what ranking quotes needs. */
export interface OrderSpend {
  orderQty: Dec;
  unitPrice: Dec;
  /** G = Q × price(Q), in the quote's currency. */
  goodsValue: Dec;
}

export interface OrderChoice extends OrderSpend {
  required: Dec;
  excessQty: Dec;
  excessValue: Dec;
}

// Field paths are built only when something is wrong: this runs for every break of every quote.
function positiveInteger(value: number, path: () => string): Dec {
  if (typeof value === 'number' && Number.isInteger(value) && value >= 1) return new Dec(value);
  if (typeof value === 'string' && isDecimalText(value)) {
    const d = new Dec(value);
    if (d.isInteger() && d.gte(1)) return d;
  }
  throw new CostingInputError(`must be a whole number ≥ 1 (${String(value)})`, path());
}

function priceOf(t: Tier): Dec {
  return (t.price ??= new Dec(t.priceText));
}

/** price(Q) among ascending tiers: the break with the greatest minQty ≤ Q. */
function tierIndex(tiers: Tier[], qty: Dec): number {
  let i = tiers.length - 1;
  while (i >= 0 && tiers[i].minQty.gt(qty)) i--;
  return i;
}

function buyUp(terms: OrderTerms, i: number): BuyUp {
  let b = terms.buyUps[i];
  if (!b) {
    const { tiers } = terms;
    const qty = terms.multipleIsOne ? tiers[i].minQty : ceilToMultiple(tiers[i].minQty, terms.multiple);
    // Rounding up to the multiple may carry the quantity into a higher tier.
    let j = i;
    while (j + 1 < tiers.length && tiers[j + 1].minQty.lte(qty)) j++;
    const price = priceOf(tiers[j]);
    b = terms.buyUps[i] = { qty, price, spend: qty.times(price) };
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
    const minQty = positiveInteger(b.minQty, () => `${field}.priceBreaks.${i}.minQty`);
    const priceText = typeof b.unitPrice === 'string' ? b.unitPrice.trim() : String(b.unitPrice);
    if (!isDecimalText(priceText) || priceText.startsWith('-')) {
      throw new CostingInputError(`not a price (${JSON.stringify(b.unitPrice)})`, `${field}.priceBreaks.${i}.unitPrice`);
    }
    return { minQty, priceText };
  });
  // Quotes usually list breaks in ascending order; sort and de-duplicate only when not.
  let ascending = true;
  for (let i = 1; i < tiers.length && ascending; i++) ascending = tiers[i - 1].minQty.lt(tiers[i].minQty);
  if (!ascending) {
    const sorted = [...tiers].sort((a, b) => a.minQty.cmp(b.minQty) || priceOf(a).cmp(priceOf(b)));
    tiers = [];
    for (const t of sorted) {
      if (tiers.length === 0 || !tiers[tiers.length - 1].minQty.eq(t.minQty)) tiers.push(t);
    }
  }
  const moqD = positiveInteger(moq, () => `${field}.moq`);
  const multiple = positiveInteger(orderMultiple, () => `${field}.orderMultiple`);
  return {
    tiers,
    moq: moqD,
    multiple,
    multipleIsOne: multiple.eq(1),
    effectiveMoq: maxDec(moqD, tiers[0].minQty),
    buyUps: new Array<BuyUp | undefined>(tiers.length),
  };
}

/** price(Q) for a prepared quote; undefined below the smallest break. */
export function priceAt(terms: OrderTerms, qty: Dec): Dec | undefined {
  const i = tierIndex(terms.tiers, qty);
  return i < 0 ? undefined : priceOf(terms.tiers[i]);
}

/**
 * The order quantity for a requirement R:
 * Q0 = k × ceil(max(R, m') / k); candidates Q0 and k × ceil(minQty / k) for every break
 * above Q0; the lowest spend Q × price(Q) wins, a tie goes to the smaller Q. Buying up to
 * the next break therefore happens only when it lowers total spend.
 */
export function orderSpend(terms: OrderTerms, required: Dec): OrderSpend {
  const need = required.gt(terms.effectiveMoq) ? required : terms.effectiveMoq;
  const base = terms.multipleIsOne && need.isInteger() ? need : ceilToMultiple(need, terms.multiple);
  const { tiers } = terms;
  // base ≥ m' ≥ the smallest break, so it always has a tier.
  const i = tierIndex(tiers, base);
  let orderQty = base;
  let unitPrice = priceOf(tiers[i]);
  let goodsValue = base.times(unitPrice);
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
export function chooseOrder(terms: OrderTerms, required: Dec): OrderChoice {
  const o = orderSpend(terms, required);
  const excessQty = o.orderQty.minus(required);
  return { required, ...o, excessQty, excessValue: excessQty.times(o.unitPrice) };
}
