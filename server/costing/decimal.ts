import Decimal from 'decimal.js';
import { CostingInputError } from './errors';
import { minorUnits } from './minor-units';

/**
 * The engine's own decimal constructor: 40 significant digits, half-up (away from zero).
 * A private clone, so no other module's global Decimal settings can change our results.
 * 40 digits keep a triangulated FX rate times a 10-digit goods value exact to far below
 * a millionth of a cent.
 */
export const Dec = Decimal.clone({
  precision: 40,
  rounding: Decimal.ROUND_HALF_UP,
  toExpNeg: -45,
  toExpPos: 45,
});
export type Dec = Decimal;

export const ZERO = new Dec(0);
export const ONE = new Dec(1);
export const HUNDRED = new Dec(100);

// Plain decimal notation only: Decimal itself would also take "1e3", "0x1F" and "Infinity".
const DECIMAL_TEXT = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/;

/** True for plain decimal notation ("12", "-0.5", ".25"); false for exponents, hex, words. */
export function isDecimalText(text: string): boolean {
  return DECIMAL_TEXT.test(text);
}

/**
 * Parses a decimal string (as the API and knex `numeric` columns deliver it) or an integer
 * count. Anything else is an input error naming the field.
 */
export function dec(value: string | number | Decimal, field = 'value'): Dec {
  if (value instanceof Decimal) return new Dec(value);
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new CostingInputError(`not a finite number (${value})`, field);
    return new Dec(value);
  }
  if (typeof value !== 'string' || !DECIMAL_TEXT.test(value.trim())) {
    throw new CostingInputError(`not a decimal (${JSON.stringify(value)})`, field);
  }
  return new Dec(value.trim());
}

/** Like `dec`, but null/undefined/"" give the fallback (absent profile fields default to 0). */
export function decOr(value: string | number | null | undefined, fallback: Dec, field?: string): Dec {
  if (value === null || value === undefined || value === '') return fallback;
  return dec(value, field);
}

/** A percentage given in percent ("3.7" = 3.7 %) as a fraction (0.037). */
export function pctToFraction(pct: string | number | null | undefined, field?: string): Dec {
  return decOr(pct, ZERO, field).div(HUNDRED);
}

/** Smallest integer ≥ x. */
export function ceilInt(x: Dec): Dec {
  return x.ceil();
}

/** Half-up (away from zero) to `dp` decimal places: -2.345 → -2.35. */
export function roundHalfUp(value: Dec, dp: number): Dec {
  return value.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP);
}

/**
 * Rounds an extended amount to the currency's ISO 4217 minor unit, half-up.
 * Only for display and export: the engine itself never rounds.
 */
export function roundMoney(value: Dec, currency: string): Dec {
  const digits = minorUnits(currency);
  if (digits === undefined) throw new CostingInputError(`no ISO 4217 minor unit known for ${currency}`, 'currency');
  return roundHalfUp(value, digits);
}

const ZEROS = new Map<number, string>();

// toFixed of a tiny negative value would print "-0.000000". Zero is common in results
// (adders an Incoterm does not need), so its text is made once.
function fixed(value: Dec, dp: number): string {
  if (value.isZero()) {
    let z = ZEROS.get(dp);
    if (z === undefined) ZEROS.set(dp, (z = (0).toFixed(dp)));
    return z;
  }
  const text = value.toFixed(dp, Decimal.ROUND_HALF_UP);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** Decimal places of money amounts in results: matches the `numeric(20,6)` totals column. */
export const MONEY_DP = 6;
/** Decimal places of unit prices and per-unit figures in results (converted prices need more than 6). */
export const PER_UNIT_DP = 10;

export function moneyText(value: Dec): string {
  return fixed(value, MONEY_DP);
}

export function perUnitText(value: Dec): string {
  return fixed(value, PER_UNIT_DP);
}
