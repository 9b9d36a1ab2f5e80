import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { costRoll } from './cost-roll';
import { volumeCurve } from './curve';
import { dec, Dec } from './decimal';
import { costRollInputArb } from './test-arbitraries';
import type { CostRollResult } from './types';

// Results carry money to 6 decimals, so a sum of n printed values may differ from the
// printed total by up to n half-units of the 6th decimal.
const within = (a: Dec, b: Dec, n: number) => a.minus(b).abs().lte(dec('0.0000005').times(n + 1));
const sum = (xs: string[]) => xs.reduce((s, x) => s.plus(x), dec(0));

describe('cost roll properties (fast-check)', () => {
  it('landed total = sum of the lines (parts and cost lines) = sum of its components', () => {
    fc.assert(
      fc.property(costRollInputArb, (input) => {
        const r = costRoll(input);
        const t = r.totals;
        const n = r.lines.length;
        expect(within(sum(r.lines.map((l) => l.landed)), dec(t.landedTotal), n)).toBe(true);
        const parts = [t.goods, t.origin, t.freight, t.insurance, t.duty, t.fees, t.destination, t.assembly];
        const perUnit = dec(t.costLinesPerUnit).plus(t.oneTimePerUnit).times(input.bom.qty);
        // Per-unit figures carry 10 decimals, so × N they may be off by N × 1e-10.
        const slack = dec('0.0000005').times(parts.length + 1).plus(dec('0.0000000001').times(input.bom.qty));
        expect(sum(parts).plus(perUnit).minus(t.landedTotal).abs().lte(slack)).toBe(true);
        expect(within(sum(r.byCategory.map((c) => c.landed)), dec(t.landedTotal), r.byCategory.length)).toBe(true);
        // Left-out and DNP lines contribute nothing.
        for (const l of r.lines.filter((x) => x.status !== 'costed')) expect(dec(l.landed).isZero()).toBe(true);
        expect(r.leftOut.count).toBe(r.lines.filter((l) => l.status === 'left_out').length);
      }),
      { numRuns: 150 },
    );
  });

  it('orders at least R and the MOQ of the chosen quote, in whole multiples', () => {
    fc.assert(
      fc.property(costRollInputArb, (input) => {
        const r = costRoll(input);
        for (const l of r.lines.filter((x) => x.status === 'costed' && x.quoteId)) {
          const q = input.quotes.find((x) => x.id === l.quoteId)!;
          expect(l.orderQty!).toBeGreaterThanOrEqual(l.requiredQty!);
          expect(l.orderQty!).toBeGreaterThanOrEqual(q.moq);
          expect(l.orderQty! % q.orderMultiple).toBe(0);
          expect(l.excessQty).toBe(l.orderQty! - l.requiredQty!);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('one-time costs per unit fall, never rise, as the build quantity grows', () => {
    fc.assert(
      fc.property(costRollInputArb, fc.array(fc.integer({ min: 1, max: 300_000 }), { minLength: 2, maxLength: 6 }), (input, qs) => {
        const quantities = [...new Set(qs)].sort((a, b) => a - b);
        const curve = volumeCurve(input, quantities);
        const perUnit = curve.points.map((p) => dec(p.totals.oneTimePerUnit));
        for (let i = 1; i < perUnit.length; i++) expect(perUnit[i].lte(perUnit[i - 1])).toBe(true);
      }),
      { numRuns: 80 },
    );
  });

  it('does not depend on the order of lines, quotes, parts, suppliers or FX rows', () => {
    const shuffled = <T>(xs: T[]) => fc.shuffledSubarray(xs, { minLength: xs.length, maxLength: xs.length });
    const arb = costRollInputArb.chain((input) =>
      fc.record({
        input: fc.constant(input),
        lines: shuffled(input.lines),
        quotes: shuffled(input.quotes),
        parts: shuffled(input.parts),
        suppliers: shuffled(input.suppliers),
        fxRates: shuffled(input.fxRates),
      }),
    );
    // Lines, left-out lines and DNP ids follow the caller's line order; compare them as sets.
    const byId = <T extends { lineId: string }>(xs: T[]) => [...xs].sort((a, b) => (a.lineId < b.lineId ? -1 : 1));
    const canonical = (r: CostRollResult) => ({
      ...r,
      lines: byId(r.lines),
      leftOut: { count: r.leftOut.count, lines: byId(r.leftOut.lines) },
      dnp: { count: r.dnp.count, lineIds: [...r.dnp.lineIds].sort() },
    });
    fc.assert(
      fc.property(arb, ({ input, ...order }) => {
        const a = costRoll(input);
        const b = costRoll({ ...input, ...order });
        expect(canonical(b)).toEqual(canonical(a));
        // The output keeps the caller's line order.
        expect(b.lines.map((l) => l.lineId)).toEqual(order.lines.map((l) => l.id));
      }),
      { numRuns: 100 },
    );
  });

  it('every warning code on a left-out line is its reason, and the reason is named in leftOut', () => {
    fc.assert(
      fc.property(costRollInputArb, (input) => {
        const r = costRoll(input);
        const named = new Map(r.leftOut.lines.map((l) => [l.lineId, l.reason]));
        for (const l of r.lines.filter((x) => x.status === 'left_out')) {
          expect(l.warnings.map((w) => w.code)).toContain(named.get(l.lineId));
        }
      }),
      { numRuns: 80 },
    );
  });
});
