import { dec, Dec, decOr, MONEY_DP, moneyText, ONE, PER_UNIT_DP, pctToFraction, perUnitText, ZERO } from './decimal';
import { Dec40 } from './dec40';
import { CostingInputError } from './errors';
import type { DutyMatch } from './duty';
import { createFxIndex, type FxFound, type FxIndex, type FxLookup } from './fx';
import { needsAdder } from './incoterms';
import { INSURED_SHARE, lineAdders, type Amount, type LineAdders } from './landed';
import {
  floatsApart,
  microPrices,
  orderSpend,
  orderSpendFloat,
  rankingFloat,
  requiredQty,
  spendAt,
  toCount,
  type FloatOrder,
  type OrderSpend,
} from './order-quantity';
import { prepareProfile, type PercentAdders, type PreparedProfile } from './profile';
import {
  compareQuotes,
  eligibilityReasons,
  LandedFactors,
  prepareQuote,
  priceQuote,
  supplierMap,
  type PreparedQuote,
  type PricedQuote,
} from './quote-choice';
import type {
  BomLine,
  Incoterm,
  CategoryTotal,
  CostRollInput,
  CostRollLine,
  CostRollResult,
  CurrencyCode,
  FxRateUsed,
  IneligibleReason,
  IsoDate,
  LeftOutReason,
  LineKind,
  LineWarning,
  LineWarningCode,
  Part,
  RollWarning,
  SupplierTotal,
} from './types';

interface PreparedLine {
  /** Position in the input, to give lines back in the order they came. */
  index: number;
  line: BomLine;
  qtyPerUnit: Dec;
  /** The line's own attrition as a fraction, or null to fall back to the profile. */
  attrition: Dec | null;
  unitCost: Dec | null;
  oneTimeCost: Dec | null;
  /** Part lines whose part is in the input: what ranking its quotes needs at any quantity. */
  rank?: LineRank;
  /** The part's unit weight, parsed on first use (a bad value fails where it is read). */
  unitWeight?: Dec;
  /** Assembly per unit and the missing-pins flag, worked out on first use. */
  assembly?: { perUnit: Dec; missingPins: boolean };
}

/** An eligible quote with a rate, and its board landed cost per unit of quoted goods value. */
interface Candidate {
  slot: QuoteSlot;
  fx: FxFound;
  multiplier: Dec;
  /** `multiplier` as a float for ranking (NaN when a float cannot stand in). */
  multiplierF: number;
  /** The totals-only roll's group for a line that buys this quote (see `Group`). */
  groupKey: string;
}

/** Everything about a part line that does not depend on the build quantity. */
interface LineRank {
  part: Part;
  duty: DutyMatch;
  /** Attrition as a fraction: the line's own, else the profile's for the category, else 0. */
  attrition: Dec;
  /**
   * R = ceil(q × N × (1 + a)) as integers: q × (1 + a) = reqNum / reqDen exactly, or
   * reqNum = 0 when the decimals are too long for that (then R is computed in decimal.js).
   */
  reqNum: number;
  reqDen: number;
  /** Eligible quotes with a rate to the reporting currency, in input order. */
  candidates: Candidate[];
  /** The first eligible quote without a rate, for the `missing_fx` detail. */
  fxMissing?: string;
}

/** A prepared quote with its eligibility on the costing date, FX aside (fixed for the roll). */
type QuoteSlot = PreparedQuote & { reasons: readonly IneligibleReason[] };

const ELIGIBLE: readonly IneligibleReason[] = Object.freeze([]);

type Converted = { ok: true; value: Dec; rows: FxRateUsed[] } | { ok: false; detail: string };

/**
 * Everything in a cost roll that does not depend on the build quantity, parsed and indexed
 * once: the FX index, quotes grouped by part with their terms parsed and their eligibility
 * on the costing date, duty rates, converted profile amounts. The volume curve reuses it
 * for every quantity.
 */
export interface PreparedCostRoll {
  date: IsoDate;
  currency: CurrencyCode;
  profile: PreparedProfile;
  fx: FxIndex;
  /** Lines sorted by id: sums run in this order, so the result never depends on input order. */
  lines: PreparedLine[];
  parts: ReadonlyMap<string, Part>;
  quotesByPart: ReadonlyMap<string, QuoteSlot[]>;
  quotesById: ReadonlyMap<string, QuoteSlot>;
  factors: LandedFactors;
  /** Whether per-shipment freight is shared by weight (then freight-carrying lines need one). */
  byWeight: boolean;
  amortisationQty: Dec | null;
  targetUnitCost: Dec | null;
  /** freightPerShipment × shipments and feesPerShipment × shipments, in the reporting currency. */
  freightPool: Converted;
  feesPool: Converted;
  assemblyRates: { ok: true; smt: Dec; tht: Dec; hand: Dec; rows: FxRateUsed[] } | { ok: false; detail: string };
  /** Roll warnings that do not depend on the quantity. */
  staticWarnings: RollWarning[];
  /** Rate from a currency to the reporting currency on the costing date. */
  toReporting(currency: CurrencyCode): FxLookup;
}

const fxDetail = (from: string, to: string, date: string) => `${from}->${to} ${date}`;

const LINE_KINDS: ReadonlySet<string> = new Set<LineKind>(['part', 'labour', 'packaging', 'test', 'tooling', 'other']);

function optionalDec(value: string | null | undefined, field: string): Dec | null {
  return value === null || value === undefined || value === '' ? null : dec(value, field);
}

function convertAmount(fx: FxIndex, amount: Dec, from: CurrencyCode, to: CurrencyCode, date: IsoDate): Converted {
  // Nothing to convert needs no rate (a profile without per-shipment amounts).
  if (amount.isZero()) return { ok: true, value: ZERO, rows: [] };
  const r = fx.lookup(from, to, date);
  if (!r.ok) return { ok: false, detail: fxDetail(r.from, r.to, date) };
  return { ok: true, value: amount.times(r.rate), rows: r.rows };
}

