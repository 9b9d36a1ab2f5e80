import { describe, expect, it } from 'vitest';
import type { Profile } from './api';
import { emptyProfileForm, profileFormSchema, profileFormValues } from './profile-form';

const paths = (input: unknown) => {
  const r = profileFormSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};

describe('the landed-cost profile form', () => {
  it('sends percentages as decimal strings in percent and HS prefixes without dots', () => {
    // 3.7 % duty on an HS 8533 prefix: the rate of the worked example in the costing facts [US-ICP] local.
    const body = profileFormSchema.parse({
      ...emptyProfileForm('GBP'),
      name: 'UK sea freight, CIF basis (demo)',
      freightPct: '6.5',
      insurancePct: '0.3',
      dutyRates: [{ hsPrefix: '8533.21', ratePct: '3.7' }],
      attritionPct: { ...emptyProfileForm().attritionPct, resistor: '1', capacitor: '' },
      maxLeadTimeDays: '45',
    });
    expect(body).toMatchObject({
      currency: 'GBP',
      freightPct: '6.5',
      insurancePct: '0.3',
      dutyBasis: 'CIF',
      dutyRates: [{ hsPrefix: '853321', ratePct: '3.7' }],
      attritionPct: { resistor: '1' },
      maxLeadTimeDays: 45,
      freightCurrency: null,
    });
  });

  it('takes empty amounts as 0 and an empty lead-time limit as none', () => {
    const body = profileFormSchema.parse({ ...emptyProfileForm('USD'), name: 'US', originPct: '', maxLeadTimeDays: '' });
    expect(body.originPct).toBe('0');
    expect(body.maxLeadTimeDays).toBeNull();
  });

  it('puts problems on their fields, duty rows and categories included', () => {
    expect(
      paths({
        ...emptyProfileForm('EUR'),
        name: '',
        freightPct: '-1',
        shipments: 'two',
        dutyRates: [{ hsPrefix: '8', ratePct: '2' }],
        attritionPct: { ...emptyProfileForm().attritionPct, led: 'lots' },
      }).sort(),
    ).toEqual(['attritionPct.led', 'dutyRates.0.hsPrefix', 'freightPct', 'name', 'shipments']);
  });

  it('refuses the same HS prefix twice', () => {
    expect(paths({ ...emptyProfileForm('EUR'), name: 'x', dutyRates: [{ hsPrefix: '8533', ratePct: '2' }, { hsPrefix: '85.33', ratePct: '3' }] })).toEqual([
      'dutyRates.1.hsPrefix',
    ]);
  });

  it('reads a stored profile back to the same body', () => {
    const stored: Profile = {
      id: '1', name: 'US sea freight, FOB basis (demo)', currency: 'USD', originPct: '0.0000', freightPct: '5.0000', freightPerShipment: '1200.000000',
      freightCurrency: 'USD', shipments: 2, freightBasis: 'value', insurancePct: '0.3000', dutyBasis: 'FOB',
      dutyRates: [{ hsPrefix: '8532', ratePct: '0' }], defaultDutyPct: '2.6000', feesPerShipment: '150.000000', destinationPct: '1.0000',
      maxLeadTimeDays: 60, attritionPct: { resistor: '1.5000' }, smtRatePerPlacement: '0.002000', thtRatePerJoint: '0.004000',
      handRatePerOp: '0.030000', notes: '', version: 2,
    };
    const body = profileFormSchema.parse(profileFormValues(stored));
    expect(body).toMatchObject({ freightPct: '5', freightPerShipment: '1200', defaultDutyPct: '2.6', attritionPct: { resistor: '1.5' }, shipments: 2, maxLeadTimeDays: 60 });
  });
});
