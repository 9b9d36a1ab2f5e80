import { describe, expect, it } from 'vitest';
import { describeGap, formatPerUnit, formatTotal, gapText, subtractDecimal, warningText } from './display';

describe('money on the BOM screens', () => {
  // Per-unit figures to 4 decimals: NRE 3,100 over 1,000 / 10,000 / 100,000 units is
  // 3.1000 / 0.3100 / 0.0310 per unit (costing facts row 42, common practice).
  it('shows per-unit figures to 4 decimals', () => {
    expect(formatPerUnit('3.1000000000')).toBe('3.1000');
    expect(formatPerUnit('0.3100000000')).toBe('0.3100');
    expect(formatPerUnit('0.0310000000')).toBe('0.0310');
    // 4,018.13 / 1,000 = 4.01813 → 4.0181 (costing facts row 44, common practice).
    expect(formatPerUnit('4.0181300000')).toBe('4.0181');
  });

  // Half-up: 2.345 → 2.35, 0.125 → 0.13, −2.345 → −2.35 [ROUND] (confirmed).
  it('rounds half-up, away from zero, never through a binary float', () => {
    expect(formatTotal('2.345000', 'GBP')).toBe('2.35');
    expect(formatTotal('0.125000', 'USD')).toBe('0.13');
    expect(formatTotal('-2.345000', 'EUR')).toBe('−2.35');
    // (1.005).toFixed(2) is "1.00" in binary floats; the decimal is 1.01 (costing facts row 37).
    expect(formatTotal('1.005', 'USD')).toBe('1.01');
    expect(formatPerUnit('0.00005')).toBe('0.0001');
  });

  // 10,000 × 0.0008 = 8.00 and 5,000 × 0.0065 = 32.50, rounded once on the extended value
  // (costing facts rows 35–36, common practice).
  it('rounds extended totals once, in the currency minor unit', () => {
    expect(formatTotal('8.000000', 'USD')).toBe('8.00');
    expect(formatTotal('32.500000', 'USD')).toBe('32.50');
    // ISO 4217 minor units: JPY 0, KWD 3 [ISO-DATA] (confirmed).
    expect(formatTotal('1234.5', 'JPY')).toBe('1,235');
    expect(formatTotal('1.23456', 'KWD')).toBe('1.235');
  });

  it('shows a missing figure as a dash, not as zero', () => {
    expect(formatPerUnit(null)).toBe('—');
    expect(formatTotal(undefined, 'GBP')).toBe('—');
  });
});

describe('a gap in words', () => {
  it('says over or under with an unsigned amount', () => {
    expect(describeGap('0.0123450000')).toEqual({ side: 'over', amount: '0.0123' });
    expect(describeGap('-0.0040000000')).toEqual({ side: 'under', amount: '0.0040' });
    expect(gapText(describeGap('0.0123450000'), 'target', 'GBP')).toBe('0.0123 GBP over target');
    expect(gapText(describeGap('-0.004'), 'target')).toBe('0.0040 under target');
  });

  it('calls a gap that rounds to zero "on", and no target "not set"', () => {
    expect(describeGap('0.00004')).toEqual({ side: 'on', amount: '0.0000' });
    expect(describeGap('-0.00004')?.side).toBe('on');
    expect(gapText(describeGap(null), 'target')).toBe('no target set');
  });
});

describe('warnings in words', () => {
  it('names the engine codes plainly', () => {
    expect(warningText('no_quote')).toBe('No eligible quote');
    expect(warningText('missing_fx')).toBe('No FX rate');
    expect(warningText('pinned_not_cheapest')).toBe('Pinned, not cheapest');
    expect(warningText('pinned_expired')).toBe('Pinned quote expired');
    expect(warningText('missing_weight')).toBe('No unit weight');
    expect(warningText('some_new_code')).toBe('some new code');
  });
});

describe('the gap on the BOM list', () => {
  it('subtracts decimal strings exactly', () => {
    // 0.1 + 0.2 style float noise must not appear: 0.3 − 0.1 is 0.2 exactly.
    expect(subtractDecimal('0.3000000000', '0.100000')).toBe('0.2');
    expect(subtractDecimal('0.0412000000', '0.050000')).toBe('-0.0088');
    expect(subtractDecimal('x', '1')).toBeNull();
  });
});
