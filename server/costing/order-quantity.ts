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

/**
 * A quote's buying terms, parsed once so that many requirements can be priced cheaply.
 * Breaks are held as parallel arrays (ascending minQty) rather than an object each: a
 * 10,000-line BOM brings 200,000 of them.
 */
export interface OrderTerms {
  minQtys: number[];
  /** Prices as quoted; parsed into `prices` on first use (a large requirement never reads the low tiers). */
  priceTexts: string[];
  prices: (Dec | undefined)[];
  moq: number;
  multiple: number;
  /** m' = max(MOQ, smallest break's minQty). */
  effectiveMoq: number;
  /** Prices as floats for ranking only (NaN where a float cannot stand in); filled on first use. */
  floats?: number[];
  /** Prices in millionths as safe integers (NaN past 6 decimals or 2^53); filled on first use. */
  micros?: number[];
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

/** A whole count ≥ 1 (a number, or a string of digits), else -1. */
function positiveCount(value: unknown): number {
  const n = typeof value === 'string' && isDecimalText(value) ? Number(value) : value;
  return typeof n === 'number' && Number.isSafeInteger(n) && n >= 1 ? n : -1;
}

// Field paths are built only when something is wrong: this runs for every break of every quote.
function notACount(value: unknown, path: string): never {
  throw new CostingInputError(`must be a whole number ≥ 1 (${String(value)})`, path);
}

function priceOf(terms: OrderTerms, i: number): Dec {
  return (terms.prices[i] ??= new Dec(terms.priceTexts[i]));
}

/** The break price(Q) reads: the greatest minQty ≤ Q (ascending), or -1. */
function tierIndex(minQtys: number[], qty: number): number {
  let i = minQtys.length - 1;
  while (i >= 0 && minQtys[i] > qty) i--;
  return i;
}

/**
 * Parses a quote's price breaks, MOQ and order multiple. Breaks are sorted by minQty;
 * when two breaks share a minQty the lower price is kept (the buyer would take it).
 */
export function prepareOrderTerms(priceBreaks: PriceBreak[], moq: number, orderMultiple: number, field = 'quote'): OrderTerms {
  if (!Array.isArray(priceBreaks) || priceBreaks.length === 0) {
    throw new CostingInputError('a quote needs at least one price break', `${field}.priceBreaks`);
  }
  const n = priceBreaks.length;
  let minQtys = new Array<number>(n);
  let priceTexts = new Array<string>(n);
  let ascending = true;
  for (let i = 0; i < n; i++) {
    const b = priceBreaks[i];
    const minQty = positiveCount(b.minQty);
    if (minQty < 0) notACount(b.minQty, `${field}.priceBreaks.${i}.minQty`);
    let text = b.unitPrice;
    if (typeof text !== 'string' || !isDecimalText(text)) text = String(text).trim();
    if (!isDecimalText(text) || text.startsWith('-')) {
      throw new CostingInputError(`not a price (${JSON.stringify(b.unitPrice)})`, `${field}.priceBreaks.${i}.unitPrice`);
    }
    minQtys[i] = minQty;
    priceTexts[i] = text;
    if (i > 0 && minQtys[i - 1] >= minQty) ascending = false;
  }
  // Quotes usually list breaks in ascending order; sort and de-duplicate only when not.
  if (!ascending) {
    const order = minQtys
      .map((q, i) => ({ q, i, price: new Dec(priceTexts[i]) }))
      .sort((a, b) => a.q - b.q || a.price.cmp(b.price))
      .filter((t, k, all) => k === 0 || all[k - 1].q !== t.q);
    minQtys = order.map((t) => t.q);
    priceTexts = order.map((t) => priceTexts[t.i]);
  }
  const moqCount = positiveCount(moq);
  if (moqCount < 0) notACount(moq, `${field}.moq`);
  const multiple = positiveCount(orderMultiple);
  if (multiple < 0) notACount(orderMultiple, `${field}.orderMultiple`);
  return {
    minQtys,
    priceTexts,
    prices: new Array<Dec | undefined>(minQtys.length),
    moq: moqCount,
    multiple,
    effectiveMoq: Math.max(moqCount, minQtys[0]),
  };
}

/** price(Q) for a prepared quote; undefined below the smallest break. */
export function priceAt(terms: OrderTerms, qty: number): Dec | undefined {
  const i = tierIndex(terms.minQtys, qty);
  return i < 0 ? undefined : priceOf(terms, i);
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
  const { minQtys } = terms;
  // base ≥ m' ≥ the smallest break, so it always has a tier.
  const i = tierIndex(minQtys, base);
  let orderQty = base;
  let unitPrice = priceOf(terms, i);
  let goodsValue = unitPrice.times(base);
  // Every break above Q0's tier has minQty > Q0: those are the buy-up candidates, at
  // k × ceil(minQty / k), which may land in a still higher tier. They are ascending, so a
  // strict "<" keeps the smaller Q on a tie.
  for (let j = i + 1; j < minQtys.length; j++) {
    const qty = ceilToMultipleCount(minQtys[j], terms.multiple);
    const price = priceOf(terms, tierIndex(minQtys, qty));
    const spend = price.times(qty);
    if (spend.lt(goodsValue)) {
      orderQty = qty;
      unitPrice = price;
      goodsValue = spend;
    }
  }
  return { orderQty, unitPrice, goodsValue };
}

/** The spend of ordering `qty` at break `tier` (as `orderSpend` computes it for its choice). */
export function spendAt(terms: OrderTerms, tier: number, qty: number): OrderSpend {
  const unitPrice = priceOf(terms, tier);
  return { orderQty: qty, unitPrice, goodsValue: unitPrice.times(qty) };
}

/*
 * Ranking in floats. Choosing a quote only needs to know which spend or landed cost is
 * lowest; the amounts themselves are then computed in decimal.js for the chosen quote alone.
 * A float product of a few exact inputs is within about 1e-15 of the decimal one, so when
 * two floats differ by more than FLOAT_TIE (relative) the exact values order the same way.
 * Closer than that, or a value a float cannot hold, and the caller compares exactly.
 */

/** Relative gap below which two floats are not trusted to order as their exact values do. */
export const FLOAT_TIE = 1e-9;

/** True when floats a and b are safely apart (false for NaN, infinities, ties and near-ties). */
export function floatsApart(a: number, b: number): boolean {
  return Math.abs(a - b) > FLOAT_TIE * Math.max(Math.abs(a), Math.abs(b));
}

/**
 * A decimal as a float for ranking, or NaN when the float may not order like it: beyond
 * 1e±100 (so products of three stay finite and never lose precision to underflow), or a
 * non-zero value that would read as 0.
 */
export function rankingFloat(value: Dec): number {
  const f = value.toNumber();
  const a = Math.abs(f);
  if (a === 0) return value.isZero() ? 0 : Number.NaN;
  return a >= 1e-100 && a <= 1e100 ? f : Number.NaN;
}

function floatPrices(terms: OrderTerms): number[] {
  if (terms.floats) return terms.floats;
  return (terms.floats = terms.priceTexts.map((text) => {
    const f = Number(text);
    if (f === 0) return /[1-9]/.test(text) ? Number.NaN : 0;
    return f >= 1e-100 && f <= 1e100 ? f : Number.NaN;
  }));
}

/** Where `orderSpendFloat` writes its choice (reused: no allocation per quote). */
export interface FloatOrder {
  qty: number;
  tier: number;
  /** Q × price(Q) as a float. */
  spend: number;
}

/**
 * `orderSpend`'s rule in floats: the same candidates, the same strict "<". Returns false
 * when two candidates' spends are too close for floats (or a price is not float-safe); the
 * caller then uses `orderSpend`. When it returns true, `out` names the order `orderSpend`
 * would choose.
 */
export function orderSpendFloat(terms: OrderTerms, required: number, out: FloatOrder): boolean {
  const prices = floatPrices(terms);
  const base = ceilToMultipleCount(Math.max(required, terms.effectiveMoq), terms.multiple);
  if (!Number.isSafeInteger(base)) return false;
  const { minQtys } = terms;
  const i = tierIndex(minQtys, base);
  let qty = base;
  let tier = i;
  let spend = prices[i] * base;
  if (Number.isNaN(spend)) return false;
  for (let j = i + 1; j < minQtys.length; j++) {
    const q = ceilToMultipleCount(minQtys[j], terms.multiple);
    const t = tierIndex(minQtys, q);
    const s = prices[t] * q;
    if (!floatsApart(s, spend)) return false;
    if (s < spend) {
      qty = q;
      tier = t;
      spend = s;
    }
  }
  out.qty = qty;
  out.tier = tier;
  out.spend = spend;
  return true;
}

/** `orderSpend` plus the excess E = Q − R and its value E × price(Q). */
export function chooseOrder(terms: OrderTerms, required: number): OrderChoice {
  const o = orderSpend(terms, required);
  const excessQty = o.orderQty - required;
  return { required, ...o, excessQty, excessValue: o.unitPrice.times(excessQty) };
}

const PRICE_TEXT = /^\+?(\d*)(?:\.(\d*))?$/;

/**
 * Prices as whole millionths of the quote's currency: `numeric(18,6)` prices all fit, and
 * Q × price is then an exact integer product. NaN for a price with more decimals (an
 * engine caller may send any), which the caller then handles in decimal.js.
 */
export function microPrices(terms: OrderTerms): number[] {
  if (terms.micros) return terms.micros;
  return (terms.micros = terms.priceTexts.map((text) => {
    const m = PRICE_TEXT.exec(text);
    if (!m) return Number.NaN;
    const frac = (m[2] ?? '').replace(/0+$/, '');
    if (frac.length > 6) return Number.NaN;
    const n = Number(`${m[1] || '0'}${frac.padEnd(6, '0')}`);
    return Number.isSafeInteger(n) ? n : Number.NaN;
  }));
}
