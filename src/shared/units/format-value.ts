import { QUANTITY_INFO, type Quantity } from './quantities';

export interface FormatOptions {
  /** Significant figures, 1 to 15 (default 3). Trailing zeros are always dropped. */
  digits?: number;
}

const PREFIX_BY_EXP = new Map([
  [-12, 'p'], [-9, 'n'], [-6, 'µ'], [-3, 'm'], [0, ''], [3, 'k'], [6, 'M'], [9, 'G'],
]);
const MIN_EXP = -12;
const MAX_EXP = 9;

/**
 * Writes a base-unit number the way engineers read it: an engineering prefix,
 * the unit symbol, a few significant figures (4.7 kΩ, 2.2 nF, 700 mA, 85 °C).
 * Temperatures and plain numbers take no prefix; resistances below 1 Ω stay in
 * ohms (0.47 Ω), as the trade writes 0R47; capacitances stop at F. Non-finite values print as "—".
 * The output parses back with parseValue to the value rounded to `digits`.
 */
export function formatValue(value: number, quantity: Quantity, opts: FormatOptions = {}): string {
  const digits = opts.digits ?? 3;
  if (!Number.isInteger(digits) || digits < 1 || digits > 15) {
    throw new RangeError(`formatValue: digits must be an integer from 1 to 15, got ${digits}`);
  }
  if (!Number.isFinite(value)) return '—';

  // toExponential rounds once, in decimal, and gives the exponent after rounding
  // (999.7 → "1.00e+3"), so the prefix is chosen from the number we print.
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const exp = Number(exponent);
  const unprefixed = quantity === 'temperature' || quantity === 'plain' || (quantity === 'resistance' && exp < 0);
  // Capacitance stops at farads (a 3000 F supercapacitor), matching parseValue,
  // which refuses kF/MF/GF because old markings used MF for microfarads.
  const maxExp = quantity === 'capacitance' ? 0 : MAX_EXP;
  const shift = unprefixed ? 0 : Math.min(maxExp, Math.max(MIN_EXP, Math.floor(exp / 3) * 3));
  // Shift the decimal point in the string rather than dividing floats.
  const number = String(Number(`${mantissa}e${exp - shift}`));
  const unit = `${PREFIX_BY_EXP.get(shift)}${QUANTITY_INFO[quantity].symbol}`;
  return unit ? `${number} ${unit}` : number;
}