export function prepareCostRoll(input: CostRollInput, fxIndex?: FxIndex): PreparedCostRoll {
  const { bom } = input;
  const currency = bom.reportingCurrency.toUpperCase();
  const date = bom.date;
  const profile = prepareProfile(input.profile);
  const fx = fxIndex ?? createFxIndex(input.fxRates, { pivot: input.pivot });
  const suppliers = supplierMap(input.suppliers);
  const parts = new Map(input.parts.map((p) => [p.id, p]));

  const quotesByPart = new Map<string, QuoteSlot[]>();
  const quotesById = new Map<string, QuoteSlot>();
  input.quotes.forEach((q, i) => {
    // One object per quote: a 10,000-line BOM brings 40,000 of them.
    const slot = prepareQuote(q, suppliers, i) as QuoteSlot;
    const reasons = eligibilityReasons(slot, date, profile.maxLeadTimeDays);
    slot.reasons = reasons.length === 0 ? ELIGIBLE : reasons;
    let list = quotesByPart.get(q.partId);
    if (!list) quotesByPart.set(q.partId, (list = []));
    list.push(slot);
    quotesById.set(q.id, slot);
  });

  const seen = new Set<string>();
  const lines: PreparedLine[] = input.lines.map((line, index) => {
    const f = `lines.${index}`;
    if (seen.has(line.id)) throw new CostingInputError(`duplicate line id ${line.id}`, `${f}.id`);
    seen.add(line.id);
    if (!LINE_KINDS.has(line.kind)) throw new CostingInputError(`unknown line kind ${String(line.kind)}`, `${f}.kind`);
    const isPart = line.kind === 'part';
    const qtyPerUnit = isPart ? dec(line.qtyPerUnit, `${f}.qtyPerUnit`) : decOr(line.qtyPerUnit, ONE, `${f}.qtyPerUnit`);
    if (isPart ? !qtyPerUnit.gt(0) : qtyPerUnit.isNeg()) throw new CostingInputError('must be positive', `${f}.qtyPerUnit`);
    return {
      index,
      line,
      qtyPerUnit,
      attrition: line.attritionPct === null || line.attritionPct === undefined || line.attritionPct === ''
        ? null
        : pctToFraction(line.attritionPct, `${f}.attritionPct`),
      unitCost: optionalDec(line.unitCost, `${f}.unitCost`),
      oneTimeCost: optionalDec(line.oneTimeCost, `${f}.oneTimeCost`),
    };
  });
  lines.sort((a, b) => (a.line.id < b.line.id ? -1 : a.line.id > b.line.id ? 1 : 0));

  const profileCurrency = (profile.currency ?? currency).toUpperCase();
  const freightCurrency = (profile.freightCurrency ?? profileCurrency).toUpperCase();
  const staticWarnings: RollWarning[] = [];
  const freightPool = convertAmount(fx, profile.freightPerShipment.times(profile.shipments), freightCurrency, currency, date);
  const feesPool = convertAmount(fx, profile.feesPerShipment.times(profile.shipments), profileCurrency, currency, date);
  if (!freightPool.ok) staticWarnings.push({ code: 'missing_fx', detail: `freightPerShipment ${freightPool.detail}` });
  if (!feesPool.ok) staticWarnings.push({ code: 'missing_fx', detail: `feesPerShipment ${feesPool.detail}` });
  if (profile.shipments.isZero() && (!profile.freightPerShipment.isZero() || !profile.feesPerShipment.isZero())) {
    staticWarnings.push({ code: 'shipments_zero', detail: 'per-shipment freight and fees are not charged' });
  }

  const rate = fx.lookup(profileCurrency, currency, date);
  const hasRates = !(profile.smtRatePerPlacement.isZero() && profile.thtRatePerJoint.isZero() && profile.handRatePerOp.isZero());
  let assemblyRates: PreparedCostRoll['assemblyRates'];
  if (rate.ok) {
    assemblyRates = {
      ok: true,
      smt: profile.smtRatePerPlacement.times(rate.rate),
      tht: profile.thtRatePerJoint.times(rate.rate),
      hand: profile.handRatePerOp.times(rate.rate),
      rows: hasRates ? rate.rows : [],
    };
  } else if (hasRates) {
    assemblyRates = { ok: false, detail: fxDetail(rate.from, rate.to, date) };
    staticWarnings.push({ code: 'missing_fx', detail: `assembly rates ${assemblyRates.detail}` });
  } else {
    assemblyRates = { ok: true, smt: ZERO, tht: ZERO, hand: ZERO, rows: [] };
  }

  let amortisationQty: Dec | null = null;
  if (bom.amortisationQty !== null && bom.amortisationQty !== undefined) {
    amortisationQty = dec(bom.amortisationQty, 'bom.amortisationQty');
    if (!amortisationQty.isInteger() || amortisationQty.lt(1)) throw new CostingInputError('must be a whole number ≥ 1', 'bom.amortisationQty');
  }

  const rates = new Map<string, FxLookup>();
  const toReporting = (code: CurrencyCode): FxLookup => {
    let r = rates.get(code);
    if (!r) rates.set(code, (r = fx.lookup(code, currency, date)));
    return r;
  };

  const factors = new LandedFactors(profile);
  const partRanks = new Map<string, Pick<LineRank, 'part' | 'duty' | 'candidates' | 'fxMissing'>>();
  // A few distinct multipliers, duty rates and quantity fractions recur over thousands of
  // parts and lines: each is worked out once.
  const floats = new Map<Dec, number>();
  const rankingFloatOf = (m: Dec) => {
    let f = floats.get(m);
    if (f === undefined) floats.set(m, (f = rankingFloat(m)));
    return f;
  };
  const dutyTexts = new Map<DutyMatch, string>();
  const dutyText = (d: DutyMatch) => {
    let t = dutyTexts.get(d);
    if (t === undefined) dutyTexts.set(d, (t = d.ratePct.toString()));
    return t;
  };
  const ratios = new Map<Dec, Map<string, [number, number]>>();
  const ratioOf = (qtyPerUnit: string, q: Dec, attrition: Dec): [number, number] => {
    let byQty = ratios.get(attrition);
    if (!byQty) ratios.set(attrition, (byQty = new Map()));
    let r = byQty.get(qtyPerUnit);
    if (!r) byQty.set(qtyPerUnit, (r = exactRatio(q, ONE.plus(attrition))));
    return r;
  };
  for (const pl of lines) {
    const part = pl.line.kind === 'part' && pl.line.partId ? parts.get(pl.line.partId) : undefined;
    if (!part) continue;
    let shared = partRanks.get(part.id);
    if (!shared) {
      const duty = profile.duty.match(part.hsCode);
      const candidates: Candidate[] = [];
      let fxMissing: string | undefined;
      for (const slot of quotesByPart.get(part.id) ?? []) {
        if (slot.reasons.length > 0) continue;
        const r = toReporting(slot.quote.currency);
        if (!r.ok) {
          fxMissing ??= fxDetail(r.from, r.to, date);
          continue;
        }
        const multiplier = factors.multiplier(slot.incoterm, duty, r);
        candidates.push({ slot, fx: r, multiplier, multiplierF: rankingFloatOf(multiplier), groupKey: groupKey(part.category, dutyText(duty), slot.quote.supplierId, slot.incoterm, slot.quote.currency) });
      }
      partRanks.set(part.id, (shared = { part, duty, candidates, fxMissing }));
    }
    const attrition = pl.attrition ?? profile.attrition.get(part.category) ?? ZERO;
    const [reqNum, reqDen] = ratioOf(String(pl.line.qtyPerUnit), pl.qtyPerUnit, attrition);
    // Named fields, not a spread: one object shape for 10,000 lines.
    pl.rank = { part: shared.part, duty: shared.duty, candidates: shared.candidates, fxMissing: shared.fxMissing, attrition, reqNum, reqDen };
  }

  return {
    date,
    currency,
    profile,
    fx,
    toReporting,
    lines,
    parts,
    quotesByPart,
    quotesById,
    factors,
    byWeight: profile.freightBasis === 'weight' && !profile.freightPerShipment.times(profile.shipments).isZero(),
    amortisationQty,
    targetUnitCost: optionalDec(bom.targetUnitCost, 'bom.targetUnitCost'),
    freightPool,
    feesPool,
    assemblyRates,
    staticWarnings,
  };
}

// ---------------------------------------------------------------------------------------
// One roll at one build quantity

interface Work {
  pl: PreparedLine;
  status: 'costed' | 'dnp' | 'left_out';
  leftOut?: { reason: LeftOutReason; detail?: string };
  warnings: LineWarning[];
  category: string;
  required?: number;
  chosen?: Chosen;
  /** The chosen quote's goods value G in the reporting currency. */
  goods?: Dec;
  duty?: DutyMatch;
  excessQty?: number;
  excessValue?: Dec;
  weight?: Dec;
  assemblyPerUnit: Dec;
  costPerUnit?: Dec;
  oneTimeCost?: Dec;
  fxRows: FxRateUsed[];
  // Filled in the second pass.
  adders?: LineAdders;
  freightShare?: Dec;
  assembly: Dec;
  landed: Dec;
}

const PINNED_WARNING: Partial<Record<IneligibleReason, LineWarningCode>> = {
  expired: 'pinned_expired',
  not_yet_valid: 'pinned_not_yet_valid',
  inactive_supplier: 'pinned_inactive_supplier',
  lead_time: 'pinned_lead_time',
};

function leaveOut(w: Work, reason: LeftOutReason, detail?: string): Work {
  w.status = 'left_out';
  w.leftOut = { reason, detail };
  w.warnings.push(detail ? { code: reason, detail } : { code: reason });
  return w;
}

function costCostLine(p: PreparedCostRoll, w: Work): Work {
  const { pl } = w;
  if (pl.unitCost === null && pl.oneTimeCost === null) return leaveOut(w, 'no_cost');
  const from = (pl.line.currency ?? p.currency).toUpperCase();
  const rate = p.toReporting(from);
  if (!rate.ok) return leaveOut(w, 'missing_fx', fxDetail(rate.from, rate.to, p.date));
  w.fxRows = rate.rows;
  w.costPerUnit = pl.unitCost === null ? ZERO : pl.unitCost.times(pl.qtyPerUnit).times(rate.rate);
  w.oneTimeCost = pl.oneTimeCost === null ? ZERO : pl.oneTimeCost.times(rate.rate);
  return w;
}

/** A decimal's digits as an integer and its decimal places, or null when either is too long. */
function digits(value: Dec): [number, number] | null {
  const dp = value.decimalPlaces();
  if (dp > 15) return null;
  const n = Number(value.toFixed(dp).replace('.', ''));
  return Number.isSafeInteger(n) && n > 0 ? [n, dp] : null;
}

