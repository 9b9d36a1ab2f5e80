import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { accessibleBandFor, accessiblePartInputSchema, computeAccessiblePart } from './accessible-part';

const issues = (input: unknown) => {
  const r = accessiblePartInputSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('accessible HV part against IEC 60335-1 cl. 8.1.4', () => {
  it('§8 #24 450 V–15 kV band: 1 nF at 10 kV is 10 µC ≤ 45 µC: pass; 10 nF is 100 µC: fail [60335-1; C]', () => {
    const small = computeAccessiblePart({ capacitanceF: 1e-9, voltageV: 10_000 });
    expect(small.band.id).toBe('charge');
    expect(small.chargeC * 1e6).toBeCloseTo(10, 9);
    expect(small.status).toBe('clear');
    const big = computeAccessiblePart({ capacitanceF: 10e-9, voltageV: 10_000 });
    expect(big.chargeC * 1e6).toBeCloseTo(100, 9);
    expect(big.status).toBe('over_rating');
  });

  it('§8 #25 above 15 kV: 1 nF at 20 kV is 0.20 J ≤ 0.35 J: pass; 2 nF is 0.40 J: fail [60335-1; C]', () => {
    const one = computeAccessiblePart({ capacitanceF: 1e-9, voltageV: 20_000 });
    expect(one.band.id).toBe('energy');
    expect(one.energyJ).toBeCloseTo(0.2, 12);
    expect(one.status).toBe('clear');
    const two = computeAccessiblePart({ capacitanceF: 2e-9, voltageV: 20_000 });
    expect(two.energyJ).toBeCloseTo(0.4, 12);
    expect(two.status).toBe('over_rating');
  });

  it('§8 #26 band selection: 300 V and 450 V use C ≤ 0.1 µF; 15 kV uses 45 µC ("up to and including") [60335-1; C]', () => {
    expect(accessibleBandFor(300).id).toBe('capacitance');
    expect(accessibleBandFor(450).id).toBe('capacitance');
    expect(accessibleBandFor(450.01).id).toBe('charge');
    expect(accessibleBandFor(15_000).id).toBe('charge');
    expect(accessibleBandFor(15_000.01).id).toBe('energy');
    expect(accessibleBandFor(42.4).id).toBe('not_live');
    expect(accessibleBandFor(42.41).id).toBe('capacitance');
  });

  it('§8 #32 1 nF at 12 kV stores 72 mJ (and 12 µC, inside the 45 µC of its band) [formula; 60335-1 C]', () => {
    const p = computeAccessiblePart({ capacitanceF: 1e-9, voltageV: 12_000 });
    expect(p.energyJ * 1e3).toBeCloseTo(72, 9);
    expect(p.chargeC * 1e6).toBeCloseTo(12, 9);
    expect(p.status).toBe('clear');
  });

  it('uses the status bands: at the limit passes (close), within 10 % is close, above fails [60335-1; C]', () => {
    expect(computeAccessiblePart({ capacitanceF: 0.1e-6, voltageV: 300 }).status).toBe('close');
    expect(computeAccessiblePart({ capacitanceF: 0.095e-6, voltageV: 300 }).status).toBe('close');
    expect(computeAccessiblePart({ capacitanceF: 0.09e-6, voltageV: 300 }).status).toBe('clear');
    expect(computeAccessiblePart({ capacitanceF: 0.11e-6, voltageV: 300 }).status).toBe('over_rating');
    expect(computeAccessiblePart({ capacitanceF: 4.5e-9, voltageV: 10_000 }).status).toBe('close'); // exactly 45 µC
  });

  it('treats SELV (≤ 42.4 V peak) as not live whatever the capacitance [60335-1; C]', () => {
    const p = computeAccessiblePart({ capacitanceF: 1000e-6, voltageV: 24 });
    expect(p.band.id).toBe('not_live');
    expect(p.status).toBe('clear');
    expect(p.formula).toContain('not live');
  });
});

describe('accessible part input', () => {
  it('rejects zero or negative capacitance and non-finite voltage', () => {
    expect(issues({ capacitanceF: 0, voltageV: 100 })).toEqual(['capacitanceF: capacitanceF must be greater than 0 F']);
    expect(issues({ capacitanceF: -1e-9, voltageV: 100 })).toEqual(['capacitanceF: capacitanceF must be greater than 0 F']);
    expect(issues({ capacitanceF: 1e-9, voltageV: Number.NaN })).toEqual(['voltageV: voltageV must be a finite number (V (peak))']);
    expect(issues({ capacitanceF: 1e-9 })).toEqual(['voltageV: voltageV is required (V (peak))']);
  });

  it('throws a ZodError from the compute function', () => {
    expect(() => computeAccessiblePart({ capacitanceF: 0, voltageV: 1 })).toThrow(ZodError);
  });
});
