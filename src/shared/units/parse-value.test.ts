import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
// js-quantities is the outside reference for SI prefix arithmetic: a general
// purpose units library, written without this parser in mind.
import Qty from 'js-quantities';
import { parseValue, type ParseResult } from './parse-value';
import type { Quantity } from './quantities';

function valueOf(result: ParseResult): number {
  if (!result.ok) throw new Error(`expected a value, got: ${result.message}`);
  return result.value;
}

function messageOf(result: ParseResult): string {
  if (result.ok) throw new Error(`expected an error, got ${result.value} (${result.quantity})`);
  return result.message;
}

describe('IEC 60062 letter and digit code', () => {
  // IEC 60062 writes resistance and capacitance values with the multiplier letter
  // in place of the decimal point (R for ohms; K, M, G for resistors; p, n, µ, m
  // for capacitors). The examples below are in the standard's style, listed from
  // memory rather than copied from the standard. Each must be exact: the number is
  // built from the digit string and the exponent, not by multiplying floats.
  it.each<[string, number, Quantity]>([
    ['R47', 0.47, 'resistance'],
    ['0R47', 0.47, 'resistance'],
    ['4R7', 4.7, 'resistance'],
    ['47R', 47, 'resistance'],
    ['100R', 100, 'resistance'],
    ['1K0', 1000, 'plain'],
    ['4K7', 4700, 'plain'],
    ['4k7', 4700, 'plain'],
    ['47K', 47000, 'plain'],
    ['470K', 470000, 'plain'],
    ['1M0', 1e6, 'plain'],
    ['4M7', 4.7e6, 'plain'],
    ['22M', 22e6, 'plain'],
    ['2G2', 2.2e9, 'plain'],
    ['p47', 0.47e-12, 'plain'],
    ['4p7', 4.7e-12, 'plain'],
    ['100p', 100e-12, 'plain'],
    ['1n', 1e-9, 'plain'],
    ['2n2', 2.2e-9, 'plain'],
    ['4u7', 4.7e-6, 'plain'],
    ['4µ7', 4.7e-6, 'plain'],
    ['47u', 47e-6, 'plain'],
    ['1m0', 1e-3, 'plain'],
  ])('IEC 60062: %s = %d', (input, value, quantity) => {
    expect(parseValue(input)).toEqual({ ok: true, value, quantity });
  });

  it('IEC 60062: 4K7 is exactly 4700 and 2n2 exactly Number("2.2e-9")', () => {
    expect(valueOf(parseValue('4K7'))).toBe(4700);
    expect(valueOf(parseValue('2n2'))).toBe(Number('2.2e-9'));
    expect(valueOf(parseValue('0R47'))).toBe(0.47);
  });

  it('IEC 60062: the code takes the expected quantity when it has no unit', () => {
    expect(parseValue('4K7', 'resistance')).toEqual({ ok: true, value: 4700, quantity: 'resistance' });
    expect(parseValue('22M', 'resistance')).toEqual({ ok: true, value: 22e6, quantity: 'resistance' });
    expect(parseValue('2n2', 'capacitance')).toEqual({ ok: true, value: 2.2e-9, quantity: 'capacitance' });
    expect(parseValue('2n2F')).toEqual({ ok: true, value: 2.2e-9, quantity: 'capacitance' });
  });

  it('IEC 60062: R marks ohms, so it cannot be another quantity', () => {
    expect(messageOf(parseValue('4R7', 'capacitance'))).toBe('expected a capacitance such as 2n2, got a resistance (4R7)');
    expect(messageOf(parseValue('4R7V'))).toBe('"4R7V": the R in a letter code means ohms, but the unit is for a voltage');
  });

  it('IEC 60062: a code carries one multiplier letter only', () => {
    expect(messageOf(parseValue('4K7K'))).toBe('"4K7K": the letter code 4K7 already sets the multiplier, so "K" cannot follow it');
    expect(messageOf(parseValue('4.7K7'))).toContain('cannot also have one');
  });
});