/** a × b as an exact fraction num / 10^k of safe integers, or [0, 1] when it is not one. */
function exactRatio(a: Dec, b: Dec): [number, number] {
  const x = digits(a);
  const y = digits(b);
  if (!x || !y || x[1] + y[1] > 15) return [0, 1];
  const num = x[0] * y[0];
  return Number.isSafeInteger(num) ? [num, 10 ** (x[1] + y[1])] : [0, 1];
}

/**
 * R = ceil(q × N × (1 + a)). When every digit fits a safe integer, decimal.js computes it
 * exactly too, so integer arithmetic gives the same count; otherwise decimal.js does.
 */
function lineRequired(pl: PreparedLine, rank: LineRank, buildQty: number, N: Dec): number {
  const p = rank.reqNum * buildQty;
  if (rank.reqNum > 0 && Number.isSafeInteger(p)) {
    const rest = p % rank.reqDen;
    return (p - rest) / rank.reqDen + (rest === 0 ? 0 : 1);
  }
  return toCount(requiredQty(pl.qtyPerUnit, N, rank.attrition), `lines.${pl.index}.requiredQty`);
}

/** The chosen quote for a line: its order and the rate to the reporting currency. */
interface Chosen {
  pq: PreparedQuote;
  order: OrderSpend;
  fx: FxFound;
}

// Scratch for ranking one line's quotes; a roll is synchronous, so one set serves all lines.
const scratchOrders: FloatOrder[] = [];
const scratchLanded: number[] = [];
/** Per candidate: DROP (safely above the minimum), FLOAT (kept, its float order is exact), EXACT (kept, floats failed). */
const scratchState: number[] = [];
const DROP = 0;
const FLOAT = 1;
const EXACT = 2;

/**
 * The cheapest candidate as the quote board ranks it (lowest board landed cost, then
 * `compareQuotes`' ties). Ranked in floats; every candidate the floats cannot safely put
 * above the float minimum (ties, near-ties, values a float cannot hold) is priced in
 * decimal.js and compared exactly, so the choice is the exact one. When the floats settle
 * it, only the winner's order is computed in decimal.js.
 */
function cheapest(cands: Candidate[], required: number, duty: DutyMatch, factors: LandedFactors): Chosen | undefined {
  const n = cands.length;
  if (n === 0) return undefined;
  const settled = settle(cands, required);
  if (settled >= 0) {
    const c = cands[settled];
    const o = scratchOrders[settled];
    return { pq: c.slot, order: spendAt(c.slot.terms, o.tier, o.qty), fx: c.fx };
  }
  let best: PricedQuote | undefined;
  for (let k = 0; k < n; k++) {
    if (scratchState[k] === DROP) continue;
    const c = cands[k];
    const o = scratchOrders[k];
    const order = scratchState[k] === FLOAT ? spendAt(c.slot.terms, o.tier, o.qty) : orderSpend(c.slot.terms, required);
    const priced = priceQuote(c.slot, required, c.fx, duty, factors, order);
    if (!best || compareQuotes(priced, best) < 0) best = priced;
  }
  return best;
}

/**
 * Ranks the candidates in floats. Returns the winner's index when the floats settle it
 * (its order is in `scratchOrders`), else -1 with `scratchState` naming the candidates
 * that must be compared exactly.
 */
function settle(cands: Candidate[], required: number): number {
  const n = cands.length;
  while (scratchOrders.length < n) scratchOrders.push({ qty: 0, tier: 0, spend: 0 });
  let min = Number.POSITIVE_INFINITY;
  let minK = -1;
  for (let k = 0; k < n; k++) {
    const c = cands[k];
    const o = scratchOrders[k];
    const landed = orderSpendFloat(c.slot.terms, required, o) ? o.spend * c.multiplierF : Number.NaN;
    scratchLanded[k] = landed;
    scratchState[k] = Number.isFinite(landed) ? FLOAT : EXACT;
    if (scratchState[k] === FLOAT && (minK < 0 || landed < min)) {
      min = landed;
      minK = k;
    }
  }
  let kept = 0;
  let last = -1;
  for (let k = 0; k < n; k++) {
    // Only a float-safe candidate clearly above a float-safe minimum can be dropped.
    if (minK >= 0 && k !== minK && scratchState[k] === FLOAT && floatsApart(scratchLanded[k], min)) scratchState[k] = DROP;
    else {
      kept++;
      last = k;
    }
  }
  return kept === 1 && scratchState[last] === FLOAT ? last : -1;
}

/** The reference ranking: every eligible quote priced and compared in decimal.js (for tests). */
function cheapestExact(p: PreparedCostRoll, part: Part, required: number, duty: DutyMatch): { best?: PricedQuote; fxMissing?: string } {
  let best: PricedQuote | undefined;
  let fxMissing: string | undefined;
  for (const slot of p.quotesByPart.get(part.id) ?? []) {
    if (slot.reasons.length > 0) continue;
    const rate = p.toReporting(slot.quote.currency);
    if (!rate.ok) {
      fxMissing ??= fxDetail(rate.from, rate.to, p.date);
      continue;
    }
    const priced = priceQuote(slot, required, rate, duty, p.factors);
    if (!best || compareQuotes(priced, best) < 0) best = priced;
  }
  return { best, fxMissing };
}

function costPartLine(p: PreparedCostRoll, w: Work, buildQty: number, N: Dec, reference: boolean): Work {
  const { pl } = w;
  const rank = pl.rank;
  if (!rank) return leaveOut(w, 'no_part', pl.line.partId ?? undefined);
  const { part, duty } = rank;
  w.category = part.category;
  const required = reference
    ? toCount(requiredQty(pl.qtyPerUnit, N, rank.attrition), `lines.${pl.index}.requiredQty`)
    : lineRequired(pl, rank, buildQty, N);
  w.required = required;
  w.duty = duty;

  let best: Chosen | undefined;
  let fxMissing: string | undefined;
  if (reference) ({ best, fxMissing } = cheapestExact(p, part, required, duty));
  else {
    best = cheapest(rank.candidates, required, duty, p.factors);
    fxMissing = rank.fxMissing;
  }

  let chosen = best;
  const pinnedId = pl.line.pinnedQuoteId;
  if (pinnedId) {
    const slot = p.quotesById.get(pinnedId);
    if (!slot || slot.quote.partId !== part.id) {
      w.warnings.push({ code: 'pinned_not_found', detail: pinnedId });
    } else {
      const rate = p.toReporting(slot.quote.currency);
      if (!rate.ok) return leaveOut(w, 'missing_fx', fxDetail(rate.from, rate.to, p.date));
      const pinned = priceQuote(slot, required, rate, duty, p.factors);
      for (const r of slot.reasons) {
        const code = PINNED_WARNING[r];
        if (code) w.warnings.push({ code });
      }
      const noLongerValid = slot.reasons.includes('expired') || slot.reasons.includes('not_yet_valid');
      if (!noLongerValid && best && best.pq !== slot) {
        const bestLanded = 'boardLanded' in best
          ? (best as PricedQuote).boardLanded
          : priceQuote(best.pq, required, best.fx, duty, p.factors, best.order).boardLanded;
        if (bestLanded.lt(pinned.boardLanded)) w.warnings.push({ code: 'pinned_not_cheapest', detail: best.pq.quote.id });
      }
      chosen = pinned;
    }
  }

  if (!chosen) return fxMissing ? leaveOut(w, 'missing_fx', fxMissing) : leaveOut(w, 'no_quote');
  w.chosen = chosen;
  w.goods = chosen.fx.route === 'same' ? chosen.order.goodsValue : chosen.order.goodsValue.times(chosen.fx.rate);
  w.fxRows = chosen.fx.rows;

  if (p.byWeight && needsAdder(chosen.pq.incoterm, 'freight')) {
    if (part.unitWeightG === null || part.unitWeightG === undefined || part.unitWeightG === '') {
      return leaveOut(w, 'missing_weight', part.id);
    }
    pl.unitWeight ??= dec(part.unitWeightG, `parts.${part.id}.unitWeightG`);
    w.weight = pl.unitWeight.times(chosen.order.orderQty);
  }

  if (p.assemblyRates.ok) {
    const a = (pl.assembly ??= lineAssembly(p.assemblyRates, pl.qtyPerUnit, part));
    w.assemblyPerUnit = a.perUnit;
    if (a.missingPins) w.warnings.push({ code: 'missing_pins', detail: part.id });
  }
  return w;
}

