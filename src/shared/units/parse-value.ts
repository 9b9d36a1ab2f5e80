import { QUANTITY_INFO, type Quantity } from './quantities';

export type ParseResult =
  | { ok: true; value: number; quantity: Quantity }
  | { ok: false; message: string };

/** Decimal exponent of each prefix. Case matters: m is milli, M is mega; k and K are both kilo. */
const PREFIXES: ReadonlyArray<readonly [string, number]> = [
  // Longest first, so "meg" is not read as "m" + "eg".
  ['MEG', 6], ['Meg', 6], ['meg', 6],
  ['p', -12], ['n', -9], ['u', -6], ['µ', -6], ['μ', -6], ['m', -3],
  ['k', 3], ['K', 3], ['M', 6], ['G', 9],
];
const PREFIX_EXP = new Map(PREFIXES);

const UNITS: Record<string, Quantity> = {
  'Ω': 'resistance', // NFKC folds the ohm sign U+2126 into this Greek capital omega
  R: 'resistance', // 100R, the IEC 60062 way of writing 100 Ω
  F: 'capacitance',
  V: 'voltage',
  A: 'current',
  W: 'power',
  '°C': 'temperature', // NFKC folds ℃ into this
  C: 'temperature',
  degC: 'temperature',
  Hz: 'frequency',
  H: 'inductance',
};
const OHM_WORDS = new Set(['ohm', 'ohms']);

// Units typed in the wrong case. We name the right one rather than guess: with
// m/M meaning different things, "case doesn't matter" would be a trap.
const CASE_HINTS = new Map([
  ['v', 'V (volts)'], ['a', 'A (amperes)'], ['w', 'W (watts)'], ['f', 'F (farads)'],
  ['h', 'H (henries)'], ['hz', 'Hz (hertz)'], ['c', '°C (degrees Celsius)'],
]);

// Old capacitor markings where MF/MFD meant microfarads, not mega- or millifarads.
const LEGACY_MICROFARAD = new Set(['MF', 'MFD', 'Mfd', 'mf', 'mfd']);

const CODE_LETTERS = 'RpnuµμmkKMG';

/**
 * One tokenizer for every accepted form: an optional sign, then
 *  - an IEC 60062 letter code (4K7, 2n2, 0R47, R47), the letter standing for the decimal point;
 *  - a fraction (1/4, as in 1/4W);
 *  - a decimal number with an optional exponent (4.7, .47, 2.2e-9);
 * then optional spaces and the rest (prefix and unit), resolved by table.
 */
const VALUE_RE = new RegExp(
  '^([-+−]?)(?:' +
    `(\\d*)([${CODE_LETTERS}])(\\d+)` +
    '|(\\d+)/(\\d+)' +
    '|(\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE]([-+]?\\d+))?' +
    ')\\s*(.*)$',
);

// "4.7K7": a decimal number followed by what looks like the rest of a letter code.
const CODE_AFTER_DECIMAL_RE = new RegExp(`^[${CODE_LETTERS}]\\d`);

const MAX_LENGTH = 64;

interface Suffix {
  prefix?: string;
  exp: number;
  quantity?: Quantity;
}

/**
 * Reads a value written the trade's way (4K7, 2n2, 0R47, 22M, 4.7 kΩ, 700mA,
 * 1/4W, -40°C) into a number in base units (ohms, farads, volts, amperes,
 * watts, °C, hertz, henries). Bad input gives `{ ok: false, message }` naming
 * the problem; it never throws and never guesses. With `expected`, a unit of
 * another quantity is an error and a value without a unit is taken as that
 * quantity; without it, such a value is 'plain' (R codes are resistances). The number is built from the digit string and a decimal exponent,
 * so 4K7 is exactly 4700 and 2n2 exactly 2.2e-9.
 */
