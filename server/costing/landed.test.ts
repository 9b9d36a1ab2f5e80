import { describe, expect, it } from 'vitest';
import { dec, ZERO } from './decimal';
import { customsValue, INCOTERMS } from './incoterms';
import { boardLandedFactor, INSURED_SHARE, lineAdders } from './landed';

const pct = { origin: dec('0.02'), freight: dec('0.05'), insurance: dec('0.003'), destination: dec('0.01') };

describe('landed-cost adders on one line', () => {
  it('insures 110 % of the value: a CIF value of 10,850 is insured for 11,935.00 (#10) [INCO-INS]', () => {
    expect(INSURED_SHARE.times(10_850).toFixed(2)).toBe('11935.00');
    const a = lineAdders({ goods: dec(10_850), incoterm: 'CFR', pct, dutyBasis: 'CIF', dutyRate: ZERO });
    expect(a.insurance.toString()).toBe(dec('0.003').times(11_935).toString());
  });

  it('EXW carries every adder, with insurance on G + origin + freight', () => {
    const a = lineAdders({
      goods: dec(1000),
      incoterm: 'EXW',
      pct,
      dutyBasis: 'CIF',
      dutyRate: dec('0.037'),
      freightShare: dec(100),
      feesShare: dec(25),
    });
    // origin 20; freight 50 + 100 = 150; insurance 0.003 × 1.1 × 1,170 = 3.861;
    // CV (CIF basis) 1,000 + 20 + 150 + 3.861 = 1,173.861; duty 43.432857; fees 25; destination 10
    expect(a.origin.toString()).toBe('20');
    expect(a.freight.toString()).toBe('150');
    expect(a.insurance.toString()).toBe('3.861');
    expect(a.customsValue!.toString()).toBe('1173.861');
    expect(a.duty.toString()).toBe('43.432857');
    expect(a.fees.toString()).toBe('25');
    expect(a.destination.toString()).toBe('10');
    expect(a.landed.toString()).toBe('1252.293857');
  });

  it('sets every adder the Incoterm does not need to 0, shares included', () => {
    const ddp = lineAdders({ goods: dec(1000), incoterm: 'DDP', pct, dutyBasis: 'CIF', dutyRate: dec('0.1'), freightShare: dec(100), feesShare: dec(25) });
    expect(ddp.landed.toString()).toBe('1000');
    const dap = lineAdders({ goods: dec(1000), incoterm: 'DAP', pct, dutyBasis: 'CIF', dutyRate: dec('0.1'), freightShare: dec(100), feesShare: dec(25) });
    expect([dap.freight, dap.insurance, dap.destination].every((x) => x.isZero())).toBe(true);
    expect(dap.duty.toString()).toBe('100');
    expect(dap.fees.toString()).toBe('25');
  });

  it('reports the customs value of the customs-value table for every rule and basis', () => {
    for (const rule of INCOTERMS) {
      for (const basis of ['CIF', 'FOB'] as const) {
        const a = lineAdders({ goods: dec('1000'), incoterm: rule, pct, dutyBasis: basis, dutyRate: dec('0.05'), freightShare: dec(40), feesShare: dec(9) });
        const table = customsValue(rule, basis, { goods: dec('1000'), origin: a.origin, freight: a.freight, insurance: a.insurance });
        expect(a.customsValue?.toString() ?? null, `${rule}/${basis}`).toBe(table?.toString() ?? null);
      }
    }
  });

  it('the board factor times G equals the explicit landed cost for every rule', () => {
    for (const rule of INCOTERMS) {
      for (const basis of ['CIF', 'FOB'] as const) {
        const g = dec('1234.567891');
        const explicit = lineAdders({ goods: g, incoterm: rule, pct, dutyBasis: basis, dutyRate: dec('0.037') }).landed;
        expect(g.times(boardLandedFactor(rule, pct, basis, dec('0.037'))).toFixed(20), `${rule}/${basis}`).toBe(explicit.toFixed(20));
      }
    }
  });
});