function lineAssembly(r: { smt: Dec; tht: Dec; hand: Dec }, q: Dec, part: Part): { perUnit: Dec; missingPins: boolean } {
  if (part.mount === 'smt') return { perUnit: q.times(r.smt), missingPins: false };
  if (part.mount === 'hand') return { perUnit: q.times(r.hand), missingPins: false };
  if (part.mount === 'tht') {
    if (part.pins === null || part.pins === undefined) return { perUnit: ZERO, missingPins: !r.tht.isZero() };
    return { perUnit: q.times(dec(part.pins, `parts.${part.id}.pins`)).times(r.tht), missingPins: false };
  }
  return { perUnit: ZERO, missingPins: false };
}

interface Sums<T = Dec> {
  goods: T;
  excessValue: T;
  origin: T;
  freight: T;
  insurance: T;
  duty: T;
  fees: T;
  destination: T;
  assembly: T;
  landed: T;
  count: number;
}

const emptySums = (): Sums => ({
  goods: ZERO,
  excessValue: ZERO,
  origin: ZERO,
  freight: ZERO,
  insurance: ZERO,
  duty: ZERO,
  fees: ZERO,
  destination: ZERO,
  assembly: ZERO,
  landed: ZERO,
  count: 0,
});

// Zero terms are common (adders an Incoterm does not need); skipping them saves allocations.
const add = <T extends Amount<T>>(a: T, b: T): T => (b.isZero() ? a : a.plus(b));

/** A line's or a group's charges into its category's sums (decimal.js or `Dec40`). */
function addCharges<T extends Amount<T>>(s: Sums<T>, part: { goods: T; excessValue: T; adders: LineAdders<T> } | undefined, assembly: T, landed: T, count: number): void {
  if (part) {
    const a = part.adders;
    s.goods = add(s.goods, part.goods);
    s.excessValue = add(s.excessValue, part.excessValue);
    s.origin = add(s.origin, a.origin);
    s.freight = add(s.freight, a.freight);
    s.insurance = add(s.insurance, a.insurance);
    s.duty = add(s.duty, a.duty);
    s.fees = add(s.fees, a.fees);
    s.destination = add(s.destination, a.destination);
  }
  s.assembly = add(s.assembly, assembly);
  s.landed = add(s.landed, landed);
  s.count += count;
}

function addLine(s: Sums, w: Work): void {
  addCharges(s, w.adders && { goods: w.goods!, excessValue: w.excessValue!, adders: w.adders }, w.assembly, w.landed, 1);
}

function addSupplier<T extends Amount<T>>(bySupplier: Map<string, SupplierSums<T>>, zero: T, supplierId: string, goods: T, excessValue: T, landed: T, count: number): void {
  let s = bySupplier.get(supplierId);
  if (!s) bySupplier.set(supplierId, (s = { goods: zero, excessValue: zero, landed: zero, count: 0 }));
  s.goods = add(s.goods, goods);
  s.excessValue = add(s.excessValue, excessValue);
  s.landed = add(s.landed, landed);
  s.count += count;
}

function addSums(into: Sums, s: Sums): void {
  for (const k of ['goods', 'excessValue', 'origin', 'freight', 'insurance', 'duty', 'fees', 'destination', 'assembly', 'landed'] as const) {
    into[k] = add(into[k], s[k]);
  }
  into.count += s.count;
}

/** What sharing the per-shipment pools needs of a line (reference roll) or a group of lines (grouped roll). */
interface PoolCarrier {
  incoterm: Incoterm;
  goods: Dec;
  /** Freight-carrying weight (freight by weight only). */
  weight: Dec;
  /** Lines it stands for: an equal share is per line. */
  count: number;
}

/**
 * How a per-build pool is shared: per unit of a key (goods value or weight) or, when the
 * keys sum to 0, equally per line, so the pool is never dropped silently.
 */
type PoolRule = { key: 'goods' | 'weight'; perKey: Dec } | { key: 'line'; each: Dec };

/**
 * The rule for sharing a pool over the carriers in proportion to a key, or null when there
 * is nothing to share. A zero weight total falls back to goods value, then to equal shares.
 */
function poolRule<T>(pool: Dec, carriers: T[], view: (c: T) => PoolCarrier, byWeight: boolean, warnings: RollWarning[]): PoolRule | null {
  if (pool.isZero() || carriers.length === 0) return null;
  const total = (key: 'goods' | 'weight') => carriers.reduce((t, c) => t.plus(view(c)[key]), ZERO);
  let key: 'goods' | 'weight' = byWeight ? 'weight' : 'goods';
  let sum = total(key);
  if (sum.isZero() && byWeight) {
    warnings.push({ code: 'freight_weight_zero' });
    key = 'goods';
    sum = total(key);
  }
  // One division for the pool, one multiplication per carrier.
  if (!sum.isZero()) return { key, perKey: pool.div(sum) };
  return { key: 'line', each: pool.div(carriers.reduce((n, c) => n + view(c).count, 0)) };
}

/** A carrier's share of a pool, or undefined when its Incoterm does not carry the adder. */
function shareOf(rule: PoolRule | null, adder: 'freight' | 'fees', c: PoolCarrier): Dec | undefined {
  if (!rule || !needsAdder(c.incoterm, adder)) return undefined;
  if (rule.key === 'line') return c.count === 1 ? rule.each : rule.each.times(c.count);
  return c[rule.key].times(rule.perKey);
}

/**
 * The per-shipment freight and fees rules over the carriers whose Incoterm carries them,
 * the warnings when nothing carries them, and the FX rows of the pools and assembly rates.
 */
function shareBuildPools<T>(p: PreparedCostRoll, items: T[], view: (c: T) => PoolCarrier, warnings: RollWarning[]) {
  const freightCarriers = items.filter((c) => needsAdder(view(c).incoterm, 'freight'));
  const feeCarriers = items.filter((c) => needsAdder(view(c).incoterm, 'fees'));
  const freight = p.freightPool.ok ? poolRule(p.freightPool.value, freightCarriers, view, p.byWeight, warnings) : null;
  const fees = p.feesPool.ok ? poolRule(p.feesPool.value, feeCarriers, view, false, warnings) : null;
  if (p.freightPool.ok && !p.freightPool.value.isZero() && freightCarriers.length === 0) {
    warnings.push({ code: 'freight_unallocated', detail: 'no chosen quote has an Incoterm that carries freight' });
  }
  if (p.feesPool.ok && !p.feesPool.value.isZero() && feeCarriers.length === 0) {
    warnings.push({ code: 'fees_unallocated', detail: 'no chosen quote has an Incoterm that carries fees' });
  }
  // Rows come from cached lookups, so the same few objects recur on every line.
  const fxSeen = new Set<FxRateUsed>();
  if (p.freightPool.ok && freight) for (const r of p.freightPool.rows) fxSeen.add(r);
  if (p.feesPool.ok && fees) for (const r of p.feesPool.rows) fxSeen.add(r);
  if (p.assemblyRates.ok) for (const r of p.assemblyRates.rows) fxSeen.add(r);
  return { freight, fees, fxSeen };
}

export interface RollOptions {
  /** Leave out the per-line output (the volume curve needs totals only). */
  lines?: boolean;
  /**
   * Price and compare every eligible quote in decimal.js, and R too, instead of ranking in
   * floats first. Slow; the tests' reference for the float ranking, which must agree with it.
   */
  exactRanking?: boolean;
}

/**
 * The cost roll at build quantity N on prepared data. First pass: each part line gets its
 * cheapest eligible quote as the quote board ranks it (or its pin), cost lines are
 * converted; lines that cannot be costed are left out and named. Second pass: per-shipment
 * freight and fees are shared over the chosen quotes whose Incoterm carries them (freight
 * by goods value or by weight, fees by goods value), then insurance and duty are computed
 * with those shares in. Nothing is rounded.
 *
 * With its lines, the roll runs line by line with integer lines and sums in `Dec40`
 * (`rollLines`: the reference's figures exactly); totals only, grouped (`rollGrouped`, or
 * line by line when amounts are too large for that, see `EXACT_RANGE`); with
 * `exactRanking` line by line in decimal.js, every quote priced exactly: the tests'
 * reference.
 */
