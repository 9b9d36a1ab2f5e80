/**
 * Farthing's costing engine: pure functions from plain data to plain data. No I/O: the
 * server reads the rows, maps them into these inputs and sends the results. Every money,
 * price, rate and quantity computation runs in decimal.js at 40 significant digits; results
 * carry money to 6 decimals and unit prices and per-unit figures to 10. Rounding to a
 * currency's minor unit (`roundMoney`) is for display and export only.
 */

/**
 * costRoll(input): the BOM cost roll at `input.bom.qty` — each part line's chosen quote,
 * required and order quantity, goods and excess value, every adder, assembly, landed cost;
 * totals, breakdowns by category and supplier, warnings, and the lines left out with why.
 * prepareCostRoll + rollPrepared split it so that repeated rolls (other quantities) reuse
 * the parsed and indexed data.
 */
export { costRoll, prepareCostRoll, rollPrepared } from './cost-roll';
export type { PreparedCostRoll, RollOptions } from './cost-roll';

/** volumeCurve(input, quantities): the cost roll's totals at several build quantities, data prepared once. */
export { volumeCurve } from './curve';

/**
 * quoteBoard(input): every offer for one part at a needed quantity, in one currency, with
 * eligibility and the reason when not eligible, and the cheapest eligible quote.
 */
export { quoteBoard, eligibilityReasons, compareQuotes } from './quote-choice';

/** shelfLadder(input): shelf price down to the allowed landed cost, each rung, and the gap. */
export { shelfLadder } from './shelf-ladder';

/**
 * requiredQty, prepareOrderTerms, chooseOrder, priceAt: the order-quantity rule for one
 * quote — R from q, N and attrition; MOQ, order multiple and buying up to a cheaper break.
 */
export { requiredQty, prepareOrderTerms, chooseOrder, priceAt } from './order-quantity';
export type { OrderTerms, OrderChoice } from './order-quantity';

/** createFxIndex(rates, {pivot}) and convert(): rate lookup direct, inverse, or through the pivot; never 1 by default. */
export { createFxIndex, convert } from './fx';
export type { FxIndex, FxLookup, FxFound, FxMissing } from './fx';

/** The Incoterms 2020 rules, which adders each needs, and the customs value per duty basis. */
export { INCOTERMS, INCOTERM_ADDERS, ADDER_NAMES, customsValue, needsAdder, isIncoterm } from './incoterms';

/** createDutyTable(rates, default): longest HS-prefix match. */
export { createDutyTable, normaliseHsCode } from './duty';
export type { DutyTable, DutyMatch } from './duty';

/** lineAdders(): origin, freight, insurance, duty, fees and destination on one line. */
export { lineAdders, boardLandedFactor, INSURED_SHARE } from './landed';
export type { LineAdders, AdderInput } from './landed';

export { prepareProfile } from './profile';
export type { PreparedProfile, PercentAdders } from './profile';

/** Decimal helpers: parsing, half-up rounding, ISO 4217 minor units, result formatting. */
export { Dec, dec, ceilInt, ceilToMultiple, roundHalfUp, roundMoney, moneyText, perUnitText, MONEY_DP, PER_UNIT_DP } from './decimal';
export { MINOR_UNITS, minorUnits } from './minor-units';
export { CostingInputError } from './errors';

export type * from './types';