describe('SI prefixes and unit symbols (SI Brochure, 9th edition)', () => {
  it.each<[string, number, Quantity]>([
    ['4.7 kΩ', 4700, 'resistance'],
    ['4.7kΩ', 4700, 'resistance'],
    ['4.7 kΩ', 4700, 'resistance'], // U+2126 OHM SIGN, folded by NFKC
    ['4.7k ohm', 4700, 'resistance'],
    ['4.7 k Ω', 4700, 'resistance'],
    ['4.7 kOhms', 4700, 'resistance'],
    ['22 MΩ', 22e6, 'resistance'],
    ['2.2 nF', 2.2e-9, 'capacitance'],
    ['100 pF', 100e-12, 'capacitance'],
    ['2.2 µF', 2.2e-6, 'capacitance'],
    ['2.2 uF', 2.2e-6, 'capacitance'],
    ['1mF', 1e-3, 'capacitance'],
    ['1.9kV', 1900, 'voltage'],
    ['2kV', 2000, 'voltage'],
    ['700mA', 0.7, 'current'],
    ['250mW', 0.25, 'power'],
    ['50 kHz', 50e3, 'frequency'],
    ['1GHz', 1e9, 'frequency'],
    ['10µH', 10e-6, 'inductance'],
    ['85°C', 85, 'temperature'],
    ['85 °C', 85, 'temperature'],
    ['85℃', 85, 'temperature'],
    ['85C', 85, 'temperature'],
    ['2.2e-9', 2.2e-9, 'plain'],
    ['.5', 0.5, 'plain'],
  ])('SI: %s = %d', (input, value, quantity) => {
    expect(parseValue(input)).toEqual({ ok: true, value, quantity });
  });

  it('SI: case matters, m is milli and M is mega; k and K are both kilo', () => {
    expect(valueOf(parseValue('10mA'))).toBe(0.01);
    expect(valueOf(parseValue('10MΩ'))).toBe(10e6);
    expect(valueOf(parseValue('10mΩ'))).toBe(0.01);
    expect(valueOf(parseValue('4.7K'))).toBe(4700);
    expect(valueOf(parseValue('4.7k'))).toBe(4700);
  });

  it('SPICE habit: MEG and meg are mega (unlike SPICE, a bare M is mega too)', () => {
    expect(valueOf(parseValue('1MEG'))).toBe(1e6);
    expect(valueOf(parseValue('1meg', 'resistance'))).toBe(1e6);
    expect(parseValue('1megohm')).toEqual({ ok: true, value: 1e6, quantity: 'resistance' });
  });

  it('resistor power as a fraction of a watt: 1/4W and 1/8 W', () => {
    expect(parseValue('1/4W')).toEqual({ ok: true, value: 0.25, quantity: 'power' });
    expect(parseValue('1/8 W')).toEqual({ ok: true, value: 0.125, quantity: 'power' });
    expect(parseValue('1/2', 'power')).toEqual({ ok: true, value: 0.5, quantity: 'power' });
  });

  it('temperature: negative values, never a prefix', () => {
    expect(valueOf(parseValue('-40°C'))).toBe(-40);
    expect(valueOf(parseValue('−40 °C'))).toBe(-40); // U+2212 MINUS SIGN
    expect(valueOf(parseValue('-40', 'temperature'))).toBe(-40);
    expect(valueOf(parseValue('+85°C'))).toBe(85);
    expect(messageOf(parseValue('300K', 'temperature'))).toBe(
      '"300K": a temperature takes no prefix ("K"); write degrees Celsius such as 85°C (kelvin is not accepted)',
    );
  });

  // js-quantities is the outside reference: the same strings through its parser,
  // converted to the base unit, must give our number.
  it.each<[string, string]>([
    ['4.7 kOhm', 'Ohm'],
    ['22 MOhm', 'Ohm'],
    ['0.47 Ohm', 'Ohm'],
    ['2.2 nF', 'F'],
    ['100 pF', 'F'],
    ['47 uF', 'F'],
    ['700 mA', 'A'],
    ['250 mW', 'W'],
    ['1.9 kV', 'V'],
    ['50 kHz', 'Hz'],
    ['10 uH', 'H'],
  ])('SI, checked against js-quantities: %s', (input, baseUnit) => {
    expect(Math.abs(valueOf(parseValue(input)) / Qty(input).to(baseUnit).scalar - 1)).toBeLessThan(1e-12);
  });

  it('SI, checked against js-quantities for random values, prefixes and units', () => {
    const prefixes = ['p', 'n', 'u', 'm', '', 'k', 'M', 'G'];
    const units = ['Ohm', 'F', 'V', 'A', 'W', 'Hz', 'H'];
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 999_999 }),
        fc.integer({ min: 0, max: 5 }),
        fc.constantFrom(...prefixes),
        fc.constantFrom(...units),
        (digits, decimals, prefix, unit) => {
          const input = `${(digits / 10 ** decimals).toFixed(decimals)} ${prefix}${unit}`;
          const ours = parseValue(input);
          if (unit === 'F' && ['k', 'M', 'G'].includes(prefix)) {
            // Deliberate difference: js-quantities reads MF as megafarads; we refuse
            // kF, MF and GF because old capacitor markings used MF for microfarads.
            expect(ours.ok).toBe(false);
            return;
          }
          const reference = Qty(input).to(unit).scalar;
          expect(Math.abs(valueOf(ours) / reference - 1)).toBeLessThan(1e-12);
        },
      ),
    );
  });
});