export function rollPrepared(p: PreparedCostRoll, buildQty: number, options: RollOptions = {}): CostRollResult {
  const N = dec(buildQty, 'qty');
  if (!N.isInteger() || N.lt(1)) throw new CostingInputError(`must be a whole number ≥ 1 (${buildQty})`, 'qty');
  const amortiseOver = p.amortisationQty ?? N;
  const wantLines = options.lines !== false;
  const reference = options.exactRanking === true;
  if (reference) return rollLineByLine(p, buildQty, N, amortiseOver, wantLines, true);
  if (wantLines) return rollLines(p, buildQty, N, amortiseOver);
  return rollGrouped(p, buildQty, N, amortiseOver) ?? rollLineByLine(p, buildQty, N, amortiseOver, false, false);
}

const newWork = (pl: PreparedLine): Work => ({ pl, status: 'costed', warnings: [], category: pl.line.kind, assemblyPerUnit: ZERO, fxRows: [], assembly: ZERO, landed: ZERO });

/** A costed part line as a carrier of the per-shipment pools. */
const carrierOf = (w: Work): PoolCarrier => ({ incoterm: w.chosen!.pq.incoterm, goods: w.goods!, weight: w.weight ?? ZERO, count: 1 });

/** The roll line by line in decimal.js: each line's adders, then sums in line-id order. */
function rollLineByLine(p: PreparedCostRoll, buildQty: number, N: Dec, amortiseOver: Dec, wantLines: boolean, reference: boolean): CostRollResult {
  const warnings: RollWarning[] = [...p.staticWarnings];
  const work: Work[] = p.lines.map((pl) => {
    const w = newWork(pl);
    if (pl.line.dnp) {
      w.status = 'dnp';
      return w;
    }
    return pl.line.kind === 'part' ? costPartLine(p, w, buildQty, N, reference) : costCostLine(p, w);
  });

  const partLines = work.filter((w) => w.status === 'costed' && w.chosen);
  const { freight: freightRule, fees: feesRule, fxSeen } = shareBuildPools(p, partLines, carrierOf, warnings);

  let costLinesPerUnit = ZERO;
  let oneTimeTotal = ZERO;
  const byCategory = new Map<string, Sums>();
  const bySupplier = new Map<string, SupplierSums>();
  const noteFx = (rows: FxRateUsed[]) => {
    for (const r of rows) fxSeen.add(r);
  };

  for (const w of work) {
    if (w.status !== 'costed') continue;
    noteFx(w.fxRows);
    if (w.chosen) {
      lineExcess(w);
      lineCharges(p, w, N, carrierOf(w), freightRule, feesRule);
      addSupplier(bySupplier, ZERO, w.chosen.pq.quote.supplierId, w.goods!, w.excessValue!, w.landed, 1);
    } else {
      costLineCharges(w, N, amortiseOver);
      costLinesPerUnit = add(costLinesPerUnit, w.costPerUnit ?? ZERO);
      oneTimeTotal = add(oneTimeTotal, w.oneTimeCost ?? ZERO);
    }
    let c = byCategory.get(w.category);
    if (!c) byCategory.set(w.category, (c = emptySums()));
    addLine(c, w);
  }

  const lines: CostRollLine[] = wantLines ? [...work].sort((a, b) => a.pl.index - b.pl.index).map((w) => workOutput(w, N)) : [];
  return rollResult(p, N, amortiseOver, {
    warnings, byCategory, bySupplier, costLinesPerUnit, oneTimeTotal, fxSeen, lines,
    leftOut: work.filter((w) => w.status === 'left_out'),
    dnp: work.filter((w) => w.status === 'dnp'),
    lineWarningCount: work.reduce((n, w) => n + w.warnings.length, 0),
  });
}

/** E = Q − R and its value in the reporting currency, for a line with a chosen quote. */
function lineExcess(w: Work): void {
  const c = w.chosen!;
  w.excessQty = c.order.orderQty - w.required!;
  const excessInQuote = c.order.unitPrice.times(w.excessQty);
  w.excessValue = c.fx.route === 'same' ? excessInQuote : excessInQuote.times(c.fx.rate);
}

/** A part line's shares, adders, assembly and landed cost, once the pools' rules are known. */
function lineCharges(p: PreparedCostRoll, w: Work, N: Dec, view: PoolCarrier, freightRule: PoolRule | null, feesRule: PoolRule | null): void {
  w.freightShare = shareOf(freightRule, 'freight', view);
  w.adders = lineAdders({
    goods: w.goods!,
    incoterm: w.chosen!.pq.incoterm,
    pct: p.profile.pct,
    dutyBasis: p.profile.dutyBasis,
    dutyRate: w.duty!.rate,
    freightShare: w.freightShare,
    feesShare: shareOf(feesRule, 'fees', view),
  });
  w.assembly = w.assemblyPerUnit.isZero() ? ZERO : w.assemblyPerUnit.times(N);
  w.landed = add(w.adders.landed, w.assembly);
}

/** A cost line's charge to this build: per-unit cost × N plus one-time cost × N / amortisation quantity. */
function costLineCharges(w: Work, N: Dec, amortiseOver: Dec): void {
  w.landed = (w.costPerUnit ?? ZERO).times(N).plus((w.oneTimeCost ?? ZERO).times(N).div(amortiseOver));
}

interface RollParts {
  warnings: RollWarning[];
  byCategory: Map<string, Sums>;
  bySupplier: Map<string, SupplierSums>;
  costLinesPerUnit: Dec;
  oneTimeTotal: Dec;
  fxSeen: Set<FxRateUsed>;
  lines: CostRollLine[];
  leftOut: Work[];
  dnp: Work[];
  lineWarningCount: number;
}

interface SupplierSums<T = Dec> {
  goods: T;
  excessValue: T;
  landed: T;
  count: number;
}

/** The result from the category and supplier sums: totals, breakdowns, left-out lines. */
function rollResult(p: PreparedCostRoll, N: Dec, amortiseOver: Dec, r: RollParts): CostRollResult {
  const { warnings, byCategory, bySupplier, costLinesPerUnit, oneTimeTotal, lines } = r;
  // Totals from the category sums, in category order: the same figures, fewer additions.
  const categoryKeys = [...byCategory.keys()].sort();
  const total = emptySums();
  for (const k of categoryKeys) addSums(total, byCategory.get(k)!);
  const oneTimePerUnit = oneTimeTotal.div(amortiseOver);
  // Every line's landed charge: goods, adders and assembly of part lines, per-unit cost lines
  // × N and one-time costs' share of this build (N / amortisation quantity).
  const landedTotal = total.landed;
  const landedPerUnit = landedTotal.div(N);
  const leftOutLines = r.leftOut
    .sort((a, b) => a.pl.index - b.pl.index)
    .map((w) => ({
      lineId: w.pl.line.id,
      refDes: w.pl.line.refDes ?? null,
      reason: w.leftOut!.reason,
      ...(w.leftOut!.detail ? { detail: w.leftOut!.detail } : {}),
    }));
  if (leftOutLines.length > 0) warnings.push({ code: 'lines_left_out', detail: String(leftOutLines.length) });
  const dnpIds = r.dnp.sort((a, b) => a.pl.index - b.pl.index).map((w) => w.pl.line.id);

  const perUnit = (v: Dec) => perUnitText(v.div(N));
  const categoryRows: CategoryTotal[] = categoryKeys
    .map((category) => [category, byCategory.get(category)!] as const)
    .map(([category, s]) => ({
      category,
      lineCount: s.count,
      goods: moneyText(s.goods),
      excessValue: moneyText(s.excessValue),
      adders: moneyText(s.origin.plus(s.freight).plus(s.insurance).plus(s.duty).plus(s.fees).plus(s.destination)),
      assembly: moneyText(s.assembly),
      landed: moneyText(s.landed),
      landedPerUnit: perUnit(s.landed),
    }));
  const supplierRows: SupplierTotal[] = [...bySupplier.entries()]
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([supplierId, s]) => ({
      supplierId,
      lineCount: s.count,
      goods: moneyText(s.goods),
      excessValue: moneyText(s.excessValue),
      landed: moneyText(s.landed),
      landedPerUnit: perUnit(s.landed),
    }));

  return {
    qty: N.toNumber(),
    date: p.date,
    currency: p.currency,
    lines,
    totals: {
      goods: moneyText(total.goods),
      excessValue: moneyText(total.excessValue),
      origin: moneyText(total.origin),
      freight: moneyText(total.freight),
      insurance: moneyText(total.insurance),
      duty: moneyText(total.duty),
      fees: moneyText(total.fees),
      destination: moneyText(total.destination),
      assembly: moneyText(total.assembly),
      assemblyPerUnit: perUnitText(total.assembly.div(N)),
      costLinesPerUnit: perUnitText(costLinesPerUnit),
      oneTimeTotal: moneyText(oneTimeTotal),
      oneTimePerUnit: perUnitText(oneTimePerUnit),
      landedTotal: moneyText(landedTotal),
      landedPerUnit: perUnitText(landedPerUnit),
      landedPerUnitExclOneTime: perUnitText(landedPerUnit.minus(oneTimePerUnit)),
      targetUnitCost: p.targetUnitCost === null ? null : perUnitText(p.targetUnitCost),
      gapToTarget: p.targetUnitCost === null ? null : perUnitText(landedPerUnit.minus(p.targetUnitCost)),
    },
    byCategory: categoryRows,
    bySupplier: supplierRows,
    warnings,
    leftOut: { count: leftOutLines.length, lines: leftOutLines },
    dnp: { count: dnpIds.length, lineIds: dnpIds },
    lineWarningCount: r.lineWarningCount,
    fxRates: usedRates(r.fxSeen),
  };
}

