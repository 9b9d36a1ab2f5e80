import { Dec, moneyText, perUnitText } from './decimal';
import { CostingInputError } from './errors';
import { createFxIndex, type FxFound, type FxIndex } from './fx';
import { assertIncoterm, isIncoterm } from './incoterms';
import { boardLandedFactor, lineAdders } from './landed';
import { chooseOrder, orderSpend, prepareOrderTerms, type OrderSpend, type OrderTerms } from './order-quantity';
import type { DutyMatch } from './duty';
import { prepareProfile, type PreparedProfile } from './profile';
import type {
  CurrencyCode,
  Incoterm,
  IneligibleReason,
  IsoDate,
  Offer,
  Quote,
  QuoteBoardInput,
  QuoteBoardResult,
  Supplier,
} from './types';

/** A quote with its buying terms parsed, ready to be priced at any quantity. */
export interface PreparedQuote {
  quote: Quote;
  incoterm: Incoterm;
  terms: OrderTerms;
  supplierActive: boolean;
  /** createdAt in ms; +Infinity when unknown, so a dated quote wins the "older" tie. */
  createdAtMs: number;
}

// Imports stamp many quotes with the same time; parse each distinct text once.
const parsedTimes = new Map<string, number>();
function timeMs(text: string | null | undefined): number {
  if (!text) return Number.POSITIVE_INFINITY;
  let ms = parsedTimes.get(text);
  if (ms === undefined) {
    const parsed = Date.parse(text);
    ms = Number.isNaN(parsed) ? Number.POSITIVE_INFINITY : parsed;
    if (parsedTimes.size > 10_000) parsedTimes.clear();
    parsedTimes.set(text, ms);
  }
  return ms;
}

export function prepareQuote(quote: Quote, suppliers: ReadonlyMap<string, Supplier>, index?: number): PreparedQuote {
  const field = index === undefined ? `quote ${quote.id}` : `quotes.${index}`;
  const supplier = suppliers.get(quote.supplierId);
  if (!supplier) throw new CostingInputError(`supplier ${quote.supplierId} is not in the input`, `${field}.supplierId`);
  return {
    quote,
    incoterm: isIncoterm(quote.incoterm) ? quote.incoterm : assertIncoterm(quote.incoterm, `${field}.incoterm`),
    terms: prepareOrderTerms(quote.priceBreaks, quote.moq, quote.orderMultiple, field),
    supplierActive: supplier.active === true,
    createdAtMs: timeMs(quote.createdAt),
  };
}

export function supplierMap(suppliers: Supplier[]): Map<string, Supplier> {
  return new Map(suppliers.map((s) => [s.id, s]));
}

/**
 * Why a quote may not be used on date d, FX aside (that depends on the currency asked for):
 * validity `validFrom ≤ d ≤ validUntil` with open ends, an active supplier, and a lead time
 * within `maxLeadTimeDays` when set. A quote without a lead time cannot show it is within
 * the maximum, so it fails that test. Empty = eligible.
 */
export function eligibilityReasons(pq: PreparedQuote, date: IsoDate, maxLeadTimeDays: number | null): IneligibleReason[] {
  const q = pq.quote;
  const leadOk = maxLeadTimeDays === null || (q.leadTimeDays !== null && q.leadTimeDays !== undefined && q.leadTimeDays <= maxLeadTimeDays);
  // Fast path for the common case: eligible.
  if (pq.supplierActive && leadOk && !(q.validUntil && q.validUntil < date) && !(q.validFrom && q.validFrom > date)) return [];
  const reasons: IneligibleReason[] = [];
  if (q.validUntil && q.validUntil < date) reasons.push('expired');
  if (q.validFrom && q.validFrom > date) reasons.push('not_yet_valid');
  if (!pq.supplierActive) reasons.push('inactive_supplier');
  if (maxLeadTimeDays !== null && (q.leadTimeDays === null || q.leadTimeDays === undefined || q.leadTimeDays > maxLeadTimeDays)) {
    reasons.push('lead_time');
  }
  return reasons;
}

/** A quote priced for one requirement. */
export interface PricedQuote {
  pq: PreparedQuote;
  order: OrderSpend;
  /** The rate from the quote's currency to the one compared in. */
  fx: FxFound;
  /**
   * The quote board's landed line cost in the compared currency: percentage adders and
   * duty, no per-shipment shares.
   */
  boardLanded: Dec;
}

/** G converted: the goods value in the compared currency. */
export function convertedGoods(p: PricedQuote): Dec {
  return p.fx.route === 'same' ? p.order.goodsValue : p.order.goodsValue.times(p.fx.rate);
}

function leadRank(pq: PreparedQuote): number {
  const l = pq.quote.leadTimeDays;
  return l === null || l === undefined ? Number.POSITIVE_INFINITY : l;
}

/**
 * Order of preference: lowest board landed cost, then shorter lead time, then the older
 * quote; the quote id settles anything left so the choice never depends on input order.
 */
export function compareQuotes(a: PricedQuote, b: PricedQuote): number {
  const byCost = a.boardLanded.cmp(b.boardLanded);
  if (byCost !== 0) return byCost;
  const byLead = leadRank(a.pq) - leadRank(b.pq);
  if (byLead !== 0 && !Number.isNaN(byLead)) return byLead;
  if (a.pq.createdAtMs !== b.pq.createdAtMs) return a.pq.createdAtMs < b.pq.createdAtMs ? -1 : 1;
  return a.pq.quote.id < b.pq.quote.id ? -1 : a.pq.quote.id > b.pq.quote.id ? 1 : 0;
}

