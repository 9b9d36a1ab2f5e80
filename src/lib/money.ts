import Decimal from 'decimal.js';
import { minorUnits } from '../shared/minor-units';

// Half-up, as the costing rules round for display; a private constructor so the
// library's global settings stay untouched for anyone else.
const D = Decimal.clone({ rounding: Decimal.ROUND_HALF_UP, precision: 40 });

function group(integer: string): string {
  return integer.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * A decimal string from the API, rounded half-up to `places` and grouped by thousands
 * ("12345.6789" → "12,345.68"). Never goes through a binary float, so a price of
 * 0.000810 prints as it was quoted. Text that is not a number is shown as given.
 */
export function formatDecimal(value: string | number, places: number): string {
  let d: Decimal;
  try {
    d = new D(value);
  } catch {
    return String(value);
  }
  if (!d.isFinite()) return String(value);
  const fixed = d.toFixed(places);
  const negative = fixed.startsWith('-');
  const [integer, fraction] = (negative ? fixed.slice(1) : fixed).split('.');
  // "-0.00" after rounding is zero: no sign.
  const sign = negative && !new D(fixed).isZero() ? '−' : '';
  return `${sign}${group(integer)}${fraction ? `.${fraction}` : ''}`;
}

/**
 * Places a currency's amounts are shown with: its ISO 4217 minor unit (JPY 0, USD 2,
 * KWD 3). The table is the one the cost roll rounds with, so screen and sheet agree;
 * an unknown code shows 2.
 */
export function currencyPlaces(currency: string): number {
  return minorUnits(currency) ?? 2;
}

/** An extended amount (goods value, a total) in its currency's minor unit. */
export function formatMoney(value: string | number, currency: string): string {
  return formatDecimal(value, currencyPlaces(currency));
}

/** Quoted unit prices carry up to 6 decimals; show all six so columns line up. */
export const PRICE_PLACES = 6;

export function formatUnitPrice(value: string | number): string {
  return formatDecimal(value, PRICE_PLACES);
}

/** Compares two decimal strings exactly; for sorting money columns. */
export function compareDecimal(a: string, b: string): number {
  try {
    return new D(a).comparedTo(new D(b));
  } catch {
    return a.localeCompare(b);
  }
}

/** A decimal string without trailing zeros ("3.7000" → "3.7"), for form fields. */
export function trimDecimal(value: string | null | undefined): string {
  if (value === null || value === undefined || value === '') return '';
  try {
    return new D(value).toFixed();
  } catch {
    return value;
  }
}
