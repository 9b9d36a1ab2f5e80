/**
 * Farthing's costing engine: pure functions from plain data to plain data. No I/O: the
 * server reads the rows, maps them into these inputs and sends the results. Money, prices,
 * rates and percentages are decimal.js values at 40 significant digits; results carry money
 * to 6 decimals and unit prices and per-unit figures to 10. Rounding to a currency's minor
 * unit (`roundMoney`) is for display and export only. See README.md beside this file for
 * the decisions taken where the costing rules leave a choice.
 */

/**
 * costRoll(input: CostRollInput): CostRollResult — the BOM cost roll at `input.bom.qty`:
 * each part line's chosen quote, required and order quantity, unit price, goods and excess
 * value, every adder, assembly and landed cost; cost lines; totals, breakdowns by category
 * and supplier, warnings, and the lines left out with the reason.
 *
 * prepareCostRoll(input) → PreparedCostRoll and rollPrepared(prepared, qty, {lines?}) split
 * it: the first parses and indexes everything that does not depend on the build quantity,
 * the second rolls at one quantity (use them to roll the same BOM more than once).
 */
export { costRoll, prepareCostRoll, rollPrepared } from './cost-roll';
export type { PreparedCostRoll, RollOptions } from './cost-roll';

/**
 * volumeCurve(input, quantities: number[]): VolumeCurveResult — the cost roll's totals,
 * breakdowns and warnings at each build quantity, with the data prepared once.
 */
export { volumeCurve } from './curve';

/**
 * quoteBoard(input: QuoteBoardInput): QuoteBoardResult — every offer for one part at a
 * needed quantity in one currency: eligibility and why not, order quantity, unit price in
 * the quote's and the board's currency, goods and excess value, percentage adders and duty,
 * landed cost of the order and per piece needed, and the cheapest eligible quote.
 * eligibilityReasons(prepared quote, date, maxLeadTimeDays) and compareQuotes(a, b) are the
 * two rules it applies, shared with the cost roll.
 */
export { quoteBoard, eligibilityReasons, compareQuotes, prepareQuote } from './quote-choice';

/**
 * shelfLadder(input: ShelfLadderInput): ShelfLadderResult — shelf price incl. VAT down to
 * the allowed landed cost, rung by rung, and the gap to a computed landed cost.
 */
export { shelfLadder } from './shelf-ladder';

/**
 * The order-quantity rule for one quote. requiredQty(q, N, attrition) → R;
 * prepareOrderTerms(priceBreaks, moq, orderMultiple) parses a quote's terms once;
 * chooseOrder(terms, R) → order quantity, unit price, goods value, excess and its value;
 * priceAt(terms, Q) → the break price at Q. Counts are whole numbers, amounts decimals.
 */
export { requiredQty, prepareOrderTerms, chooseOrder, orderSpend, priceAt, toCount, ceilToMultipleCount } from './order-quantity';
export type { OrderTerms, OrderChoice, OrderSpend } from './order-quantity';

/**
 * createFxIndex(rates, {pivot}) → FxIndex with lookup(from, to, date): the latest row dated
 * on or before the date, direct, else inverse, else through the pivot (EUR by default), with
 * the rows used; `{ok: false, code: 'missing_fx'}` when there is none — never 1.
 * convert(index, amount, from, to, date) applies it.
 */
export { createFxIndex, convert } from './fx';
export type { FxIndex, FxLookup, FxFound, FxMissing } from './fx';

/**
 * The eleven Incoterms 2020 rules, the adders a price under each leaves to the buyer
 * (INCOTERM_ADDERS, needsAdder), and customsValue(rule, basis, parts) under the CIF or FOB
 * duty basis.
 */
export { INCOTERMS, INCOTERM_ADDERS, ADDER_NAMES, customsValue, needsAdder, isIncoterm } from './incoterms';

/** createDutyTable(dutyRates, defaultDutyPct).match(hsCode): the longest matching HS prefix's rate. */
export { createDutyTable, normaliseHsCode } from './duty';
export type { DutyTable, DutyMatch } from './duty';

/**
 * lineAdders(input): origin, freight, insurance (on 110 %), customs value, duty, fees and
 * destination on one line; boardLandedFactor: landed cost per unit of goods value with the
 * percentage adders and duty only.
 */
export { lineAdders, boardLandedFactor, INSURED_SHARE } from './landed';
export type { LineAdders, AdderInput } from './landed';

/** prepareProfile(profile): a landed-cost profile with percentages as fractions and defaults filled in. */
export { prepareProfile } from './profile';
export type { PreparedProfile, PercentAdders } from './profile';

/**
 * Decimal helpers: dec(text) parses plain decimal text; roundMoney(value, currency) rounds
 * half-up to the ISO 4217 minor unit; roundHalfUp(value, dp); moneyText / perUnitText print
 * results; minorUnits(code) reads our ISO 4217 table.
 */
export { Dec, dec, ceilInt, roundHalfUp, roundMoney, moneyText, perUnitText, MONEY_DP, PER_UNIT_DP } from './decimal';
export { MINOR_UNITS, minorUnits } from './minor-units';
export { CostingInputError } from './errors';

export type * from './types';
