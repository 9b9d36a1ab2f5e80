import { describe, it, expect } from 'vitest';
import { z } from 'zod';
import { valueField } from './value-field';

describe('valueField: a zod field taking a number or the trade notation', () => {
  const rating = z.object({ ratedVoltageV: valueField('voltage'), capacitanceF: valueField('capacitance') });

  it('turns IEC 60062 codes and SI strings into numbers and passes finite numbers through', () => {
    expect(rating.parse({ ratedVoltageV: '2kV', capacitanceF: '2n2' })).toEqual({ ratedVoltageV: 2000, capacitanceF: 2.2e-9 });
    expect(rating.parse({ ratedVoltageV: 50, capacitanceF: 1e-9 })).toEqual({ ratedVoltageV: 50, capacitanceF: 1e-9 });
  });

  it("carries the parser's message on the field's path", () => {
    const result = rating.safeParse({ ratedVoltageV: '700mA', capacitanceF: '4,7n' });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['ratedVoltageV', 'expected a voltage such as 2kV, got a current (700mA)'],
      [
        'capacitanceF',
        '"4,7n": commas are not accepted; use a point as the decimal mark (4.7k, not 4,7k) and no thousands separators',
      ],
    ]);
  });

  it('rejects non-finite numbers, other types, and negative numbers except temperatures', () => {
    const volts = valueField('voltage');
    expect(volts.safeParse(Number.NaN).success).toBe(false);
    expect(volts.safeParse(Number.POSITIVE_INFINITY).success).toBe(false);
    expect(volts.safeParse(true).error?.issues[0].message).toBe('expected a number or a value such as 2kV');
    expect(volts.safeParse(-5).error?.issues[0].message).toBe('negative values are only accepted for temperatures');
    expect(valueField('temperature').parse(-40)).toBe(-40);
    expect(valueField('temperature').parse('-40°C')).toBe(-40);
  });
});
