/** A fraction as a percentage for reading: 0.95 → "95 %", 0.7727 → "77.3 %", 0.0066 → "0.66 %". */
export function formatPercent(fraction: number | null | undefined): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return '—';
  const pct = fraction * 100;
  const abs = Math.abs(pct);
  const digits = Number.isInteger(Number(pct.toFixed(1))) ? 0 : abs >= 10 ? 1 : 2;
  return `${Number(pct.toFixed(digits)).toLocaleString('en-GB', { maximumFractionDigits: digits })} %`;
}
