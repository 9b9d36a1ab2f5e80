import { describe, expect, it } from 'vitest';
import { CAREFUL, HI_REL, SHELF_GRADE, policyLimitsSchema } from '../../../server/derating';
import type { StressPolicy } from './api';
import { copyName, policyFormSchema, policyFormValues } from './policy-form';

const asStored = (p: typeof SHELF_GRADE, id = '1'): StressPolicy => ({ id, name: p.name, seededFrom: p.id, limits: p.limits, notes: '', version: 1, isDefault: false });

describe('the stress policy form', () => {
  it('shows each seeded limit as a percentage and reads it back to the same policy (derating rules, "Policies")', () => {
    for (const seeded of [SHELF_GRADE, CAREFUL, HI_REL]) {
      const values = policyFormValues(asStored(seeded));
      expect(values.limits['resistor-voltage'].pct).toBe('80');
      const out = policyFormSchema.parse(values);
      expect(out.limits).toEqual(policyLimitsSchema.parse(seeded.limits));
      // What the form sends is what the server's own schema accepts.
      expect(policyLimitsSchema.safeParse(out.limits).success).toBe(true);
    }
  });

  it('stores a percentage as a fraction of the rating', () => {
    const values = policyFormValues(asStored(SHELF_GRADE));
    values.limits['capacitor-hv_ceramic'] = { pct: '57.5 %', source: 'our HV disc practice', confidence: 'P' };
    values.tj = { marginC: '30', capC: '125', source: '', confidence: '' };
    const out = policyFormSchema.parse(values);
    expect(out.limits.capacitor.hv_ceramic).toEqual({ value: 0.575, source: 'our HV disc practice', confidence: 'P' });
    expect(out.limits.transistor.junctionTemp).toEqual({ marginC: 30, capC: 125 });
  });

  it('refuses a limit above 100 % or not a number, naming the field', () => {
    const values = policyFormValues(asStored(SHELF_GRADE));
    values.limits['led-current'].pct = '120';
    values.limits['diode-current'].pct = 'most';
    const result = policyFormSchema.safeParse(values);
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((i) => i.path.join('.')).sort()).toEqual(['limits.diode-current.pct', 'limits.led-current.pct']);
  });

  it('names a copy so it never clashes with a policy of the workspace', () => {
    expect(copyName('Shelf-grade', ['Shelf-grade', 'Careful'])).toBe('Shelf-grade (copy)');
    expect(copyName('Shelf-grade', ['Shelf-grade', 'Shelf-grade (copy)'])).toBe('Shelf-grade (copy 2)');
  });
});
