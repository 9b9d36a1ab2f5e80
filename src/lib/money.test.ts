import { describe, expect, it } from 'vitest';
import { compareDecimal, currencyPlaces, formatDecimal, formatMoney, formatUnitPrice, trimDecimal } from './money';

describe('money on screen', () => {
  it('keeps a six-decimal chip-resistor price exactly as quoted', () => {
    expect(formatUnitPrice('0.000810')).toBe('0.000810');
    expect(formatUnitPrice('0.0008100000')).toBe('0.000810');
    // 0.1 + 0.2 in binary floats is 0.30000000000000004; the decimal text is exact.
    expect(formatUnitPrice('0.3000000000')).toBe('0.300000');
  });

  // Half-up to 2 dp: 2.345 → 2.35, 0.125 → 0.13, −2.345 → −2.35 [ROUND] (confirmed).
  it('rounds half-up for display, as the costing rules ask', () => {
    expect(formatDecimal('2.345', 2)).toBe('2.35');
    expect(formatDecimal('0.125', 2)).toBe('0.13');
    expect(formatDecimal('-2.345', 2)).toBe('−2.35');
    expect(formatDecimal('2.5', 0)).toBe('3');
    expect(formatDecimal('0.0000005', 6)).toBe('0.000001');
    expect(formatDecimal('-0.004', 2)).toBe('0.00');
    expect(formatDecimal('-1234.5', 0)).toBe('−1,235');
  });

  it('groups thousands', () => {
    expect(formatDecimal('1234567.891', 2)).toBe('1,234,567.89');
    expect(formatDecimal('999', 2)).toBe('999.00');
  });

  // ISO 4217 minor units JPY 0, USD 2, KWD 3 [ISO-DATA] (confirmed); KWD 1.23456 → 1.235 [ISO-DATA].
  // CNY 1,000 → USD on the ECB file of 2024-06-28 is 137.68842… → 137.69 USD [ECB-FMT] (confirmed).
  it('shows extended amounts in the currency minor unit', () => {
    expect(currencyPlaces('JPY')).toBe(0);
    expect(currencyPlaces('usd')).toBe(2);
    expect(currencyPlaces('KWD')).toBe(3);
    expect(formatMoney('137.688423', 'USD')).toBe('137.69');
    expect(formatMoney('1982.9075', 'JPY')).toBe('1,983');
    expect(formatMoney('1.23456', 'KWD')).toBe('1.235');
  });

  it('shows text that is not a number as given', () => {
    expect(formatDecimal('n/a', 2)).toBe('n/a');
  });

  it('compares decimals exactly, beyond float precision', () => {
    expect(compareDecimal('0.0000000001', '0.0000000002')).toBe(-1);
    expect(compareDecimal('10.5', '9.75')).toBe(1);
    expect(compareDecimal('1.000', '1')).toBe(0);
  });

  it('drops trailing zeros for editing', () => {
    expect(trimDecimal('3.7000')).toBe('3.7');
    expect(trimDecimal('0.000810')).toBe('0.00081');
    expect(trimDecimal(null)).toBe('');
  });
});
