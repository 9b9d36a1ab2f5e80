import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { computeJunctionTemp, junctionTempInputSchema } from './junction-temp';

const issues = (input: unknown) => {
  const r = junctionTempInputSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

const TO92 = { ambientC: 40, powerW: 0.3, rthJaCPerW: 200, tjMaxC: 150 }; // [BJT-DS; C]

describe('junction temperature', () => {
  it('§8 #11 TO-92, 200 K/W, 0.30 W at 40 °C: Tj = 100 °C [TOSHIBA, BJT-DS; C]', () => {
    const j = computeJunctionTemp(TO92);
    expect(j.tjC).toBeCloseTo(100, 9);
    expect(j.status).toBe('clear');
  });

  it('§8 #11 SOT-23 at 417 K/W: Tj = 165.1 °C, above Tj,max 150 °C: fail (absolute) [TOSHIBA, BJT-DS; C]', () => {
    const j = computeJunctionTemp({ ...TO92, rthJaCPerW: 417 });
    expect(j.tjC).toBeCloseTo(165.1, 1);
    expect(j.status).toBe('over_rating');
  });

  it('§8 #12 allowed dissipation at 60 °C for Tj,max 150 °C is 450 mW [BJT-DS; C]', () => {
    expect(computeJunctionTemp({ ...TO92, ambientC: 60 }).allowedPowerW).toBeCloseTo(0.45, 12);
  });

  it('§8 #13 with a Tj limit of 125 °C at 60 °C: 0.325 W [formula; tier P/M]', () => {
    const j = computeJunctionTemp({ ...TO92, ambientC: 60, tjLimitC: 125 });
    expect(j.allowedPowerAtLimitW).toBeCloseTo(0.325, 12);
    // 0.3 W: Tj 120 °C against the 125 °C limit: 60/90 against 65/90.
    expect(j.ratio).toBeCloseTo(60 / 90, 12);
    expect(j.limit).toBeCloseTo(65 / 90, 12);
    expect(j.status).toBe('close');
    expect(computeJunctionTemp({ ...TO92, ambientC: 60, tjLimitC: 125, powerW: 0.325 }).status).toBe('close');
    expect(computeJunctionTemp({ ...TO92, ambientC: 60, tjLimitC: 125, powerW: 0.33 }).status).toBe('beyond_policy');
  });

  it('allows no power when the ambient is at or above Tj,max', () => {
    const j = computeJunctionTemp({ ...TO92, ambientC: 160, powerW: 0 });
    expect(j.allowedPowerW).toBe(0);
    expect(j.status).toBe('over_rating');
  });
});

describe('junction temperature input', () => {
  it('rejects bad values with clear messages', () => {
    expect(issues({ ...TO92, rthJaCPerW: 0 })).toEqual(['rthJaCPerW: rthJaCPerW must be greater than 0 °C/W']);
    expect(issues({ ...TO92, powerW: -0.1 })).toEqual(['powerW: powerW must be 0 W or more']);
    expect(issues({ ...TO92, ambientC: Number.NEGATIVE_INFINITY })).toEqual(['ambientC: ambientC must be a finite number (°C)']);
    expect(issues({ ...TO92, tjLimitC: 160 })).toEqual(['tjLimitC: tjLimitC must not be above tjMaxC']);
  });

  it('throws a ZodError from the compute function', () => {
    expect(() => computeJunctionTemp({ ...TO92, rthJaCPerW: -1 })).toThrow(ZodError);
  });
});
