import { describe, expect, it } from 'vitest';
import { daysUntil, limitLines, minorToMajor, planPrice } from './display';

describe('billing display', () => {
  it('shifts minor units by the ISO 4217 exponent of the currency (USD 2, JPY 0, KWD 3 — ISO 4217 table, from memory)', () => {
    expect(minorToMajor(2900, 'usd')).toBe('29.00');
    expect(minorToMajor(5, 'USD')).toBe('0.05');
    expect(minorToMajor(123456, 'USD')).toBe('1,234.56');
    expect(minorToMajor(2900, 'JPY')).toBe('2,900');
    expect(minorToMajor(1500, 'KWD')).toBe('1.500');
  });

  it('names the free plan and prices the paid ones per month', () => {
    expect(planPrice(0)).toBe('Free');
    expect(planPrice(9900)).toBe('99.00 USD a month');
  });

  it('counts the days left of a grace period upwards, never below zero', () => {
    const now = Date.parse('2026-03-01T12:00:00Z');
    expect(daysUntil('2026-03-02T11:00:00Z', now)).toBe(1);
    expect(daysUntil('2026-03-08T12:00:00Z', now)).toBe(7);
    expect(daysUntil('2026-02-20T00:00:00Z', now)).toBe(0);
  });

  it('says what an unlimited limit means', () => {
    expect(limitLines({ boms: null, members: 10, rfq: true, apiTokens: false })).toEqual([
      'Unlimited BOMs',
      'Up to 10 members (invitations included)',
      'Requests for quotation to suppliers',
      'No API tokens',
    ]);
  });
});