// ---------------------------------------------------------------------------------------
// Integer lines: totals only in groups (the volume curve), the full roll in Dec40

/**
 * Part lines whose chosen quotes share category, duty rate, supplier, Incoterm and
 * currency. Every adder is linear in the goods value and the per-shipment shares
 * (`lineAdders`), and shares are proportional to goods value or weight, so a group's adders
 * are the sum of its lines' adders. Goods and excess are summed as exact integers
 * (millionths of the quote's currency) and converted once per group: the totals cost
 * integer work per line and decimal work per group, not per line.
 */
interface Group {
  category: string;
  duty: DutyMatch;
  supplierId: string;
  incoterm: Incoterm;
  fx: FxFound;
  count: number;
  goodsMicro: number;
  excessMicro: number;
  /** What no longer fits a safe integer, in millionths. */
  goodsBig: bigint;
  excessBig: bigint;
  /** Goods and excess of lines priced in decimal.js, already in the reporting currency. */
  goodsDec: Dec;
  excessDec: Dec;
  weight: Dec;
  assemblyPerUnit: Dec;
  goods: Dec;
}

/** A part line settled in integers (see `integerLine`). */
interface IntegerLine {
  pl: PreparedLine;
  rank: LineRank;
  cand: Candidate;
  required: number;
  orderQty: number;
  /** Unit price, goods Q × price and excess E × price, in millionths of the quote's currency. */
  priceMicro: number;
  goodsMicro: number;
  excessMicro: number;
  assemblyPerUnit: Dec;
  missingPins: boolean;
}

function groupKey(category: string, dutyPct: string, supplierId: string, incoterm: string, currency: string): string {
  return `${category}\u0001${dutyPct}\u0001${supplierId}\u0001${incoterm}\u0001${currency}`;
}

const MICRO = new Dec(1_000_000);

function micros(small: number, big: bigint): Dec {
  return (big === 0n ? new Dec(small) : new Dec((BigInt(small) + big).toString())).div(MICRO);
}

/**
 * A part line settled in integers — no pin, a choice the floats settle, a price in whole
 * millionths, goods and excess below 2^53 millionths, freight not shared by weight (the
 * common case) — or null when it needs decimal.js.
 */
function integerLine(p: PreparedCostRoll, pl: PreparedLine, buildQty: number, N: Dec): IntegerLine | null {
  const rank = pl.rank;
  if (!rank || pl.line.kind !== 'part' || pl.line.pinnedQuoteId || p.byWeight || rank.candidates.length === 0) return null;
  const required = lineRequired(pl, rank, buildQty, N);
  const k = settle(rank.candidates, required);
  if (k < 0) return null;
  const cand = rank.candidates[k];
  const o = scratchOrders[k];
  const price = microPrices(cand.slot.terms)[o.tier];
  const goods = o.qty * price;
  const excess = (o.qty - required) * price;
  if (!Number.isSafeInteger(goods) || !Number.isSafeInteger(excess)) return null;
  let assemblyPerUnit = ZERO;
  let missingPins = false;
  if (p.assemblyRates.ok) {
    const a = (pl.assembly ??= lineAssembly(p.assemblyRates, pl.qtyPerUnit, rank.part));
    assemblyPerUnit = a.perUnit;
    missingPins = a.missingPins;
  }
  return { pl, rank, cand, required, orderQty: o.qty, priceMicro: price, goodsMicro: goods, excessMicro: excess, assemblyPerUnit, missingPins };
}

/**
 * Grouping changes the order in which amounts are added, and decimal.js rounds each sum to
 * 40 significant digits. Below 10^20 that rounding sits at 10^-20 or finer, far below the
 * 10 decimals printed, so both orders print the same, or one unit apart in the last place
 * when a figure lies at a rounding half-way point (a repeating cross rate times round
 * quantities can get there); at or above it (only absurd prices or quantities get there)
 * the rounding reaches the printed places, so such a totals-only roll is rolled line by line.
 */
const EXACT_RANGE = new Dec('1e20');
const withinExactRange = (amount: Dec) => amount.abs().lt(EXACT_RANGE);

/**
 * The totals-only roll by groups (`Group`): integer lines are summed as integers; every
 * other line is costed in decimal.js as the reference roll does and joins its group. Null
 * when an amount is beyond `EXACT_RANGE` (the caller then rolls line by line).
 */
function rollGrouped(p: PreparedCostRoll, buildQty: number, N: Dec, amortiseOver: Dec): CostRollResult | null {
  const warnings: RollWarning[] = [...p.staticWarnings];
  const groups = new Map<string, Group>();
  const groupFor = (key: string, category: string, duty: DutyMatch, pq: PreparedQuote, fx: FxFound): Group => {
    let g = groups.get(key);
    if (!g) {
      g = {
        category, duty, supplierId: pq.quote.supplierId, incoterm: pq.incoterm, fx, count: 0,
        goodsMicro: 0, excessMicro: 0, goodsBig: 0n, excessBig: 0n,
        goodsDec: ZERO, excessDec: ZERO, weight: ZERO, assemblyPerUnit: ZERO, goods: ZERO,
      };
      groups.set(key, g);
    }
    return g;
  };
  const costWork: Work[] = [];
  const leftOut: Work[] = [];
  const dnp: Work[] = [];
  // Lines in the integer path can only carry missing_pins; the others carry their own list.
  let lineWarningCount = 0;
  for (const pl of p.lines) {
    if (pl.line.dnp) {
      const w = newWork(pl);
      w.status = 'dnp';
      dnp.push(w);
      continue;
    }
    if (pl.line.kind !== 'part') {
      const w = costCostLine(p, newWork(pl));
      lineWarningCount += w.warnings.length;
      (w.status === 'left_out' ? leftOut : costWork).push(w);
      continue;
    }
    const il = integerLine(p, pl, buildQty, N);
    if (il) {
      const g = groupFor(il.cand.groupKey, il.rank.part.category, il.rank.duty, il.cand.slot, il.cand.fx);
      g.count += 1;
      const gm = g.goodsMicro + il.goodsMicro;
      if (Number.isSafeInteger(gm)) g.goodsMicro = gm;
      else g.goodsBig += BigInt(il.goodsMicro);
      const em = g.excessMicro + il.excessMicro;
      if (Number.isSafeInteger(em)) g.excessMicro = em;
      else g.excessBig += BigInt(il.excessMicro);
      g.assemblyPerUnit = add(g.assemblyPerUnit, il.assemblyPerUnit);
      if (il.missingPins) lineWarningCount += 1;
      continue;
    }
    // Everything else line by line in decimal.js, as the reference roll does, then into its group.
    const w = costPartLine(p, newWork(pl), buildQty, N, false);
    lineWarningCount += w.warnings.length;
    if (w.status === 'left_out' || !w.chosen) {
      leftOut.push(w);
      continue;
    }
    const ch = w.chosen;
    lineExcess(w);
    const g = groupFor(groupKey(w.category, w.duty!.ratePct.toString(), ch.pq.quote.supplierId, ch.pq.incoterm, ch.pq.quote.currency), w.category, w.duty!, ch.pq, ch.fx);
    g.count += 1;
    g.goodsDec = add(g.goodsDec, w.goods!);
    g.excessDec = add(g.excessDec, w.excessValue!);
    if (w.weight) g.weight = add(g.weight, w.weight);
    g.assemblyPerUnit = add(g.assemblyPerUnit, w.assemblyPerUnit);
  }

  const all = [...groups.values()];
  for (const g of all) {
    const inQuote = micros(g.goodsMicro, g.goodsBig);
    g.goods = add(g.fx.route === 'same' ? inQuote : inQuote.times(g.fx.rate), g.goodsDec);
  }
  const { freight: freightRule, fees: feesRule, fxSeen } = shareBuildPools(p, all, (g) => g, warnings);

  let costLinesPerUnit = ZERO;
  let oneTimeTotal = ZERO;
  const byCategory = new Map<string, Sums>();
  const bySupplier = new Map<string, SupplierSums>();
  const noteFx = (rows: FxRateUsed[]) => {
    for (const r of rows) fxSeen.add(r);
  };
  const categorySums = (category: string) => {
    let c = byCategory.get(category);
    if (!c) byCategory.set(category, (c = emptySums()));
    return c;
  };

  for (const g of all) {
    noteFx(g.fx.rows);
    const a = lineAdders({
      goods: g.goods,
      incoterm: g.incoterm,
      pct: p.profile.pct,
      dutyBasis: p.profile.dutyBasis,
      dutyRate: g.duty.rate,
      freightShare: shareOf(freightRule, 'freight', g),
      feesShare: shareOf(feesRule, 'fees', g),
    });
    const assembly = g.assemblyPerUnit.isZero() ? ZERO : g.assemblyPerUnit.times(N);
    const landed = add(a.landed, assembly);
    if (!withinExactRange(landed)) return null;
    const inQuote = micros(g.excessMicro, g.excessBig);
    const excessValue = add(g.fx.route === 'same' ? inQuote : inQuote.times(g.fx.rate), g.excessDec);
    addCharges(categorySums(g.category), { goods: g.goods, excessValue, adders: a }, assembly, landed, g.count);
    addSupplier(bySupplier, ZERO, g.supplierId, g.goods, excessValue, landed, g.count);
  }
  for (const w of costWork) {
    noteFx(w.fxRows);
    costLineCharges(w, N, amortiseOver);
    if (!withinExactRange(w.landed)) return null;
    costLinesPerUnit = add(costLinesPerUnit, w.costPerUnit ?? ZERO);
    oneTimeTotal = add(oneTimeTotal, w.oneTimeCost ?? ZERO);
    addLine(categorySums(w.category), w);
  }

  return rollResult(p, N, amortiseOver, { warnings, byCategory, bySupplier, costLinesPerUnit, oneTimeTotal, fxSeen, lines: [], leftOut, dnp, lineWarningCount });
}