describe('expected quantity', () => {
  it('a unit of another quantity is an error naming both', () => {
    expect(parseValue('700mA', 'voltage')).toEqual({
      ok: false,
      message: 'expected a voltage such as 2kV, got a current (700mA)',
    });
    expect(messageOf(parseValue('2.2nF', 'resistance'))).toBe('expected a resistance such as 4K7, got a capacitance (2.2nF)');
    expect(messageOf(parseValue('5V', 'plain'))).toBe('expected a plain number such as 4.7k, got a voltage (5V)');
  });

  it('a bare or prefixed number is taken as the expected quantity', () => {
    expect(parseValue('2k', 'voltage')).toEqual({ ok: true, value: 2000, quantity: 'voltage' });
    expect(parseValue('12', 'current')).toEqual({ ok: true, value: 12, quantity: 'current' });
    expect(parseValue('4K7', 'plain')).toEqual({ ok: true, value: 4700, quantity: 'plain' });
  });

  it('the matching unit is accepted', () => {
    expect(parseValue('1.9kV', 'voltage')).toEqual({ ok: true, value: 1900, quantity: 'voltage' });
  });
});

describe('bad input: an error naming the problem, never a guess', () => {
  it.each<[string, string]>([
    ['', 'enter a value, such as 4K7 or 2.2nF'],
    ['   ', 'enter a value, such as 4K7 or 2.2nF'],
    ['abc', '"abc" is not a value: write a number with an optional prefix and unit (4.7kΩ, 2.2nF, 1/4W) or a letter code (4K7, 2n2, 0R47)'],
    ['NaN', '"NaN" is not a value'],
    ['Infinity', '"Infinity" is not a value'],
    ['4,7k', '"4,7k": commas are not accepted; use a point as the decimal mark (4.7k, not 4,7k) and no thousands separators'],
    ['1,000', 'commas are not accepted'],
    ['1..2', '"1..2" has more than one decimal point'],
    ['1.2.3V', '"1.2.3V" has more than one decimal point'],
    ['1/0W', '"1/0W": a fraction cannot divide by zero'],
    ['1e400', '"1e400" is too large'],
    ['1e-400', '"1e-400" is too small'],
    ['9'.repeat(60) + 'e300', 'is too large'],
    ['4.7x', '"4.7x": unknown prefix or unit "x"'],
    ['4.7 QΩ', 'unknown prefix or unit "QΩ"'],
    ['4.7 kΩΩ', 'unknown prefix or unit "kΩΩ"'],
    ['5v', '"5v": write the unit as V (volts); units and prefixes are case-sensitive'],
    ['100nf', 'write the unit as F (farads)'],
    ['10 khz', 'write the unit as Hz (hertz)'],
    ['10MF', '"10MF": "MF" is an old marking for microfarads; write µF (or uF)'],
    ['10 mfd', '"mfd" is an old marking for microfarads'],
    ['-5V', '"-5V": negative values are only accepted for temperatures'],
    ['-1/4W', 'negative values are only accepted for temperatures'],
    ['-4K7', 'negative values are only accepted for temperatures'],
    ['-3', 'negative values are only accepted for temperatures'],
    ['1/4.5W', 'unknown prefix or unit'],
    ['4 7k', 'unknown prefix or unit "7k"'],
    ['1e', 'unknown prefix or unit "e"'],
    ['300 \u212A', 'kelvin is not accepted'], // KELVIN SIGN, which NFKC would fold into a K (kilo)
    ['x'.repeat(100), 'is too long to be a value'],
  ])('rejects %j', (input, message) => {
    expect(messageOf(parseValue(input))).toContain(message);
  });

  it('rejects a capacitance in kF, MF or GF (old markings used MF for µF)', () => {
    expect(messageOf(parseValue('4K7', 'capacitance'))).toBe(
      '"4K7": k, M and G are not used for capacitance (old markings wrote MF for µF); write pF, nF, µF (uF) or mF',
    );
    expect(parseValue('10M', 'capacitance').ok).toBe(false);
  });

  it('never throws and never returns a non-finite value, whatever the text', () => {
    const alphabet = fc.constantFrom(...'0123456789.,/-+−eERKkMmGpnuµ ΩFVAWCHz°x'.split(''));
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.string({ unit: alphabet, maxLength: 12 })), (input) => {
        const result = parseValue(input);
        if (result.ok) expect(Number.isFinite(result.value)).toBe(true);
        else expect(result.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 2000 },
    );
  });

  it('returns an error for a non-string from untyped callers', () => {
    expect(parseValue(42 as unknown as string)).toEqual({ ok: false, message: 'the value must be text' });
  });
});