export function parseValue(input: string, expected?: Quantity): ParseResult {
  if (typeof input !== 'string') return fail('the value must be text');
  const shown = input.trim();
  const text = shown.normalize('NFKC');
  const quote = `"${shown}"`;

  if (text === '') return fail('enter a value, such as 4K7 or 2.2nF');
  if (text.length > MAX_LENGTH) return fail(`"${shown.slice(0, 16)}…" is too long to be a value`);
  // NFKC turns the kelvin sign into a plain K, which would then read as kilo.
  if (shown.includes('\u212A')) return fail(`${quote}: kelvin is not accepted; write degrees Celsius such as 85°C`);
  if (text.includes(',')) {
    return fail(`${quote}: commas are not accepted; use a point as the decimal mark (4.7k, not 4,7k) and no thousands separators`);
  }
  if ((text.match(/\./g) ?? []).length > 1) return fail(`${quote} has more than one decimal point`);

  const match = VALUE_RE.exec(text);
  if (!match) {
    return fail(`${quote} is not a value: write a number with an optional prefix and unit (4.7kΩ, 2.2nF, 1/4W) or a letter code (4K7, 2n2, 0R47)`);
  }
  const [, sign, lead, letter, tail, numerator, denominator, decimal, e10, rest] = match;

  if (decimal?.includes('.') && CODE_AFTER_DECIMAL_RE.test(rest)) {
    return fail(`${quote}: a letter code uses its letter as the decimal point, so it cannot also have one (write 4K7 or 4.7k)`);
  }
  const suffix = resolveSuffix(rest);
  if ('error' in suffix) return fail(`${quote}: ${suffix.error}`);
  if (letter && suffix.prefix) {
    return fail(`${quote}: the letter code ${lead}${letter}${tail} already sets the multiplier, so "${suffix.prefix}" cannot follow it`);
  }

  // R in a letter code is the ohm sign standing in for the decimal point.
  const implied: Quantity | undefined = letter === 'R' ? 'resistance' : undefined;
  if (implied && suffix.quantity && suffix.quantity !== implied) {
    return fail(`${quote}: the R in a letter code means ohms, but the unit is for ${QUANTITY_INFO[suffix.quantity].label}`);
  }
  const quantity = suffix.quantity ?? implied ?? expected ?? 'plain';
  if (expected && quantity !== expected) {
    const want = QUANTITY_INFO[expected];
    return fail(`expected ${want.label} such as ${want.example}, got ${QUANTITY_INFO[quantity].label} (${shown})`);
  }

  const prefix = letter ? (letter === 'R' ? undefined : letter) : suffix.prefix;
  const prefixExp = letter ? (PREFIX_EXP.get(letter) ?? 0) : suffix.exp;
  if (quantity === 'temperature' && prefix) {
    return fail(`${quote}: a temperature takes no prefix ("${prefix}"); write degrees Celsius such as 85°C (kelvin is not accepted)`);
  }
  if (quantity === 'capacitance' && prefixExp > 0) {
    return fail(`${quote}: k, M and G are not used for capacitance (old markings wrote MF for µF); write pF, nF, µF (uF) or mF`);
  }
  if (sign && sign !== '+' && quantity !== 'temperature') {
    return fail(`${quote}: negative values are only accepted for temperatures`);
  }

  let mantissa: string;
  let exp = prefixExp;
  let divisor = 1;
  if (letter) {
    mantissa = `${lead || '0'}.${tail}`;
  } else if (numerator !== undefined) {
    mantissa = numerator;
    divisor = Number(denominator);
    if (divisor === 0) return fail(`${quote}: a fraction cannot divide by zero`);
  } else {
    mantissa = decimal;
    // Clamping keeps the exponent an ordinary integer in the string below; the
    // result is then Infinity or 0, reported as too large or too small.
    if (e10) exp += Math.max(-1000, Math.min(1000, Number(e10)));
  }

  let value = Number(`${mantissa}e${exp}`) / divisor;
  if (sign && sign !== '+') value = -value;
  if (value === 0) value = 0; // no -0
  if (!Number.isFinite(value)) return fail(`${quote} is too large`);
  if (value === 0 && /[1-9]/.test(mantissa)) return fail(`${quote} is too small`);
  return { ok: true, value, quantity };
}

/** Splits what follows the number into a prefix and a unit, or names what is wrong. */
function resolveSuffix(rest: string): Suffix | { error: string } {
  if (rest === '') return { exp: 0 };
  if (LEGACY_MICROFARAD.has(rest)) {
    return { error: `"${rest}" is an old marking for microfarads; write µF (or uF)` };
  }
  const whole = unitOf(rest);
  if (whole) return { exp: 0, quantity: whole };

  let hint = CASE_HINTS.get(rest.toLowerCase());
  for (const [prefix, exp] of PREFIXES) {
    if (!rest.startsWith(prefix)) continue;
    const after = rest.slice(prefix.length).trimStart(); // "4.7k ohm"
    if (after === '') return { prefix, exp };
    const quantity = unitOf(after);
    if (quantity) return { prefix, exp, quantity };
    hint ??= CASE_HINTS.get(after.toLowerCase());
  }
  if (hint) return { error: `write the unit as ${hint}; units and prefixes are case-sensitive (m is milli, M is mega)` };
  return { error: `unknown prefix or unit "${rest}" (prefixes: p n µ/u m k/K M G; units: Ω/ohm/R F V A W °C Hz H)` };
}

function unitOf(text: string): Quantity | undefined {
  return Object.hasOwn(UNITS, text) ? UNITS[text] : OHM_WORDS.has(text.toLowerCase()) ? 'resistance' : undefined;
}

function fail(message: string): ParseResult {
  return { ok: false, message };
}
