const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [9, 'G'], [6, 'M'], [3, 'k'], [0, ''], [-3, 'm'], [-6, 'µ'], [-9, 'n'], [-12, 'p'],
];

/**
 * A value in a unit the shared formatter does not hold (C, J, s), with an engineering
 * prefix and three significant figures: 5.28 µC, 6.34 mJ, 96.8 ms. Seconds of a second
 * or more stay in seconds (1500 s, not 1.5 ks), as the engine writes them.
 */
export function formatSi(value: number, unit: string, digits = 3): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return `0 ${unit}`;
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const exp = Number(exponent);
  const floor = Math.floor(exp / 3) * 3;
  const shift = unit === 's' && exp >= 0 ? 0 : Math.max(-12, Math.min(9, floor));
  const prefix = PREFIXES.find(([e]) => e === shift)?.[1] ?? '';
  return `${Number(`${mantissa}e${exp - shift}`)} ${prefix}${unit}`;
}
