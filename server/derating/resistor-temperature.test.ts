import { describe, expect, it } from 'vitest';
import { resistorPowerFactor } from './resistor-temperature';
import { resistorRatedVoltage } from './resistor-voltage';

// Standard curve: full power to 70 °C, linear to zero at 155 °C [CHIP-TF, CFR; C] [MISC-R; C].
describe('resistorPowerFactor: the power-vs-ambient curve', () => {
  it('§8 #9: f(70) = 1.000, f(100) = 0.647, f(125) = 0.353, f(155) = 0, f(−20) = 1.000 [CHIP-TF, RCM; C]', () => {
    expect(resistorPowerFactor(70)).toBe(1);
    expect(resistorPowerFactor(100)).toBeCloseTo(0.647, 3);
    expect(resistorPowerFactor(125)).toBeCloseTo(0.353, 3);
    expect(resistorPowerFactor(155)).toBe(0);
    expect(resistorPowerFactor(-20)).toBe(1);
  });

  it('§8 #9: a 1 W, 10 kΩ part at 125 °C may take √(0.353 × 1 W × 10 kΩ) = 59.4 V [CHIP-TF, RCM; C]', () => {
    const powerAt125 = 1 * resistorPowerFactor(125);
    expect(Math.sqrt(powerAt125 * 1e4)).toBeCloseTo(59.4, 1);
  });

  it('RCM check of the curve: 35.3 % at 125 °C, close to the maker\'s rounded 35 % (59.16 V) [RCM; C]', () => {
    expect(resistorPowerFactor(125) * 100).toBeCloseTo(35.3, 1);
    expect(Math.sqrt(0.35 * 1 * 1e4)).toBeCloseTo(59.16, 2);
  });

  it('is zero beyond the zero-power point and falls linearly between knee and zero', () => {
    expect(resistorPowerFactor(200)).toBe(0);
    expect(resistorPowerFactor(112.5)).toBeCloseTo(0.5, 12);
    expect(resistorPowerFactor(70.000001)).toBeLessThan(1);
  });

  it('uses a datasheet\'s own knee and zero-power point (125 °C zero on some small chips) [CHIP-TF, TNPW; C]', () => {
    expect(resistorPowerFactor(97.5, 70, 125)).toBeCloseTo(0.5, 12);
    expect(resistorPowerFactor(125, 70, 125)).toBe(0);
    expect(resistorPowerFactor(80, 85, 155)).toBe(1);
  });

  it('rejects a zero-power point at or below the knee', () => {
    expect(() => resistorPowerFactor(50, 100, 100)).toThrow(/must be above derateKneeC/);
  });
});

describe('resistorRatedVoltage: min(√(P·R), LEV) [MIL-39005; C] [CFR "whichever is less"; C]', () => {
  it('§8 #10: RCWV at 100 kΩ is 158.1 V, at 1 MΩ the 250 V LEV [IEC 60115-1 cl. 4.13 via CFR; C]', () => {
    expect(resistorRatedVoltage(0.25, 1e5, 250)).toBeCloseTo(158.1, 1);
    expect(resistorRatedVoltage(0.25, 1e6, 250)).toBe(250);
    // The overload test is 2.5 × RCWV, capped at the 500 V maximum overload voltage.
    expect(2.5 * resistorRatedVoltage(0.25, 1e5, 250)).toBeCloseTo(395.3, 1);
    expect(Math.min(2.5 * resistorRatedVoltage(0.25, 1e6, 250), 500)).toBe(500);
  });
});
