import type { StressStatus } from './types';

/**
 * Relative tolerance for the status comparisons. A ratio that equals its limit must pass,
 * yet the same value reached through a division (12.8 V / 16 V against 0.8) can land one
 * unit in the last place above it. 1e-9 is far below any meaningful stress difference and
 * far above double rounding noise (about 1e-16).
 */
export const RELATIVE_TOLERANCE = 1e-9;

/** "Close" means inside the limit but above this fraction of it (within 10 % of the limit). */
export const CLOSE_FRACTION = 0.9;

/** a > b, allowing for rounding noise relative to b. */
export function exceeds(a: number, b: number): boolean {
  return a > b + Math.abs(b) * RELATIVE_TOLERANCE;
}

/**
 * The status bands of a computed check: above the rating, above the policy's limit
 * (equal passes), within 10 % of the limit, or clear.
 */
export function statusOf(ratio: number, limit: number): Exclude<StressStatus, 'needs_data'> {
  if (exceeds(ratio, 1)) return 'over_rating';
  if (exceeds(ratio, limit)) return 'beyond_policy';
  if (exceeds(ratio, CLOSE_FRACTION * limit)) return 'close';
  return 'clear';
}

/** Severity, worst first: the order a line takes its worst check in. */
export const STATUS_SEVERITY: readonly StressStatus[] = [
  'over_rating',
  'beyond_policy',
  'needs_data',
  'close',
  'clear',
];

/** Higher is worse. */
export function severityRank(status: StressStatus): number {
  return STATUS_SEVERITY.length - 1 - STATUS_SEVERITY.indexOf(status);
}

/** The worst of several statuses; `clear` for none. */
export function worstStatus(statuses: readonly StressStatus[]): StressStatus {
  let worst: StressStatus = 'clear';
  for (const s of statuses) if (severityRank(s) > severityRank(worst)) worst = s;
  return worst;
}
