import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { costRoll, prepareCostRoll, rollPrepared } from './cost-roll';
import { volumeCurve } from './curve';
import { costRollInputArb } from './test-arbitraries';
import { expectWithinLastPlace } from './test-last-place';
import type { CostRollInput, CostRollResult } from './types';

/**
 * The roll groups part lines and sums their goods as integers (the volume curve asks for
 * totals only); the reference roll (`exactRanking`) works line by line in decimal.js. Both
 * follow the same rules, so every figure a curve point shows must equal the reference's at
 * that quantity, to the last printed decimal — within one unit there, where the different
 * order of 40-digit sums can tip a figure lying at a rounding half-way point. (Both sides
 * are this engine: the outside checks of the figures are the worked examples in
 * cost-roll.test.ts and worked-example.test.ts; float-ranking.property.test.ts compares the
 * full roll, lines included, character for character.)
 */
const point = (r: CostRollResult) => {
  const copy: Partial<CostRollResult> = { ...r };
  delete copy.lines;
  return copy;
};

describe('totals-only roll (volume curve) agrees with the line-by-line reference roll', () => {
  it('same totals (to one unit in the last place), breakdowns, warnings, left-out lines and FX rows at any quantity (fast-check)', () => {
    fc.assert(
      fc.property(costRollInputArb, fc.integer({ min: 1, max: 500_000 }), (input, qty) => {
        const prepared = prepareCostRoll(input);
        const full = rollPrepared(prepared, qty, { exactRanking: true });
        const totalsOnly = rollPrepared(prepared, qty, { lines: false });
        expect(totalsOnly.lines).toEqual([]);
        expect(full.lineWarningCount).toBe(full.lines.reduce((n, l) => n + l.warnings.length, 0));
        expectWithinLastPlace(point(totalsOnly), point(full));
      }),
      { numRuns: 300 },
    );
  });

  const base: CostRollInput = {
    bom: { qty: 1000, date: '2026-12-01', reportingCurrency: 'USD', amortisationQty: null, targetUnitCost: null },
    profile: { currency: 'USD', originPct: '1.5', freightPerShipment: '420', freightCurrency: 'USD', shipments: 1, insurancePct: '0.3', dutyBasis: 'CIF', defaultDutyPct: '3.7', feesPerShipment: '95', destinationPct: '1' },
    lines: [
      { id: 'a', kind: 'part', partId: 'p1', qtyPerUnit: '2' },
      { id: 'b', kind: 'part', partId: 'p2', qtyPerUnit: '1' },
    ],
    parts: [
      { id: 'p1', category: 'resistor', mount: 'smt' },
      { id: 'p2', category: 'capacitor', mount: 'smt' },
    ],
    quotes: [
      // Seven decimals: not a whole number of millionths, so priced in decimal.js.
      { id: 'q1', partId: 'p1', supplierId: 's', currency: 'USD', incoterm: 'FOB', moq: 1, orderMultiple: 1, leadTimeDays: 7, priceBreaks: [{ minQty: 1, unitPrice: '0.0012345' }] },
      // A large price × a large order: goods beyond 2^53 millionths, summed as BigInt.
      { id: 'q2', partId: 'p2', supplierId: 's', currency: 'USD', incoterm: 'EXW', moq: 1, orderMultiple: 1, leadTimeDays: 7, priceBreaks: [{ minQty: 1, unitPrice: '987654321.123457' }] },
    ],
    suppliers: [{ id: 's', active: true }],
    fxRates: [],
  };

  it('a price with more than 6 decimals and goods beyond 2^53 millionths', () => {
    for (const qty of [1000, 50_000_000]) {
      const full = costRoll({ ...base, bom: { ...base.bom, qty } });
      const curve = volumeCurve(base, [qty]);
      expect(curve.points[0].totals).toEqual(full.totals);
      expect(curve.points[0].bySupplier).toEqual(full.bySupplier);
    }
    // 50,000,000 × 987654321.123457 = 49,382,716,056,172,850 exactly (by hand: no float could hold it).
    const big = volumeCurve(base, [50_000_000]).points[0];
    expect(big.byCategory.find((c) => c.category === 'capacitor')!.goods).toBe('49382716056172850.000000');
  });
});
