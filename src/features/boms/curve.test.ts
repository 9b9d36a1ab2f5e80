import { describe, expect, it } from 'vitest';
import { logSpaced, parseQuantities } from './curve';

describe('volume-curve quantities', () => {
  it('reads commas, spaces and k for thousands, sorted and without repeats', () => {
    expect(parseQuantities('10000, 1000 5k,1k')).toEqual({ ok: true, quantities: [1000, 5000, 10000] });
    expect(parseQuantities('2.5k')).toEqual({ ok: true, quantities: [2500] });
    expect(parseQuantities('')).toEqual({ ok: true, quantities: [] });
  });

  it('names the first quantity it cannot read', () => {
    expect(parseQuantities('1000, 0, 5000')).toEqual({ ok: false, message: '“0” is not a whole quantity from 1 to 100,000,000' });
    expect(parseQuantities('1000.5')).toMatchObject({ ok: false });
    expect(parseQuantities(Array.from({ length: 41 }, (_, i) => i + 1).join(','))).toEqual({ ok: false, message: 'At most 40 quantities at a time' });
  });

  it('spreads points evenly on a log scale, ends included', () => {
    expect(logSpaced(1000, 100000, 3)).toEqual([1000, 10000, 100000]);
    const points = logSpaced(1000, 100000, 40);
    expect(points[0]).toBe(1000);
    expect(points.at(-1)).toBe(100000);
    expect(points.length).toBeLessThanOrEqual(40);
    expect([...points].sort((a, b) => a - b)).toEqual(points);
  });
});
