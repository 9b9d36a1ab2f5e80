import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkPriceBreaks, readQty, sortPriceBreakRows, suggestNextMinQty } from './price-breaks';

describe('price-break editor', () => {
  it('accepts ascending tiers and six-decimal prices, as a chip resistor is quoted', () => {
    const result = checkPriceBreaks([
      { minQty: '5,000', unitPrice: '0.0021' },
      { minQty: '50000', unitPrice: '0.000810' },
    ]);
    expect(result).toEqual({ ok: true, value: [{ minQty: 5000, unitPrice: '0.0021' }, { minQty: 50000, unitPrice: '0.000810' }] });
  });

  it('refuses a tier that does not rise above the one before it', () => {
    const result = checkPriceBreaks([
      { minQty: '1000', unitPrice: '0.01' },
      { minQty: '1000', unitPrice: '0.009' },
      { minQty: '500', unitPrice: '0.008' },
    ]);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.problems.filter((p) => p.field === 'minQty').map((p) => p.index)).toEqual([1, 2]);
    }
  });

  it('refuses a seventh decimal, a zero or negative price, and a fraction of a piece', () => {
    const result = checkPriceBreaks([
      { minQty: '1', unitPrice: '0.0000001' },
      { minQty: '10', unitPrice: '0' },
      { minQty: '100', unitPrice: '-1' },
      { minQty: '1000.5', unitPrice: '0.1' },
    ]);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      const at = (index: number, field: string) => result.problems.find((p) => p.index === index && p.field === field)?.message;
      expect(at(0, 'unitPrice')).toMatch(/6 decimals/);
      expect(at(1, 'unitPrice')).toMatch(/greater than 0/);
      expect(at(2, 'unitPrice')).toBeDefined();
      expect(at(3, 'minQty')).toMatch(/whole number/);
    }
  });

  it('says a quote needs at least one break', () => {
    const result = checkPriceBreaks([]);
    expect(result).toEqual({ ok: false, problems: [{ index: -1, field: null, message: 'needs at least one price break' }] });
  });

  it('says which empty cell is missing', () => {
    const result = checkPriceBreaks([{ minQty: '', unitPrice: '' }]);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems).toEqual([
      { index: 0, field: 'minQty', message: 'is required' },
      { index: 0, field: 'unitPrice', message: 'is required' },
    ]);
  });

  it('accepts any strictly ascending tiers and refuses any that repeat a quantity (property)', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: 1, max: 1e9 }), { minLength: 1, maxLength: 12 }), (quantities) => {
        const ascending = [...quantities].sort((a, b) => a - b).map((q) => ({ minQty: String(q), unitPrice: '0.5' }));
        expect(checkPriceBreaks(ascending).ok).toBe(true);
        const repeated = [...ascending, { ...ascending[ascending.length - 1] }];
        expect(checkPriceBreaks(repeated).ok).toBe(false);
      }),
    );
  });

  it('reads quantities written with thousands separators', () => {
    expect(readQty('5 000')).toBe(5000);
    expect(readQty('1_000_000')).toBe(1000000);
    expect(readQty('12.5')).toBeNull();
    expect(readQty('')).toBeNull();
  });

  it('suggests the next tier at ten times the last (common practice)', () => {
    expect(suggestNextMinQty([])).toBe('1');
    expect(suggestNextMinQty([{ minQty: '5000', unitPrice: '' }])).toBe('50000');
    expect(suggestNextMinQty([{ minQty: '5000', unitPrice: '' }, { minQty: '', unitPrice: '' }])).toBe('50000');
  });

  it('sorts rows by quantity with unreadable rows last', () => {
    const rows = [{ minQty: '5000', unitPrice: 'b' }, { minQty: 'x', unitPrice: 'c' }, { minQty: '100', unitPrice: 'a' }];
    expect(sortPriceBreakRows(rows).map((r) => r.unitPrice)).toEqual(['a', 'b', 'c']);
  });
});
