import { describe, expect, it } from 'vitest';
import { costRoll } from './cost-roll';
import { dec, roundHalfUp, roundMoney } from './decimal';
import { costLine, makeInput } from './test-factories';
import { CM, torchMaterialInput, torchParts } from './worked-example.fixture';
import type { CostRollInput, LandedCostProfile } from './types';

const money = (s: string) => roundMoney(dec(s), 'USD').toFixed(2);
const perUnit4 = (s: string) => roundHalfUp(dec(s), 4).toFixed(4);

describe('reference §5.2 worked example: material and order quantities (cp, local)', () => {
  const expected = {
    1000: [
      ['R-0603', 4080, 5000, '5.00'], ['C-0603', 2040, 4000, '6.00'], ['LED', 3030, 4000, '40.00'],
      ['IC-DRIVER', 1010, 3000, '120.00'], ['SWITCH', 1005, 2000, '30.00'], ['PCB', 1010, 1100, '33.00'],
      ['CR2032', 1005, 1100, '55.00'], ['HOUSING', 1010, 1100, '38.50'], ['BLISTER', 1020, 1500, '30.00'],
    ],
    10000: [
      ['R-0603', 40800, 45000, '36.00'], ['C-0603', 20400, 24000, '36.00'], ['LED', 30300, 32000, '256.00'],
      ['IC-DRIVER', 10100, 15000, '450.00'], ['SWITCH', 10050, 11000, '132.00'], ['PCB', 10100, 10100, '181.80'],
      ['CR2032', 10050, 10100, '424.20'], ['HOUSING', 10100, 10100, '353.50'], ['BLISTER', 10200, 10500, '210.00'],
    ],
  } as const;

  for (const [n, goods, perUnit, excess] of [[1000, '357.50', '0.3575', '128.29'], [10000, '2079.50', '0.2080', '188.86']] as const) {
    it(`N = ${n}: need → order per line, material ${goods} (${perUnit}/unit), excess at cost ${excess}`, () => {
      const r = costRoll(torchMaterialInput(n));
      expect(r.lines.map((l) => [l.refDes, l.requiredQty, l.orderQty, money(l.goodsValue)])).toEqual(expected[n]);
      expect(money(r.totals.goods)).toBe(goods);
      expect(perUnit4(r.totals.landedPerUnit)).toBe(perUnit);
      expect(money(r.totals.excessValue)).toBe(excess);
    });
  }
});

/*
 * The rest of the example. Our rules put adders (insurance, duty) on purchased lines only;
 * the example treats the CM's whole FCA invoice — parts, 5 % material markup, SMT, THT,
 * manual work and line setup — as the dutiable, insured value. A CM quotes its conversion
 * per unit for a given run, so the faithful mapping is one more purchased line: the CM's
 * conversion quote, FCA, at (markup + SMT + THT + manual + setup) / N, to 6 decimals as a
 * price is stored. Freight goes in as `freightPerShipment` (one shipment), brokerage 75 per
 * entry and port→warehouse delivery 120 per shipment as `feesPerShipment` (both after the
 * border, so neither dutiable nor insured, as in the example).
 */
function torchLanded(n: 1000 | 10000, extra: Partial<LandedCostProfile> = {}): CostRollInput {
  const { parts, quotes, lines } = torchParts();
  // N = 1,000: 17.875 + 36 + 12 + 41.6667 + 50 = 157.5417 → 0.157542 per unit.
  // N = 10,000: 103.975 + 360 + 120 + 416.6667 + 50 = 1,050.6417 → 0.105064 per unit.
  const conversionPrice = n === 1000 ? '0.157542' : '0.105064';
  parts.push({ id: 'part-cm-conversion', category: 'other', mount: 'none', pins: 0, hsCode: null, unitWeightG: null });
  quotes.push({
    id: 'quote-cm-conversion',
    partId: 'part-cm-conversion',
    supplierId: CM.id,
    currency: 'USD',
    incoterm: 'FCA',
    moq: 1,
    orderMultiple: 1,
    leadTimeDays: 30,
    priceBreaks: [{ minQty: 1, unitPrice: conversionPrice }],
  });
  lines.push({ id: 'line-cm-conversion', refDes: 'CM', kind: 'part', partId: 'part-cm-conversion', qtyPerUnit: '1', attritionPct: '0' });
  lines.push(costLine({ id: 'line-nre', kind: 'tooling', qtyPerUnit: '1', oneTimeCost: '3100' })); // mould 3,000 + stencil 100
  return makeInput({
    bom: { qty: n, date: '2026-12-01', reportingCurrency: 'USD' },
    profile: {
      currency: 'USD',
      freightPerShipment: n === 1000 ? '180' : '400',
      shipments: 1,
      insurancePct: '0.3',
      dutyBasis: 'CIF',
      defaultDutyPct: '3.7',
      feesPerShipment: '195',
      ...extra,
    },
    parts,
    quotes,
    lines,
    suppliers: [CM],
  });
}

