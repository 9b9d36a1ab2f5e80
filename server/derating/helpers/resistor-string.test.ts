import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { computeResistorString, resistorStringInputSchema, worstShareV } from './resistor-string';

const issues = (input: unknown) => {
  const r = resistorStringInputSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

// 1206 thick-film chip: 0.25 W, 200 V LEV [CHIP-TF; C]; 22 MΩ as in §8 #1.
const CHIP = { totalV: 2000, resistanceOhm: 22e6, powerW: 0.25, levV: 200, tolerancePct: 0, limit: 0.8 };

describe('resistor string', () => {
  it('§8 #3 2 kV across equal 22 MΩ 1206 chips at 80 %: 13, each 153.8 V (76.9 %), 6.99 µA, 1.08 mW [P + formulas]', () => {
    const s = computeResistorString(CHIP);
    expect(s.count).toBe(13);
    expect(s.ratedEachV).toBe(200);
    expect(s.nominalEachV).toBeCloseTo(153.8, 1);
    expect(s.ratio * 100).toBeCloseTo(76.9, 1);
    expect(s.stringCurrentA * 1e6).toBeCloseTo(6.99, 2);
    expect(s.nominalPowerEachW * 1e3).toBeCloseTo(1.08, 2);
    expect(s.status).toBe('close');
  });

  it('§8 #4 with ±5 %: 13 gives 168.7 V (84.3 %) and fails; 14 gives 156.7 V (78.4 %): 14 [P]', () => {
    expect(worstShareV(2000, 13, 0.05)).toBeCloseTo(168.7, 1);
    expect(worstShareV(2000, 14, 0.05)).toBeCloseTo(156.7, 1);
    const s = computeResistorString({ ...CHIP, tolerancePct: 5 });
    expect(s.count).toBe(14);
    expect(s.worstEachV).toBeCloseTo(156.7, 1);
    expect(s.ratio * 100).toBeCloseTo(78.4, 1);
    expect(s.formula).toContain('n = 13 gives 84.34 %');
  });

  it('§8 #5 VR25 (0.25 W, 1600 V) at 22 MΩ: rated 1600 V; 2 kV with ±5 % needs 2, at 1050 V = 65.6 %; R_crit 10.24 MΩ [VR; C]', () => {
    const s = computeResistorString({ ...CHIP, levV: 1600, tolerancePct: 5 });
    expect(s.ratedEachV).toBe(1600);
    expect(s.count).toBe(2);
    expect(s.worstEachV).toBeCloseTo(1050, 9);
    expect(s.ratio * 100).toBeCloseTo(65.6, 1);
    expect(s.criticalResistanceOhm).toBeCloseTo(10.24e6, 3);
  });

  it('§8 #2 R_crit of a 0.25 W, 200 V 1206 is 160 kΩ [STACKPOLE; C]', () => {
    expect(computeResistorString(CHIP).criticalResistanceOhm).toBeCloseTo(160e3, 6);
  });

  it('§8 #6 R_crit of a 0.1 W, 75 V 0603 is 56.25 kΩ [STACKPOLE; C]', () => {
    expect(computeResistorString({ ...CHIP, powerW: 0.1, levV: 75 }).criticalResistanceOhm).toBeCloseTo(56.25e3, 6);
  });

  it('§8 #7 R_crit of a 0.063 W, 50 V 0402 is 39.68 kΩ [STACKPOLE; C]', () => {
    expect(computeResistorString({ ...CHIP, powerW: 0.063, levV: 50 }).criticalResistanceOhm / 1e3).toBeCloseTo(39.68, 2);
  });

  it('§8 #10 the overload critical resistance (600 V/2.5)²/0.25 W is 230.4 kΩ [MISC-R; C, secondary]', () => {
    expect(computeResistorString({ ...CHIP, levV: 600 / 2.5 }).criticalResistanceOhm).toBeCloseTo(230.4e3, 6);
  });

  it('§8 #31 for 2 kV: a standard 2512 (200 V) needs 13; one Bourns CHV2512 (3000 V) alone, at 66.7 % [CHIP-TF, CHV; C]', () => {
    expect(computeResistorString({ ...CHIP, powerW: 1 }).count).toBe(13);
    const chv = computeResistorString({ ...CHIP, powerW: 1, levV: 3000 });
    expect(chv.count).toBe(1);
    expect(chv.ratio * 100).toBeCloseTo(66.7, 1);
    expect(chv.status).toBe('clear');
  });

  it('uses √(P·R) when it is below the LEV (a low-value, power-limited resistor)', () => {
    const s = computeResistorString({ ...CHIP, resistanceOhm: 100e3 });
    expect(s.ratedEachV).toBeCloseTo(158.11, 2);
    expect(s.count).toBe(Math.ceil(2000 / (0.8 * Math.sqrt(0.25 * 100e3))));
  });

  it('is the fewest that passes: one fewer always exceeds the limit', () => {
    for (const tolerancePct of [0, 1, 5, 10, 20]) {
      for (const totalV of [150, 999, 2000, 4321, 12_000]) {
        const s = computeResistorString({ ...CHIP, totalV, tolerancePct });
        expect(s.ratio).toBeLessThanOrEqual(0.8 * (1 + 1e-9));
        if (s.count > 1) expect(worstShareV(totalV, s.count - 1, tolerancePct / 100) / s.ratedEachV).toBeGreaterThan(0.8);
      }
    }
  });

  it('lands exactly on the limit when the division is exact (1600 V over 10 × 200 V at 80 %)', () => {
    const s = computeResistorString({ ...CHIP, totalV: 1600 });
    expect(s.count).toBe(10);
    expect(s.ratio).toBeCloseTo(0.8, 12);
    expect(s.status).toBe('close');
  });

  it('gives worst-case figures for each resistor\'s operating point', () => {
    const s = computeResistorString({ ...CHIP, tolerancePct: 5 });
    expect(s.operatingPoint.voltageV).toBe(s.worstEachV);
    expect(s.operatingPoint.powerW).toBeCloseTo(s.worstEachV ** 2 / (22e6 * 1.05), 15);
    expect(s.operatingPoint.currentA * 22e6 * 1.05).toBeCloseTo(s.worstEachV, 9);
  });
});

describe('resistor string input', () => {
  it('rejects bad values with clear messages', () => {
    expect(issues({ ...CHIP, totalV: 0 })).toEqual(['totalV: totalV must be greater than 0 V']);
    expect(issues({ ...CHIP, resistanceOhm: -5 })).toEqual(['resistanceOhm: resistanceOhm must be greater than 0 Ω']);
    expect(issues({ ...CHIP, tolerancePct: 100 })).toEqual(['tolerancePct: tolerancePct must be below 100 %']);
    expect(issues({ ...CHIP, tolerancePct: -1 })).toEqual(['tolerancePct: tolerancePct must be 0 % or more']);
    expect(issues({ ...CHIP, limit: 0 })).toEqual(['limit: limit must be above 0']);
    expect(issues({ ...CHIP, levV: Number.NaN })).toEqual(['levV: levV must be a finite number (V)']);
    expect(issues({ ...CHIP, powerW: '1/4W' })).toEqual(['powerW: powerW must be a finite number (W)']);
  });

  it('throws a ZodError from the compute function', () => {
    expect(() => computeResistorString({ ...CHIP, limit: 1.5 })).toThrow(ZodError);
  });
});
