import { describe, expect, it } from 'vitest';
import { formatPercent } from './percent';

describe('formatPercent', () => {
  it('shows stress ratios and limits as a designer reads them', () => {
    expect(formatPercent(0.95)).toBe('95 %');
    expect(formatPercent(0.8)).toBe('80 %');
    // 1.2 A of 1.5 A is 0.7999999999999999 in binary: it reads as the 80 % it is.
    expect(formatPercent(1.2 / 1.5)).toBe('80 %');
    expect(formatPercent(0.7727272727)).toBe('77.3 %');
    expect(formatPercent(0.0065636)).toBe('0.66 %');
    expect(formatPercent(1.25)).toBe('125 %');
  });

  it('shows a missing ratio as a dash', () => {
    expect(formatPercent(null)).toBe('—');
    expect(formatPercent(Number.POSITIVE_INFINITY)).toBe('—');
  });
});
