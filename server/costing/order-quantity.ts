import { ceilInt, ceilToMultiple, dec, Dec, maxDec, ONE } from './decimal';
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
  unitPrice: Dec;
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
  /**
   * Buy-up candidate per break, fixed for the quote: filled on first use, since most
   * requirements only ever look at the breaks above them.
   */
  buyUps: (BuyUp | undefined)[];
}

export interface OrderChoice {
  required: Dec;
  orderQty: Dec;
  unitPrice: Dec;
  /** G = Q × price(Q), in the quote's currency. */
  goodsValue: Dec;
  excessQty: Dec;
  excessValue: Dec;
}

function positiveInteger(value: number, field: string): Dec {
  if (typeof value === 'number') {
    if (!Number.isInteger(value) || value < 1) throw new CostingInputError(`must be a whole number ≥ 1 (${value})`, field);
    return new Dec(value);
  }
  const d = dec(value, field);
  if (!d.isInteger() || d.lt(1)) throw new CostingInputError(`must be a whole number ≥ 1 (${value})`, field);
  return d;
}

function buyUp(terms: OrderTerms, i: number): BuyUp {
  let b = terms.buyUps[i];
  if (!b) {
    const { tiers } = terms;
    const qty = terms.multipleIsOne ? tiers[i].minQty : ceilToMultiple(tiers[i].minQty, terms.multiple);
    // Rounding up to the multiple may carry the quantity into a higher tier.
    let j = i;
    while (j + 1 < tiers.length && tiers[j + 1].minQty.lte(qty)) j++;
    const price = tiers[j].unitPrice;
    b = terms.buyUps[i] = { qty, price, spend: qty.times(price) };
  }
  return b;
}

/** price(Q): the unit price of the break with the greatest minQty ≤ Q (tiers ascending). */
function priceIn(tiers: Tier[], qty: Dec): Dec | undefined {
  for (let i = tiers.length - 1; i >= 0; i--) {
    if (tiers[i].minQty.lte(qty)) return tiers[i].unitPrice;
  }
  return undefined;
}

/**
 * Parses a quote's price breaks, MOQ and order multiple. Breaks are sorted by minQty;
 * when two breaks share a minQty the lower price is kept (the buyer would take it).
 */
export function prepareOrderTerms(
  priceBreaks: PriceBreak[],
  moq: number,
  orderMultiple: number,
  field = 'quote',
): OrderTerms {
  if (!Array.isArray(priceBreaks) || priceBreaks.length === 0) {
    throw new CostingInputError('a quote needs at least one price break', `${field}.priceBreaks`);
  }
  let tiers: Tier[] = priceBreaks.map((b, i) => {
    const minQty = positiveInteger(b.minQty, `${field}.priceBreaks.${i}.minQty`);
    const unitPrice = dec(b.unitPrice, `${field}.priceBreaks.${i}.unitPrice`);
    if (unitPrice.isNeg()) throw new CostingInputError('must not be negative', `${field}.priceBreaks.${i}.unitPrice`);
    return { minQty, unitPrice };
  });
  // Quotes usually list breaks in ascending order; sort and de-duplicate only when not.
  let ascending = true;
  for (let i = 1; i < tiers.length && ascending; i++) ascending = tiers[i - 1].minQty.lt(tiers[i].minQty);
  if (!ascending) {
    const sorted = [...tiers].sort((a, b) => a.minQty.cmp(b.minQty) || a.unitPrice.cmp(b.unitPrice));
    tiers = [];
    for (const t of sorted) {
      if (tiers.length === 0 || !tiers[tiers.length - 1].minQty.eq(t.minQty)) tiers.push(t);
    }
  }
  const moqD = positiveInteger(moq, `${field}.moq`);
  const multiple = positiveInteger(orderMultiple, `${field}.orderMultiple`);
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
  return priceIn(terms.tiers, qty);
}

/** The cheapest order for R without the excess figures: what ranking quotes needs. */
export interface OrderSpend {
  orderQty: Dec;
  unitPrice: Dec;
  /** G = Q × price(Q), in the quote's currency. */
  goodsValue: Dec;
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
  let i = tiers.length - 1;
  while (i > 0 && tiers[i].minQty.gt(base)) i--;
  let orderQty = base;
  let unitPrice = tiers[i].unitPrice;
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
