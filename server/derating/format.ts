/**
 * Number formatting for the formula texts users read on hover: four significant figures,
 * SI prefixes outside 0.1…1000 (22 MΩ, 1.82 mW, 2.345 kV), none inside (0.25 W, 200 V).
 * Long times stay in seconds (1500 s, not 1.5 ks).
 */

const PREFIXES: ReadonlyArray<[number, string]> = [
  [1e12, 'T'],
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
];

function sig(value: number, digits = 4): string {
  return String(Number(value.toPrecision(digits)));
}

/** A quantity with its unit, e.g. fmt(22e6, 'Ω') → "22 MΩ". Temperatures never take a prefix. */
export function fmt(value: number, unit: string): string {
  if (!Number.isFinite(value)) return `${value} ${unit}`;
  const abs = Math.abs(value);
  if (unit === '°C' || abs === 0 || (abs >= 0.1 && (abs < 1000 || unit === 's'))) return `${sig(value)} ${unit}`;
  for (const [scale, prefix] of PREFIXES) {
    // Round first so 0.99996 mV reads "1 mV", not "1000 µV".
    if (Math.abs(Number((value / scale).toPrecision(4))) >= 1) return `${sig(value / scale)} ${prefix}${unit}`;
  }
  const [scale, prefix] = PREFIXES[PREFIXES.length - 1];
  return `${sig(value / scale)} ${prefix}${unit}`;
}

/** A bare number to four significant figures. */
export function num(value: number): string {
  return sig(value);
}

/** A fraction as a percentage, e.g. 0.7692 → "76.92 %". */
export function pct(fraction: number): string {
  return `${sig(fraction * 100)} %`;
}
