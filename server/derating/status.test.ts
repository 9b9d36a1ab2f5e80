import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CLOSE_FRACTION, RELATIVE_TOLERANCE, exceeds, severityRank, statusOf, worstStatus } from './status';
import type { StressStatus } from './types';

// The bands are the product rules of the stress check (derating.md), not a published value.
describe('statusOf: the status bands at their edges', () => {
  it('passes a ratio exactly at the limit (equal to the limit passes)', () => {
    expect(statusOf(0.8, 0.8)).toBe('close');
    expect(statusOf(0.5, 0.5)).toBe('close');
  });

  it('is beyond_policy just above the limit', () => {
    expect(statusOf(0.8001, 0.8)).toBe('beyond_policy');
    expect(statusOf(0.5 + 1e-6, 0.5)).toBe('beyond_policy');
  });

  it('treats a ratio of exactly 1 as beyond_policy, not over_rating (1 > 1 is false)', () => {
    expect(statusOf(1, 0.8)).toBe('beyond_policy');
    expect(statusOf(1, 0.999)).toBe('beyond_policy');
  });

  it('lets a ratio of exactly 1 pass when the limit is 1', () => {
    expect(statusOf(1, 1)).toBe('close');
  });

  it('is over_rating above 1, whatever the limit', () => {
    expect(statusOf(1.0001, 0.8)).toBe('over_rating');
    expect(statusOf(1.0001, 1)).toBe('over_rating');
    expect(statusOf(50, 0.5)).toBe('over_rating');
  });

  it('is clear at exactly 0.9 × limit and close just above it', () => {
    expect(CLOSE_FRACTION).toBe(0.9);
    expect(statusOf(0.72, 0.8)).toBe('clear');
    expect(statusOf(0.7201, 0.8)).toBe('close');
    expect(statusOf(0.45, 0.5)).toBe('clear');
    expect(statusOf(0.4501, 0.5)).toBe('close');
  });

  it('is clear well inside the limit and at zero stress', () => {
    expect(statusOf(0.3, 0.8)).toBe('clear');
    expect(statusOf(0, 0.8)).toBe('clear');
  });

  it('absorbs rounding noise of about 1e-16 but not a real excess of 2e-9', () => {
    expect(RELATIVE_TOLERANCE).toBe(1e-9);
    expect(0.7 * 3.9 / 3.9).toBeGreaterThan(0.7); // the noise the tolerance exists for
    expect(statusOf((0.7 * 3.9) / 3.9, 0.7)).toBe('close');
    expect(statusOf(0.8 * (1 + 5e-10), 0.8)).toBe('close');
    expect(statusOf(0.8 * (1 + 2e-9), 0.8)).toBe('beyond_policy');
    expect(statusOf(1 + 5e-10, 0.8)).toBe('beyond_policy');
    expect(statusOf(1 + 2e-9, 0.8)).toBe('over_rating');
  });

  it('exceeds() compares strictly with the tolerance relative to the threshold', () => {
    expect(exceeds(1, 1)).toBe(false);
    expect(exceeds(0, 0)).toBe(false);
    expect(exceeds(1e-300, 0)).toBe(true);
    expect(exceeds(-1, -1.5)).toBe(true);
  });
});

describe('worstStatus: a line takes its worst check', () => {
  const order: StressStatus[] = ['over_rating', 'beyond_policy', 'needs_data', 'close', 'clear'];

  it('ranks over_rating, beyond_policy, needs_data, close, clear from worst to best', () => {
    const ranks = order.map(severityRank);
    expect([...ranks].sort((a, b) => b - a)).toEqual(ranks);
    expect(new Set(ranks).size).toBe(5);
  });

  it('picks the worst of every pair', () => {
    for (let i = 0; i < order.length; i += 1) {
      for (let j = i; j < order.length; j += 1) {
        expect(worstStatus([order[j], order[i]])).toBe(order[i]);
        expect(worstStatus([order[i], order[j]])).toBe(order[i]);
      }
    }
  });

  it('puts needs_data above close and clear but below beyond_policy', () => {
    expect(worstStatus(['clear', 'close', 'needs_data'])).toBe('needs_data');
    expect(worstStatus(['needs_data', 'beyond_policy', 'clear'])).toBe('beyond_policy');
  });

  it('is clear for no checks', () => {
    expect(worstStatus([])).toBe('clear');
  });
});

describe('statusOf properties', () => {
  const limit = fc.double({ min: 0.01, max: 1, noNaN: true });
  const ratios = fc
    .tuple(fc.double({ min: 0, max: 1.5, noNaN: true }), fc.double({ min: 0, max: 1.5, noNaN: true }))
    .map(([a, b]) => (a <= b ? [a, b] : [b, a]));

  it('a higher ratio never gives a better status, whatever the limit', () => {
    fc.assert(
      fc.property(limit, ratios, (l, [lo, hi]) => {
        expect(severityRank(statusOf(hi, l))).toBeGreaterThanOrEqual(severityRank(statusOf(lo, l)));
      }),
      { numRuns: 2000 },
    );
  });

  it('a more lenient limit never gives a worse status', () => {
    fc.assert(
      fc.property(ratios, fc.double({ min: 0, max: 1.5, noNaN: true }), ([lo, hi], ratio) => {
        fc.pre(lo > 0 && hi <= 1);
        expect(severityRank(statusOf(ratio, hi))).toBeLessThanOrEqual(severityRank(statusOf(ratio, lo)));
      }),
      { numRuns: 2000 },
    );
  });
});