/** Category sums kept in `Dec40`, added in line order as the reference roll adds them. */
type Sums40 = Sums<Dec40>;

const emptySums40 = (): Sums40 => ({
  goods: Dec40.ZERO, excessValue: Dec40.ZERO, origin: Dec40.ZERO, freight: Dec40.ZERO, insurance: Dec40.ZERO,
  duty: Dec40.ZERO, fees: Dec40.ZERO, destination: Dec40.ZERO, assembly: Dec40.ZERO, landed: Dec40.ZERO, count: 0,
});

/** An exact `Dec40` value as an engine decimal (decimal.js takes every digit it is given). */
const decOf = (x: Dec40) => new Dec(x.toFixed(x.places));

/**
 * The cost roll with its lines: the reference roll's operations in the reference roll's
 * order, line by line, but each integer line (`integerLine`) and every sum in `Dec40` —
 * decimal.js's arithmetic on BigInts — so the result is the reference's digit for digit at
 * a fraction of the cost. Lines that need decimal.js are costed as the reference costs them.
 */
function rollLines(p: PreparedCostRoll, buildQty: number, N: Dec, amortiseOver: Dec): CostRollResult {
  const warnings: RollWarning[] = [...p.staticWarnings];
  const n = BigInt(N.toFixed());
  const Nx = Dec40.of(N);
  const { pct } = p.profile;
  const pctX: Required<PercentAdders<Dec40>> = {
    origin: Dec40.of(pct.origin), freight: Dec40.of(pct.freight), insurance: Dec40.of(pct.insurance), destination: Dec40.of(pct.destination),
    insured: Dec40.of(pct.insured ?? pct.insurance.times(INSURED_SHARE)),
  };
  const cache = new Map<Dec, Dec40>();
  const ex = (d: Dec) => {
    let x = cache.get(d);
    if (!x) cache.set(d, (x = Dec40.of(d)));
    return x;
  };
  const print: Printer<Dec40> = { money: (v) => v.toFixed(MONEY_DP), perUnit: (v) => v.toFixed(PER_UNIT_DP), perBuildUnit: (v) => v.divToFixed(n, PER_UNIT_DP) };

  // First pass, in line-id order: integer lines with their goods in Dec40, the rest as the reference costs them.
  type Entry = { int: IntegerLine; goods: Dec40; goodsDec: Dec } | { w: Work };
  const entries: Entry[] = p.lines.map((pl) => {
    if (pl.line.dnp) {
      const w = newWork(pl);
      w.status = 'dnp';
      return { w };
    }
    if (pl.line.kind !== 'part') return { w: costCostLine(p, newWork(pl)) };
    const il = integerLine(p, pl, buildQty, N);
    if (!il) return { w: costPartLine(p, newWork(pl), buildQty, N, false) };
    const inQuote = Dec40.micros(il.goodsMicro);
    const goods = il.cand.fx.route === 'same' ? inQuote : inQuote.times(ex(il.cand.fx.rate));
    return { int: il, goods, goodsDec: decOf(goods) };
  });

  const carriers: { entry: Entry; view: PoolCarrier }[] = [];
  for (const e of entries) {
    if ('int' in e) carriers.push({ entry: e, view: { incoterm: e.int.cand.slot.incoterm, goods: e.goodsDec, weight: ZERO, count: 1 } });
    else if (e.w.status === 'costed' && e.w.chosen) carriers.push({ entry: e, view: carrierOf(e.w) });
  }
  const { freight: freightRule, fees: feesRule, fxSeen } = shareBuildPools(p, carriers, (c) => c.view, warnings);
  const share = (rule: PoolRule | null, adder: 'freight' | 'fees', view: PoolCarrier, goods: Dec40): Dec40 | undefined => {
    if (!rule || !needsAdder(view.incoterm, adder)) return undefined;
    // The reference multiplies its goods (the same value) by the same rule: one decimal.js product.
    if (rule.key === 'line') return ex(rule.each);
    if (rule.key === 'weight') throw new Error('freight by weight is costed line by line in decimal.js');
    return goods.times(ex(rule.perKey));
  };

  let costLinesPerUnit = ZERO;
  let oneTimeTotal = ZERO;
  const byCategory = new Map<string, Sums40>();
  const bySupplier = new Map<string, SupplierSums<Dec40>>();
  const sumsOf = (category: string) => {
    let c = byCategory.get(category);
    if (!c) byCategory.set(category, (c = emptySums40()));
    return c;
  };
  const lines = new Array<CostRollLine>(p.lines.length);
  const leftOut: Work[] = [];
  const dnp: Work[] = [];
  let lineWarningCount = 0;
  for (const e of entries) {
    if ('int' in e) {
      const { int: l, goods } = e;
      const { cand, rank } = l;
      const rate = ex(cand.fx.rate);
      const same = cand.fx.route === 'same';
      const incoterm = cand.slot.incoterm;
      const view: PoolCarrier = { incoterm, goods: e.goodsDec, weight: ZERO, count: 1 };
      const freightShare = share(freightRule, 'freight', view, goods);
      const adders = lineAdders<Dec40>(
        { goods, incoterm, pct: pctX, dutyBasis: p.profile.dutyBasis, dutyRate: ex(rank.duty.rate), freightShare, feesShare: share(feesRule, 'fees', view, goods) },
        Dec40.ZERO,
      );
      const assembly = l.assemblyPerUnit.isZero() ? Dec40.ZERO : ex(l.assemblyPerUnit).times(Nx);
      const landed = adders.landed.plus(assembly);
      const excessInQuote = Dec40.micros(l.excessMicro);
      const excessValue = same ? excessInQuote : excessInQuote.times(rate);
      for (const r of cand.fx.rows) fxSeen.add(r);
      addSupplier(bySupplier, Dec40.ZERO, cand.slot.quote.supplierId, goods, excessValue, landed, 1);
      addCharges(sumsOf(rank.part.category), { goods, excessValue, adders }, assembly, landed, 1);
      const price = Dec40.micros(l.priceMicro);
      const q = cand.slot.quote;
      const warningsOf = l.missingPins ? [{ code: 'missing_pins' as const, detail: rank.part.id }] : [];
      lineWarningCount += warningsOf.length;
      lines[l.pl.index] = lineOutput<Dec40>(
        {
          pl: l.pl, status: 'costed', category: rank.part.category, duty: rank.duty, required: l.required, excessQty: l.orderQty - l.required,
          fxRows: cand.fx.rows, warnings: warningsOf,
          quote: { id: q.id, supplierId: q.supplierId, currency: q.currency, incoterm, orderQty: l.orderQty, unitPrice: price, unitPriceConverted: price.times(rate) },
          amounts: { goods, excessValue, adders, freightShare },
          assembly, landed,
        },
        print,
      );
      continue;
    }
    const { w } = e;
    lineWarningCount += w.warnings.length;
    if (w.status === 'costed') {
      for (const r of w.fxRows) fxSeen.add(r);
      if (w.chosen) {
        lineExcess(w);
        lineCharges(p, w, N, carrierOf(w), freightRule, feesRule);
        const goods = Dec40.of(w.goods!);
        const excessValue = Dec40.of(w.excessValue!);
        const landed = Dec40.of(w.landed);
        addSupplier(bySupplier, Dec40.ZERO, w.chosen.pq.quote.supplierId, goods, excessValue, landed, 1);
        const a = w.adders!;
        const adders: LineAdders<Dec40> = {
          origin: Dec40.of(a.origin), freight: Dec40.of(a.freight), insurance: Dec40.of(a.insurance), customsValue: a.customsValue && Dec40.of(a.customsValue),
          duty: Dec40.of(a.duty), fees: Dec40.of(a.fees), destination: Dec40.of(a.destination), landed: Dec40.of(a.landed),
        };
        addCharges(sumsOf(w.category), { goods, excessValue, adders }, Dec40.of(w.assembly), landed, 1);
      } else {
        costLineCharges(w, N, amortiseOver);
        costLinesPerUnit = add(costLinesPerUnit, w.costPerUnit ?? ZERO);
        oneTimeTotal = add(oneTimeTotal, w.oneTimeCost ?? ZERO);
        addCharges(sumsOf(w.category), undefined, Dec40.of(w.assembly), Dec40.of(w.landed), 1);
      }
    } else (w.status === 'dnp' ? dnp : leftOut).push(w);
    lines[w.pl.index] = workOutput(w, N);
  }

  const decSums = new Map<string, Sums>();
  for (const [k, c] of byCategory) {
    decSums.set(k, {
      goods: decOf(c.goods), excessValue: decOf(c.excessValue), origin: decOf(c.origin), freight: decOf(c.freight), insurance: decOf(c.insurance),
      duty: decOf(c.duty), fees: decOf(c.fees), destination: decOf(c.destination), assembly: decOf(c.assembly), landed: decOf(c.landed), count: c.count,
    });
  }
  const decSuppliers = new Map<string, SupplierSums>();
  for (const [k, s2] of bySupplier) decSuppliers.set(k, { goods: decOf(s2.goods), excessValue: decOf(s2.excessValue), landed: decOf(s2.landed), count: s2.count });
  return rollResult(p, N, amortiseOver, { warnings, byCategory: decSums, bySupplier: decSuppliers, costLinesPerUnit, oneTimeTotal, fxSeen, lines, leftOut, dnp, lineWarningCount });
}

