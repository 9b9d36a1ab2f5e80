import { describe, expect, it } from 'vitest';
import { emptySupplierForm, splitEmails, supplierFormSchema } from './supplier-form';

describe('the supplier form', () => {
  it('reads contacts pasted on lines, with commas or semicolons', () => {
    expect(splitEmails('sales@lantern.example\n  qa@lantern.example; ops@lantern.example,\n')).toEqual([
      'sales@lantern.example',
      'qa@lantern.example',
      'ops@lantern.example',
    ]);
  });

  it('sends upper-case ISO codes and the addresses as a list', () => {
    const body = supplierFormSchema.parse({
      ...emptySupplierForm,
      name: 'Lantern Components (demo)',
      country: 'cn',
      currency: 'cny',
      contactEmails: 'Sales@Lantern.example',
    });
    expect(body).toMatchObject({ country: 'CN', currency: 'CNY', contactEmails: ['sales@lantern.example'], active: true });
  });

  it('names the address that is wrong, on the contacts box', () => {
    const result = supplierFormSchema.safeParse({ ...emptySupplierForm, name: 'X', country: 'CN', currency: 'CNY', contactEmails: 'ok@x.example\nnot-an-address' });
    expect(result.success).toBe(false);
    if (!result.success) {
      expect(result.error.issues).toEqual([expect.objectContaining({ path: ['contactEmails'], message: '“not-an-address” is not an e-mail address' })]);
    }
  });

  it('refuses a currency outside ISO 4217 and a country that is not two letters', () => {
    const result = supplierFormSchema.safeParse({ ...emptySupplierForm, name: 'X', country: 'CHN', currency: 'RMB' });
    expect(result.success).toBe(false);
    if (!result.success) expect(result.error.issues.map((i) => i.path.join('.')).sort()).toEqual(['country', 'currency']);
  });
});
