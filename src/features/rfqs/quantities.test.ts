import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatCount, parseQuantity, parseQuantityList } from './quantities';

describe('piece counts as people type them', () => {
  it('reads thousands separators and the SI prefixes k (10^3) and M (10^6) (SI brochure, from memory)', () => {
    expect(parseQuantity('10000')).toBe(10000);
    expect(parseQuantity('10,000')).toBe(10000);
    expect(parseQuantity('10 000')).toBe(10000);
    expect(parseQuantity('10k')).toBe(10000);
    expect(parseQuantity('10 K')).toBe(10000);
    expect(parseQuantity('2.5k')).toBe(2500);
    expect(parseQuantity('1.001k')).toBe(1001);
    expect(parseQuantity('1M')).toBe(1_000_000);
    expect(parseQuantity('5000 pcs')).toBe(5000);
  });

  it('refuses what is not a whole number of pieces, and milli', () => {
    for (const text of ['', '0', '-5', '1.0005k', '2.5', '1m', 'ten', '10kk']) expect(parseQuantity(text), text).toBeNull();
  });

  it('splits a pasted list without splitting a grouped number', () => {
    expect(parseQuantityList('10k / 50k / 100k')).toEqual({ quantities: [10000, 50000, 100000], rejected: [] });
    expect(parseQuantityList('100,000; 10,000')).toEqual({ quantities: [10000, 100000], rejected: [] });
    expect(parseQuantityList('10k, 50k')).toEqual({ quantities: [10000, 50000], rejected: [] });
    expect(parseQuantityList('10k 50k 10k')).toEqual({ quantities: [10000, 50000], rejected: [] });
    expect(parseQuantityList('10 000')).toEqual({ quantities: [10000], rejected: [] });
    expect(parseQuantityList('5k / lots')).toEqual({ quantities: [5000], rejected: ['lots'] });
  });

  it('reads back every count it prints', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 100_000_000 }), (n) => parseQuantity(formatCount(n)) === n));
  });
});