/** The FX rows behind a roll, each once (per direction), by date then pair. */
function usedRates(seen: Set<FxRateUsed>): FxRateUsed[] {
  const key = (r: FxRateUsed) => `${r.date}|${r.base}|${r.quote}|${r.inverted ? 1 : 0}`;
  const unique = new Map<string, FxRateUsed>();
  for (const r of seen) if (!unique.has(key(r))) unique.set(key(r), r);
  return [...unique.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([, r]) => r);
}

/** How a line's numbers print: decimal.js values or exact ones, money and per-unit places. */
interface Printer<T> {
  money(v: T): string;
  perUnit(v: T): string;
  /** A line's landed amount per built unit (÷ N). */
  perBuildUnit(v: T): string;
}

/** One output line's facts, its amounts in the number type that computed them. */
interface LineFacts<T> {
  pl: PreparedLine;
  status: Work['status'];
  category: string;
  warnings: LineWarning[];
  fxRows: FxRateUsed[];
  required?: number;
  excessQty?: number;
  duty?: DutyMatch;
  costPerUnit?: Dec;
  oneTimeCost?: Dec;
  quote?: { id: string; supplierId: string; currency: string; incoterm: Incoterm; orderQty: number; unitPrice: T; unitPriceConverted: T };
  amounts?: { goods: T; excessValue: T; adders: LineAdders<T>; freightShare?: T };
  assembly: T;
  landed: T;
}

const ZERO_MONEY = moneyText(ZERO);

function lineOutput<T>(f: LineFacts<T>, print: Printer<T>): CostRollLine {
  const { line } = f.pl;
  const q = f.quote;
  const m = f.amounts;
  const a = m?.adders;
  return {
    lineId: line.id,
    refDes: line.refDes ?? null,
    kind: line.kind,
    status: f.status,
    partId: line.partId ?? null,
    category: f.category,
    quoteId: q ? q.id : null,
    supplierId: q ? q.supplierId : null,
    incoterm: q ? q.incoterm : null,
    requiredQty: f.required ?? null,
    orderQty: q ? q.orderQty : null,
    excessQty: f.excessQty ?? null,
    unitPrice: q ? print.perUnit(q.unitPrice) : null,
    unitPriceCurrency: q ? q.currency : null,
    unitPriceConverted: q ? print.perUnit(q.unitPriceConverted) : null,
    goodsValue: m ? print.money(m.goods) : ZERO_MONEY,
    excessValue: m ? print.money(m.excessValue) : ZERO_MONEY,
    origin: a ? print.money(a.origin) : ZERO_MONEY,
    freight: a ? print.money(a.freight) : ZERO_MONEY,
    freightShare: m && m.freightShare ? print.money(m.freightShare) : ZERO_MONEY,
    insurance: a ? print.money(a.insurance) : ZERO_MONEY,
    customsValue: a && a.customsValue ? print.money(a.customsValue) : null,
    dutyPct: f.duty ? f.duty.ratePct.toString() : null,
    duty: a ? print.money(a.duty) : ZERO_MONEY,
    fees: a ? print.money(a.fees) : ZERO_MONEY,
    destination: a ? print.money(a.destination) : ZERO_MONEY,
    assembly: print.money(f.assembly),
    costPerUnit: f.costPerUnit ? perUnitText(f.costPerUnit) : null,
    oneTimeCost: f.oneTimeCost ? moneyText(f.oneTimeCost) : null,
    landed: print.money(f.landed),
    landedPerUnit: print.perBuildUnit(f.landed),
    fxRates: f.status === 'costed' ? f.fxRows : [],
    warnings: f.warnings,
  };
}

/** A line costed in decimal.js, printed. */
function workOutput(w: Work, N: Dec): CostRollLine {
  const c = w.chosen;
  return lineOutput<Dec>(
    {
      ...w,
      quote: c && {
        id: c.pq.quote.id, supplierId: c.pq.quote.supplierId, currency: c.pq.quote.currency, incoterm: c.pq.incoterm,
        orderQty: c.order.orderQty, unitPrice: c.order.unitPrice, unitPriceConverted: c.order.unitPrice.times(c.fx.rate),
      },
      amounts: w.adders && { goods: w.goods!, excessValue: w.excessValue!, adders: w.adders, freightShare: w.freightShare },
    },
    { money: moneyText, perUnit: perUnitText, perBuildUnit: (v) => perUnitText(v.div(N)) },
  );
}

/**
 * The BOM cost roll: landed cost per unit at the BOM's build quantity, per the product's
 * costing rules. Pure: the caller reads the BOM, profile, parts, quotes, suppliers and FX
 * table and hands them in.
 */
export function costRoll(input: CostRollInput, fxIndex?: FxIndex): CostRollResult {
  return rollPrepared(prepareCostRoll(input, fxIndex), input.bom.qty);
}
