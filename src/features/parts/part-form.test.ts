import { describe, expect, it } from 'vitest';
import { emptyPartForm, partFormSchema, partFormValues } from './part-form';
import type { Part } from './api';

const issuesOf = (input: unknown) => {
  const result = partFormSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => [i.path.join('.'), i.message]);
};

describe('the part form', () => {
  it('turns the typed form into the body the API stores', () => {
    const result = partFormSchema.parse({
      ...emptyPartForm,
      internalPn: 'TB-C-2N2-2KV',
      category: 'capacitor',
      package: '1206',
      hsCode: '8532.24',
      unitWeightG: '0.012',
      ratings: { capacitanceF: '2n2', ratedVoltageV: '2kV', dielectric: 'hv_ceramic' },
    });
    expect(result).toMatchObject({
      internalPn: 'TB-C-2N2-2KV',
      pins: 2,
      hsCode: '853224',
      unitWeightG: '0.012',
      ratings: { capacitanceF: 2.2e-9, ratedVoltageV: 2000, dielectric: 'hv_ceramic' },
    });
  });

  it('leaves optional codes empty as null', () => {
    const result = partFormSchema.parse({ ...emptyPartForm, internalPn: 'TB-X', category: 'other' });
    expect(result.hsCode).toBeNull();
    expect(result.unitWeightG).toBeNull();
    expect(result.ratings).toEqual({});
  });

  it('puts each problem on its own field', () => {
    const issues = issuesOf({ ...emptyPartForm, internalPn: '', pins: 'two', hsCode: '85', ratings: { resistanceOhm: '2kV' } });
    const paths = issues.map(([path]) => path);
    expect(paths).toEqual(expect.arrayContaining(['internalPn', 'pins', 'hsCode', 'ratings.resistanceOhm']));
  });

  it('reads a stored part back into the same body', () => {
    const part: Part = {
      id: '7', internalPn: 'TB-R-22M', mpn: 'HVR-22M', manufacturer: 'Demo', category: 'resistor', description: 'bleeder',
      package: '1206', mount: 'smt', pins: 2, hsCode: '853321', unitWeightG: '0.0100', ratings: { resistanceOhm: 22e6, powerW: 0.25, levV: 3000 }, version: 3,
    };
    const body = partFormSchema.parse(partFormValues(part));
    expect(body.ratings).toEqual(part.ratings);
    expect(body.unitWeightG).toBe('0.01');
  });
});