describe('reference §5.2 worked example: landed cost (cp, local)', () => {
  it('N = 1,000: FCA invoice 515.04, insurance 2.29, duty 25.80', () => {
    const r = costRoll(torchLanded(1000));
    const t = r.totals;
    expect(money(t.goods)).toBe('515.04');
    expect(money(t.freight)).toBe('180.00');
    expect(money(t.insurance)).toBe('2.29');
    // Customs value: the example adds rounded items (515.04 + 180 + 2.29 = 697.33); unrounded
    // it is 515.042 + 180 + 2.2936 = 697.3356 → 697.34.
    const cv = r.lines.reduce((s, l) => s.plus(l.customsValue ?? '0'), dec(0));
    expect(money(cv.toString())).toBe('697.34');
    expect(money(t.duty)).toBe('25.80');
    expect(money(t.fees)).toBe('195.00');
  });

  it('N = 1,000: landed excl. NRE 0.9181/unit and incl. NRE 4.0181/unit (#44, #45)', () => {
    const r = costRoll(torchLanded(1000));
    expect(perUnit4(r.totals.landedPerUnitExclOneTime)).toBe('0.9181');
    expect(perUnit4(r.totals.landedPerUnit)).toBe('4.0181');
    expect(perUnit4(r.totals.oneTimePerUnit)).toBe('3.1000');
    // The example sums items already rounded to cents: 515.04 + 180 + 2.29 + 25.80 + 195 = 918.13.
    // Our rule carries full precision and rounds once: 918.1371 → 918.14 (same 0.9181 per unit).
    const t = r.totals;
    const excl = dec(t.landedPerUnitExclOneTime).times(1000);
    expect(money(excl.toString())).toBe('918.14');
    const roundedItems = [t.goods, t.freight, t.insurance, t.duty, t.fees].reduce((s, x) => s.plus(money(x)), dec(0));
    expect(roundedItems.toFixed(2)).toBe('918.13');
  });

  it('N = 10,000: invoice 3,130.14, insurance 11.65, duty 131.05, landed 3,867.84 = 0.3868/unit, incl. NRE 0.6968 (#44, #45)', () => {
    const t = costRoll(torchLanded(10000)).totals;
    expect(money(t.goods)).toBe('3130.14');
    expect(money(t.insurance)).toBe('11.65');
    expect(money(dec(t.goods).plus(t.freight).plus(t.insurance).toString())).toBe('3541.79'); // customs value
    expect(money(t.duty)).toBe('131.05');
    expect(money(dec(t.landedPerUnitExclOneTime).times(10000).toString())).toBe('3867.84');
    expect(perUnit4(t.landedPerUnitExclOneTime)).toBe('0.3868');
    expect(money(t.landedTotal)).toBe('6967.84');
    expect(perUnit4(t.landedPerUnit)).toBe('0.6968');
  });

  it('FOB-basis country: duty on the invoice alone, 19.06 / 115.82', () => {
    expect(money(costRoll(torchLanded(1000, { dutyBasis: 'FOB' })).totals.duty)).toBe('19.06');
    expect(money(costRoll(torchLanded(10000, { dutyBasis: 'FOB' })).totals.duty)).toBe('115.82');
  });

  it('NRE over a lifetime of 100,000 units instead: 0.3868 + 0.0310 = 0.4178/unit at N = 10,000', () => {
    const input = torchLanded(10000);
    input.bom.amortisationQty = 100_000;
    const t = costRoll(input).totals;
    expect(perUnit4(t.oneTimePerUnit)).toBe('0.0310');
    expect(perUnit4(t.landedPerUnit)).toBe('0.4178');
  });
});

describe('reference §5.2 conversion through our assembly rates (cp)', () => {
  // The engine prices SMT per placement, the example per pad: 24 pads × 0.0015 = 0.036 per
  // unit over 10 placements (4 R + 2 C + 3 LED + 1 IC) = 0.0036 per placement. THT is per
  // joint in both: the switch's 4 pins × 0.003.
  it('SMT 36.00 + THT 12.00 at N = 1,000; 360.00 + 120.00 at N = 10,000', () => {
    for (const [n, total] of [[1000, '48.00'], [10000, '480.00']] as const) {
      const input = torchMaterialInput(n);
      input.profile = { smtRatePerPlacement: '0.0036', thtRatePerJoint: '0.003' };
      const r = costRoll(input);
      expect(money(r.totals.assembly)).toBe(total);
      expect(r.totals.assemblyPerUnit).toBe('0.0480000000');
      const smt = r.lines.filter((l) => ['R-0603', 'C-0603', 'LED', 'IC-DRIVER'].includes(l.refDes!));
      expect(money(smt.reduce((s, l) => s.plus(l.assembly), dec(0)).toString())).toBe(n === 1000 ? '36.00' : '360.00');
    }
  });
});
