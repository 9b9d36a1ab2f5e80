import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { computeMultiplier, multiplierInputSchema } from './multiplier';

const issues = (input: unknown) => {
  const r = multiplierInputSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

const GOOD = { stages: 3, vPeakV: 2000, loadCurrentA: 1e-3, frequencyHz: 5e4, capacitanceF: 1e-9 };

describe('multiplier (half-wave Cockcroft-Walton, equal C)', () => {
  it('§8 #27 n = 3, Vpk = 2 kV: 12 kV no-load; first capacitor 2 kV, the other five 4 kV; six diodes at 4 kV [CW; no-load C, stresses M]', () => {
    const m = computeMultiplier({ ...GOOD, loadCurrentA: 0 });
    expect(m.noLoadV).toBe(12_000);
    const caps = m.positions.filter((p) => p.kind === 'capacitor');
    const diodes = m.positions.filter((p) => p.kind === 'diode');
    expect(caps.map((c) => c.position)).toEqual(['C1', 'C2', 'C3', 'C4', 'C5', 'C6']);
    expect(caps.map((c) => c.operatingPoint.voltageV)).toEqual([2000, 4000, 4000, 4000, 4000, 4000]);
    expect(diodes.map((d) => d.position)).toEqual(['D1', 'D2', 'D3', 'D4', 'D5', 'D6']);
    expect(diodes.every((d) => d.operatingPoint.voltageV === 4000)).toBe(true);
  });

  it('§8 #27 at 80 %: capacitors need ≥ 5 kV (first ≥ 2.5 kV), diodes ≥ 5 kV V_RRM [CW M; P]', () => {
    const m = computeMultiplier({ ...GOOD, limit: 0.8 });
    const byPos = Object.fromEntries(m.positions.map((p) => [p.position, p.minRatedV]));
    expect(byPos.C1).toBeCloseTo(2500, 9);
    expect(byPos.C2).toBeCloseTo(5000, 9);
    expect(byPos.C6).toBeCloseTo(5000, 9);
    expect(byPos.D1).toBeCloseTo(5000, 9);
  });

  it('§8 #28 n = 3, I = 1 mA, f = 50 kHz, C = 1 nF: I/(fC) 20 V, ripple 120 V, drop 440 V, loaded 11 560 V, n_opt 10 [CW; C]', () => {
    const m = computeMultiplier(GOOD);
    expect(m.loadUnitV).toBeCloseTo(20, 9);
    expect(m.ripplePeakToPeakV).toBeCloseTo(120, 9);
    expect(m.dropV).toBeCloseTo(440, 9);
    expect(m.loadedV).toBeCloseTo(11_560, 9);
    expect(m.optimumStages).toBeCloseTo(10, 9);
    expect(m.bestWholeStages).toBe(10);
    expect(m.formula).toContain('= 440 V');
    expect(m.formula).toContain('11.56 kV');
  });

  it('§8 #28 the drop agrees with its other form (I/(fC))·(2n³/3 + n²/2 − n/6) [CW; C]', () => {
    const m = computeMultiplier({ ...GOOD, stages: 7 });
    const n = 7;
    expect(m.dropV).toBeCloseTo(m.loadUnitV * ((2 * n ** 3) / 3 + n ** 2 / 2 - n / 6), 9);
  });

  it('§8 #29 pins the textbook ripple (120 V), not the 97.5 V of the alternative form [CW; C]', () => {
    const m = computeMultiplier(GOOD);
    const alternative = (1e-3 * (36 + 3)) / (8 * 5e4 * 1e-9);
    expect(alternative).toBeCloseTo(97.5, 9);
    expect(m.ripplePeakToPeakV).not.toBeCloseTo(alternative, 0);
  });

  it('the best whole stage count gives the highest loaded output of its neighbours', () => {
    const m = computeMultiplier({ ...GOOD, capacitanceF: 2.2e-9, loadCurrentA: 3e-4 });
    const best = m.bestWholeStages!;
    const loaded = (stages: number) => computeMultiplier({ ...GOOD, capacitanceF: 2.2e-9, loadCurrentA: 3e-4, stages }).loadedV;
    expect(loaded(best)).toBeGreaterThanOrEqual(loaded(best - 1));
    expect(loaded(best)).toBeGreaterThanOrEqual(loaded(best + 1));
  });

  it('gives each diode the load current as its average forward current (steady-state charge balance; textbook, from memory)', () => {
    const m = computeMultiplier(GOOD);
    expect(m.positions.filter((p) => p.kind === 'diode').every((d) => d.operatingPoint.currentA === 1e-3)).toBe(true);
  });

  it('has no optimum with no load, and warns when the load drop swallows the output', () => {
    const none = computeMultiplier({ ...GOOD, loadCurrentA: 0 });
    expect(none).toMatchObject({ optimumStages: null, bestWholeStages: null, dropV: 0, loadedV: 12_000, warnings: [] });
    const overloaded = computeMultiplier({ ...GOOD, loadCurrentA: 0.1 });
    expect(overloaded.loadedV).toBe(0);
    expect(overloaded.warnings[0]).toMatch(/cannot supply this current/);
  });

  it('a single stage is the Greinacher doubler: 2·Vpk out, C1 at Vpk, C2 at 2·Vpk [CW; M]', () => {
    const m = computeMultiplier({ ...GOOD, stages: 1, loadCurrentA: 0 });
    expect(m.noLoadV).toBe(4000);
    expect(m.positions.map((p) => [p.position, p.operatingPoint.voltageV])).toEqual([
      ['C1', 2000],
      ['C2', 4000],
      ['D1', 4000],
      ['D2', 4000],
    ]);
  });

  it('carries the caution', () => {
    expect(computeMultiplier(GOOD).caution).toMatch(/High voltage can injure/);
  });
});

describe('multiplier input', () => {
  it('rejects fewer than one stage, fractional stages and zero or negative capacitance', () => {
    expect(issues({ ...GOOD, stages: 0 })).toEqual(['stages: stages must be at least 1']);
    expect(issues({ ...GOOD, stages: 2.5 })).toEqual(['stages: stages must be a whole number']);
    expect(issues({ ...GOOD, capacitanceF: 0 })).toEqual(['capacitanceF: capacitanceF must be greater than 0 F']);
    expect(issues({ ...GOOD, capacitanceF: -1e-9 })).toEqual(['capacitanceF: capacitanceF must be greater than 0 F']);
  });

  it('rejects non-finite and missing numbers, naming the field and unit', () => {
    expect(issues({ ...GOOD, vPeakV: Number.POSITIVE_INFINITY })).toEqual(['vPeakV: vPeakV must be a finite number (V)']);
    expect(issues({ ...GOOD, frequencyHz: Number.NaN })).toEqual(['frequencyHz: frequencyHz must be a finite number (Hz)']);
    expect(issues({ ...GOOD, frequencyHz: undefined })).toEqual(['frequencyHz: frequencyHz is required (Hz)']);
    expect(issues({ ...GOOD, loadCurrentA: -1 })).toEqual(['loadCurrentA: loadCurrentA must be 0 A or more']);
    expect(issues({ ...GOOD, limit: 80 })).toEqual(['limit: limit is a fraction of the rating, at most 1 (0.8 means 80 %)']);
  });

  it('throws a ZodError from the compute function', () => {
    expect(() => computeMultiplier({ ...GOOD, stages: 0 })).toThrow(ZodError);
  });
});