/**
 * Caches, for one profile, the board's landed cost per unit of quoted goods value:
 * FX rate × landed factor, per (duty match, Incoterm, rate). Duty matches and rates are
 * themselves cached objects, so ranking a quote is three Map hits and one multiplication.
 */
export class LandedFactors {
  private readonly cache = new Map<DutyMatch, Map<Incoterm, Map<FxFound, Dec>>>();
  constructor(private readonly profile: PreparedProfile) {}
  multiplier(incoterm: Incoterm, duty: DutyMatch, fx: FxFound): Dec {
    let byTerm = this.cache.get(duty);
    if (!byTerm) this.cache.set(duty, (byTerm = new Map()));
    let byRate = byTerm.get(incoterm);
    if (!byRate) byTerm.set(incoterm, (byRate = new Map()));
    let m = byRate.get(fx);
    if (!m) {
      const factor = boardLandedFactor(incoterm, this.profile.pct, this.profile.dutyBasis, duty.rate);
      m = fx.route === 'same' ? factor : fx.rate.times(factor);
      byRate.set(fx, m);
    }
    return m;
  }
}

/** Prices a prepared quote for requirement R in the reporting currency. */
export function priceQuote(
  pq: PreparedQuote,
  required: number,
  fx: FxFound,
  duty: DutyMatch,
  factors: LandedFactors,
  order: OrderSpend = orderSpend(pq.terms, required),
): PricedQuote {
  return { pq, order, fx, boardLanded: order.goodsValue.times(factors.multiplier(pq.incoterm, duty, fx)) };
}

function positiveQty(qty: number, field: string): number {
  if (!Number.isSafeInteger(qty) || qty < 1) throw new CostingInputError(`must be a whole number ≥ 1 (${qty})`, field);
  return qty;
}

/**
 * The quote board: every offer for one part at a needed quantity, side by side in one
 * currency, with percentage adders and duty (per-shipment amounts belong to a BOM's cost
 * roll). Each offer shows its order quantity, unit price, goods and excess value, adders,
 * landed cost of the whole order and landed per piece needed (so excess is charged).
 * Ineligible offers are priced too, so the buyer sees what an expired quote would cost;
 * only `cheapestQuoteId` is restricted to eligible ones.
 */
export function quoteBoard(input: QuoteBoardInput, fxIndex?: FxIndex): QuoteBoardResult {
  const required = positiveQty(input.qty, 'qty');
  const profile = prepareProfile(input.profile);
  const fx = fxIndex ?? createFxIndex(input.fxRates, { pivot: input.pivot });
  const suppliers = supplierMap(input.suppliers);
  const duty = profile.duty.match(input.part.hsCode);
  const factors = new LandedFactors(profile);
  const currency: CurrencyCode = input.currency.toUpperCase();

  let best: PricedQuote | undefined;
  const offers: Offer[] = input.quotes
    .filter((q) => q.partId === input.partId)
    .map((quote, i) => {
      const pq = prepareQuote(quote, suppliers, i);
      const reasons = eligibilityReasons(pq, input.date, profile.maxLeadTimeDays);
      const rate = fx.lookup(quote.currency, currency, input.date);
      const order = chooseOrder(pq.terms, required);
      const base = {
        quoteId: quote.id,
        supplierId: quote.supplierId,
        incoterm: pq.incoterm,
        leadTimeDays: quote.leadTimeDays ?? null,
        orderQty: order.orderQty,
        excessQty: order.excessQty,
        unitPrice: perUnitText(order.unitPrice),
        unitPriceCurrency: quote.currency,
      };
      if (!rate.ok) {
        reasons.push('missing_fx');
        return {
          ...base,
          eligible: false,
          reason: reasons[0],
          reasons,
          unitPriceConverted: null,
          goodsValue: null,
          excessValue: null,
          origin: null,
          freight: null,
          insurance: null,
          duty: null,
          destination: null,
          landed: null,
          landedPerPiece: null,
          fxRate: null,
          fxRates: [],
        };
      }
      const priced = priceQuote(pq, required, rate, duty, factors, order);
      if (reasons.length === 0 && (!best || compareQuotes(priced, best) < 0)) best = priced;
      const goods = convertedGoods(priced);
      const a = lineAdders({
        goods,
        incoterm: pq.incoterm,
        pct: profile.pct,
        dutyBasis: profile.dutyBasis,
        dutyRate: duty.rate,
      });
      return {
        ...base,
        eligible: reasons.length === 0,
        reason: reasons[0] ?? null,
        reasons,
        unitPriceConverted: perUnitText(order.unitPrice.times(rate.rate)),
        goodsValue: moneyText(goods),
        excessValue: moneyText(order.excessValue.times(rate.rate)),
        origin: moneyText(a.origin),
        freight: moneyText(a.freight),
        insurance: moneyText(a.insurance),
        duty: moneyText(a.duty),
        destination: moneyText(a.destination),
        landed: moneyText(a.landed),
        landedPerPiece: perUnitText(a.landed.div(required)),
        fxRate: perUnitText(rate.rate),
        fxRates: rate.rows,
      };
    });

  return {
    partId: input.partId,
    qty: required,
    date: input.date,
    currency,
    dutyPct: duty.ratePct.toString(),
    offers,
    cheapestQuoteId: best ? best.pq.quote.id : null,
  };
}
