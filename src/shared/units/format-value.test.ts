import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { formatValue } from './format-value';
import { parseValue } from './parse-value';
import { QUANTITIES, type Quantity } from './quantities';

describe('formatValue: engineering prefixes (SI Brochure, 9th edition) and unit symbols', () => {
  it.each<[number, Quantity, string]>([
    [4700, 'resistance', '4.7 kΩ'],
    [22e6, 'resistance', '22 MΩ'],
    [100, 'resistance', '100 Ω'],
    [2.2e-9, 'capacitance', '2.2 nF'],
    [100e-12, 'capacitance', '100 pF'],
    [47e-6, 'capacitance', '47 µF'],
    [1900, 'voltage', '1.9 kV'],
    [2000, 'voltage', '2 kV'],
    [0.7, 'current', '700 mA'],
    [0.25, 'power', '250 mW'],
    [50e3, 'frequency', '50 kHz'],
    [10e-6, 'inductance', '10 µH'],
    [85, 'temperature', '85 °C'],
    [-40, 'temperature', '-40 °C'],
    [4700, 'plain', '4700'],
    [0, 'voltage', '0 V'],
  ])('%d %s → %s', (value, quantity, text) => {
    expect(formatValue(value, quantity)).toBe(text);
  });

  it('IEC 60062 habit: resistances below 1 Ω stay in ohms (0R47 is 0.47 Ω, not 470 mΩ)', () => {
    expect(formatValue(0.47, 'resistance')).toBe('0.47 Ω');
    expect(formatValue(0.0047, 'resistance')).toBe('0.0047 Ω');
  });

  it('temperature never takes a prefix', () => {
    expect(formatValue(1500, 'temperature')).toBe('1500 °C');
    expect(formatValue(0.25, 'temperature')).toBe('0.25 °C');
  });

  it('three significant figures by default, trailing zeros dropped, more on request', () => {
    expect(formatValue(4712, 'resistance')).toBe('4.71 kΩ');
    expect(formatValue(4712, 'resistance', { digits: 4 })).toBe('4.712 kΩ');
    expect(formatValue(4700, 'resistance', { digits: 6 })).toBe('4.7 kΩ');
    expect(formatValue(1 / 3, 'power', { digits: 5 })).toBe('333.33 mW');
  });

  it('rounding that reaches 1000 moves to the next prefix', () => {
    expect(formatValue(999.7, 'voltage')).toBe('1 kV');
    expect(formatValue(999_999, 'resistance')).toBe('1 MΩ');
  });

  it('beyond p and G the mantissa grows instead of inventing a prefix', () => {
    expect(formatValue(1e-15, 'capacitance')).toBe('0.001 pF');
    expect(formatValue(1e12, 'resistance')).toBe('1000 GΩ');
    expect(formatValue(3000, 'capacitance')).toBe('3000 F'); // a supercapacitor: never kF, which parseValue refuses
  });

  it('a non-finite value prints as a dash; bad digits is a programming error', () => {
    expect(formatValue(Number.NaN, 'power')).toBe('—');
    expect(formatValue(Number.POSITIVE_INFINITY, 'power')).toBe('—');
    expect(() => formatValue(1, 'power', { digits: 0 })).toThrow(RangeError);
    expect(() => formatValue(1, 'power', { digits: 2.5 })).toThrow(RangeError);
  });
});

describe('round trip: parseValue(formatValue(v)) gives v to the printed precision', () => {
  const positive = QUANTITIES.filter((q) => q !== 'temperature');

  it('for positive values from 1 p to 1 T in every quantity but temperature', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-12, max: 1e12, noNaN: true }),
        fc.constantFrom(...positive),
        fc.integer({ min: 1, max: 15 }),
        (value, quantity, digits) => {
          const text = formatValue(value, quantity, { digits });
          const parsed = parseValue(text, quantity);
          expect(parsed).toEqual({ ok: true, value: Number(value.toPrecision(digits)), quantity });
          if (parsed.ok) expect(Math.abs(parsed.value / value - 1)).toBeLessThanOrEqual(0.5 * 10 ** (1 - digits) + 1e-15);
        },
      ),
      { numRuns: 2000 },
    );
  });

  it('for temperatures from -273 °C to 10 000 °C', () => {
    fc.assert(
      fc.property(fc.double({ min: -273, max: 10_000, noNaN: true }), fc.integer({ min: 1, max: 15 }), (value, digits) => {
        const parsed = parseValue(formatValue(value, 'temperature', { digits }), 'temperature');
        expect(parsed).toEqual({ ok: true, value: Number(value.toPrecision(digits)) || 0, quantity: 'temperature' });
      }),
      { numRuns: 1000 },
    );
  });
});
