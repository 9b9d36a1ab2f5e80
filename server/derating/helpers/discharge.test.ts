import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { SAFE_VOLTAGE_PRESETS, computeDischarge, dischargeInputSchema } from './discharge';

const issues = (input: unknown) => {
  const r = dischargeInputSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('bleeder discharge', () => {
  it('§8 #21 1 µF from 2000 V through 10 MΩ: τ 10 s, 35.07 s to 60 V, 40.75 s to 34 V [60204-1; C]', () => {
    const to60 = computeDischarge({ capacitanceF: 1e-6, resistanceOhm: 10e6, v0V: 2000, safeV: 60 });
    expect(to60.tauS).toBeCloseTo(10, 9);
    expect(to60.timeToSafeS).toBeCloseTo(35.07, 2);
    expect(computeDischarge({ capacitanceF: 1e-6, resistanceOhm: 10e6, v0V: 2000, safeV: 34 }).timeToSafeS).toBeCloseTo(40.75, 2);
  });

  it('§8 #22 X-capacitor 0.47 µF at 230 V mains: R_max 942 kΩ for 34 V in 1 s; 1 MΩ leaves 38.7 V and fails [60335-1; C]', () => {
    const v0V = 230 * Math.SQRT2;
    expect(v0V).toBeCloseTo(325.3, 1);
    const d = computeDischarge({ capacitanceF: 0.47e-6, resistanceOhm: 1e6, v0V, safeV: 34, deadlineS: 1 });
    expect(d.deadline!.maxResistanceOhm / 1e3).toBeCloseTo(942, 0);
    expect(d.tauS).toBeCloseTo(0.47, 12);
    expect(d.deadline!.voltageAtDeadlineV).toBeCloseTo(38.7, 1);
    expect(d.deadline!.status).toBe('over_rating');
    // The largest R meets the deadline exactly: that passes.
    const atMax = computeDischarge({ capacitanceF: 0.47e-6, resistanceOhm: d.deadline!.maxResistanceOhm, v0V, safeV: 34, deadlineS: 1 });
    expect(atMax.deadline!.voltageAtDeadlineV).toBeCloseTo(34, 9);
    expect(atMax.deadline!.status).toBe('close');
  });

  it('§8 #23 machinery: 100 µF at 400 V to 60 V within 5 s: R_max 26.36 kΩ, bleeder 6.07 W [60204-1; C]', () => {
    const d = computeDischarge({ capacitanceF: 100e-6, resistanceOhm: 10e3, v0V: 400, safeV: 60, deadlineS: 5 });
    expect(d.deadline!.maxResistanceOhm / 1e3).toBeCloseTo(26.36, 2);
    const at = computeDischarge({ capacitanceF: 100e-6, resistanceOhm: 26_360, v0V: 400, safeV: 60 });
    expect(at.bleederPowerW).toBeCloseTo(6.07, 2);
    expect(d.deadline!.status).toBe('clear'); // 10 kΩ: 1.9 s of the 5 s allowed
  });

  it('reports the voltage at a chosen time and the stored charge and energy', () => {
    const d = computeDischarge({ capacitanceF: 1e-6, resistanceOhm: 10e6, v0V: 2000, safeV: 60, atTimeS: 10 });
    expect(d.voltageAtTimeV).toBeCloseTo(2000 / Math.E, 9);
    expect(d.chargeC).toBeCloseTo(2e-3, 12);
    expect(d.energyJ).toBeCloseTo(2, 12);
    expect(d.formula).toContain('τ = R·C = 10 MΩ × 1 µF = 10 s');
  });

  it('offers safe-voltage presets that name their source and confidence', () => {
    const byId = Object.fromEntries(SAFE_VOLTAGE_PRESETS.map((p) => [p.id, p]));
    expect(byId['dc-60v-5s']).toMatchObject({ safeV: 60, deadlineS: 5 });
    expect(byId['dc-60v-5s'].sources).toEqual([
      expect.objectContaining({ tag: '60204-1', clause: '6.2.4', confidence: 'C' }),
      expect.objectContaining({ tag: '62368-1', confidence: 'M' }),
    ]);
    expect(byId['selv-42v4-peak']).toMatchObject({ safeV: 42.4, deadlineS: null, sources: [expect.objectContaining({ tag: '60335-1', clause: '8.1.4', confidence: 'C' })] });
    expect(byId['plug-34v-1s']).toMatchObject({ safeV: 34, deadlineS: 1, sources: [expect.objectContaining({ tag: '60335-1', clause: '22.5', confidence: 'C' })] });
  });
});

describe('discharge input', () => {
  const GOOD = { capacitanceF: 1e-6, resistanceOhm: 1e6, v0V: 400, safeV: 60 };

  it('rejects a safe voltage at or above V0', () => {
    const msg = 'safeV: safeV must be below v0V: a capacitor already at or below the safe voltage needs no discharge time';
    expect(issues({ ...GOOD, safeV: 400 })).toEqual([msg]);
    expect(issues({ ...GOOD, safeV: 500 })).toEqual([msg]);
  });

  it('rejects zero or negative capacitance and resistance, and non-finite values', () => {
    expect(issues({ ...GOOD, capacitanceF: 0 })).toEqual(['capacitanceF: capacitanceF must be greater than 0 F']);
    expect(issues({ ...GOOD, resistanceOhm: -1 })).toEqual(['resistanceOhm: resistanceOhm must be greater than 0 Ω']);
    expect(issues({ ...GOOD, v0V: Number.POSITIVE_INFINITY })).toEqual(['v0V: v0V must be a finite number (V)']);
    expect(issues({ ...GOOD, deadlineS: 0 })).toEqual(['deadlineS: deadlineS must be greater than 0 s']);
    expect(issues({ ...GOOD, atTimeS: -1 })).toEqual(['atTimeS: atTimeS must be 0 s or more']);
  });

  it('throws a ZodError from the compute function', () => {
    expect(() => computeDischarge({ ...GOOD, safeV: 0 })).toThrow(ZodError);
  });
});
