import { expect } from 'vitest';

const DECIMAL = /^-?\d+\.\d+$/;
const units = (text: string) => BigInt(text.replace('.', ''));

/**
 * Deep equality, except that two decimal texts with the same places may differ by one
 * unit in the last place. The totals-only roll adds group sums where the reference adds
 * line by line; decimal.js rounds every sum to 40 significant digits, so when a figure
 * lies within about 10^-30 of a rounding half-way point (a repeating cross rate times
 * round quantities gets there) the two print one unit apart. Anything else must be equal.
 */
export function expectWithinLastPlace(actual: unknown, expected: unknown, path = 'result'): void {
  if (typeof actual === 'string' && typeof expected === 'string' && DECIMAL.test(actual) && DECIMAL.test(expected) && actual.split('.')[1].length === expected.split('.')[1].length) {
    const d = units(actual) - units(expected);
    if (d < -1n || d > 1n) expect(actual, path).toBe(expected);
    return;
  }
  if (Array.isArray(actual) && Array.isArray(expected)) {
    expect(actual.length, `${path}.length`).toBe(expected.length);
    actual.forEach((x, i) => expectWithinLastPlace(x, expected[i], `${path}.${i}`));
    return;
  }
  if (actual && expected && typeof actual === 'object' && typeof expected === 'object') {
    expect(Object.keys(actual).sort(), `${path} keys`).toEqual(Object.keys(expected).sort());
    for (const k of Object.keys(actual)) expectWithinLastPlace((actual as Record<string, unknown>)[k], (expected as Record<string, unknown>)[k], `${path}.${k}`);
    return;
  }
  expect(actual, path).toEqual(expected);
}
