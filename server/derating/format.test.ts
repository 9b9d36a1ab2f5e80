import { describe, expect, it } from 'vitest';
import { fmt, pct } from './format';

describe('fmt: quantities in formula texts', () => {
  it('writes plain numbers between 0.1 and 1000 and SI prefixes outside', () => {
    expect(fmt(0.25, 'W')).toBe('0.25 W');
    expect(fmt(200, 'V')).toBe('200 V');
    expect(fmt(22e6, 'Ω')).toBe('22 MΩ');
    expect(fmt(2345.2, 'V')).toBe('2.345 kV');
    expect(fmt(200 ** 2 / 22e6, 'W')).toBe('1.818 mW');
    expect(fmt(6.993e-6, 'A')).toBe('6.993 µA');
    expect(fmt(1e-9, 'F')).toBe('1 nF');
    expect(fmt(0.00099996, 'V')).toBe('1 mV');
    expect(fmt(0, 'A')).toBe('0 A');
    expect(fmt(-2000, 'V')).toBe('-2 kV');
  });

  it('never prefixes temperatures', () => {
    expect(fmt(165.1, '°C')).toBe('165.1 °C');
    expect(fmt(1500, '°C')).toBe('1500 °C');
  });

  it('keeps long times in seconds and short ones in ms', () => {
    expect(fmt(1500, 's')).toBe('1500 s');
    expect(fmt(0.002, 's')).toBe('2 ms');
  });

  it('writes fractions as percentages', () => {
    expect(pct(0.8)).toBe('80 %');
    expect(pct(2000 / 13 / 200)).toBe('76.92 %');
  });
});
