import { describe, expect, it } from 'vitest';
import { CHECK_NAMES } from '../../../server/derating';
import { checkLabel, checkLabels, describeMissing, formulaSteps } from './words';

describe('stress check words', () => {
  it('names every check of the engine in words', () => {
    for (const name of CHECK_NAMES) expect(checkLabels[name], name).toMatch(/^[A-Z]/);
    expect(checkLabel('resistor.voltage')).toBe('Resistor voltage');
    expect(checkLabel('transistor.junctionTemp')).toBe('Junction temperature');
  });

  it('says whether a missing input belongs to the line or to the part', () => {
    expect(describeMissing('operatingPoint.voltageV')).toEqual({ where: 'operating', text: 'working voltage' });
    expect(describeMissing('operatingPoint.ambientC (or the BOM ambientC)')).toEqual({ where: 'operating', text: 'ambient temperature' });
    expect(describeMissing('ratings.levV')).toEqual({ where: 'rating', text: 'limiting element voltage (LEV)' });
  });

  it('splits a formula into its steps without breaking the source in brackets', () => {
    const formula =
      'applied = V = 190 V; rated = min(√(P·R), LEV) = 200 V; ratio = 190 V ÷ 200 V = 95 %; limit = 80 % [common practice (voltage ≤ 80 % of U_max); P]';
    expect(formulaSteps(formula)).toEqual([
      'applied = V = 190 V',
      'rated = min(√(P·R), LEV) = 200 V',
      'ratio = 190 V ÷ 200 V = 95 %',
      'limit = 80 % [common practice (voltage ≤ 80 % of U_max); common practice]',
    ]);
    expect(formulaSteps('limit = 80 % [RAC Benign; C]')).toEqual(['limit = 80 % [RAC Benign; confirmed]']);
  });
});
