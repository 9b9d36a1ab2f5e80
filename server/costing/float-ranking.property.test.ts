/**
 * The cost roll ranks quotes in floats, sums grouped lines as integers and prints each
 * line's figures from exact values; the `exactRanking` option prices and compares every
 * eligible quote in decimal.js and works line by line, as the costing rules state them.
 * These tests hold the two to the same output, character for character, lines included,
 * with ties and near-ties (closer than floats can tell apart) built in. This is the
 * engine's own consistency, not an outside reference.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { costRoll, prepareCostRoll, rollPrepared } from './cost-roll';
import { volumeCurve } from './curve';
import { dec } from './decimal';
import { costRollInputArb } from './test-arbitraries';
import { expectWithinLastPlace } from './test-last-place';
import type { CostRollInput, Quote } from './types';

/** How a twin quote's prices relate to its original's. */
type TwinKind = 'same' | 'up' | 'down' | 'usd' | 'usd-up' | 'halves' | 'halves-up' | 'huge';

// 1e-13 relative: far below the float ranking's 1e-9 threshold, far above 40-digit rounding.
const nudge = (text: string, sign: 1 | -1) => dec(text).times(dec(1).plus(dec('0.0000000000001').times(sign))).toFixed();

function twinOf(q: Quote, kind: TwinKind, id: string, extra: Partial<Quote>): Quote {
  const base = { ...q, ...extra, id };
  switch (kind) {
    case 'same':
      return base;
    case 'up':
    case 'down':
      return { ...base, priceBreaks: q.priceBreaks.map((b) => ({ ...b, unitPrice: nudge(b.unitPrice, kind === 'up' ? 1 : -1) })) };
    case 'usd':
    case 'usd-up': {
      // EUR → USD at the roll date's rate (1.0811): the same landed cost in another currency.
      if (q.currency !== 'EUR') return base;
      const priceBreaks = q.priceBreaks.map((b) => {
        const usd = dec(b.unitPrice).times('1.0811').toFixed();
        return { ...b, unitPrice: kind === 'usd' ? usd : nudge(usd, 1) };
      });
      return { ...base, currency: 'USD', priceBreaks };
    }
    case 'halves':
    case 'halves-up': {
      // Buying up to twice the first break at half the price spends exactly (or nearly) the same.
      const first = q.priceBreaks[0];
      const half = dec(first.unitPrice).div(2).toFixed();
      const priceBreaks = [first, { minQty: first.minQty * 2, unitPrice: kind === 'halves' ? half : nudge(half, 1) }];
      return { ...base, moq: 1, orderMultiple: 1, priceBreaks };
    }
    case 'huge':
      // Beyond what a float may stand in for: ranked exactly.
      return { ...base, priceBreaks: q.priceBreaks.map((b) => ({ ...b, unitPrice: dec(b.unitPrice).times(`1${'0'.repeat(120)}`).toFixed() })) };
  }
}

const twinArb = fc.record({
  of: fc.nat(),
  kind: fc.constantFrom<TwinKind>('same', 'up', 'down', 'usd', 'usd-up', 'halves', 'halves-up', 'huge'),
  leadTimeDays: fc.option(fc.integer({ min: 1, max: 120 }), { nil: null }),
  day: fc.integer({ min: 1, max: 28 }),
  supplierId: fc.constantFrom('sup-a', 'sup-b'),
});

/** Random cost-roll inputs with twin quotes added: exact ties, near-ties, cross-currency ties. */
const inputWithTwins: fc.Arbitrary<CostRollInput> = fc
  .record({ input: costRollInputArb, twins: fc.array(twinArb, { maxLength: 8 }) })
  .map(({ input, twins }) => {
    if (input.quotes.length === 0) return input;
    const added = twins.map((t, i) => {
      const q = input.quotes[t.of % input.quotes.length];
      return twinOf(q, t.kind, `twin-${i}`, {
        leadTimeDays: t.leadTimeDays,
        createdAt: `2026-02-${String(t.day).padStart(2, '0')}T08:00:00Z`,
        supplierId: t.supplierId,
        validUntil: null,
      });
    });
    return { ...input, quotes: [...input.quotes, ...added] };
  });

const text = (x: unknown) => JSON.stringify(x);

describe('float ranking agrees with the exact ranking (fast-check)', () => {
  it('gives the same roll, line by line, at the BOM quantity and others', () => {
    fc.assert(
      fc.property(inputWithTwins, fc.array(fc.integer({ min: 1, max: 300_000 }), { maxLength: 3 }), (input, qs) => {
        const fast = prepareCostRoll(input);
        const exact = prepareCostRoll(input);
        for (const qty of [input.bom.qty, ...qs]) {
          expect(text(rollPrepared(fast, qty))).toBe(text(rollPrepared(exact, qty, { exactRanking: true })));
        }
      }),
      { numRuns: 300 },
    );
  });

  it('gives the same volume curve as exact rolls at each quantity', () => {
    fc.assert(
      fc.property(inputWithTwins, fc.array(fc.integer({ min: 1, max: 300_000 }), { minLength: 1, maxLength: 5 }), (input, qs) => {
        const curve = volumeCurve(input, qs);
        const exact = prepareCostRoll(input);
        qs.forEach((qty, i) => {
          const { lines: _lines, ...point } = rollPrepared(exact, qty, { exactRanking: true, lines: false });
          // Totals only add group sums: one unit in the last place apart at most (see test-last-place.ts).
          expectWithinLastPlace(curve.points[i], point);
        });
      }),
      { numRuns: 100 },
    );
  });
});

describe('choices floats cannot make', () => {
  const input = (prices: [string, string], overrides: [Partial<Quote>, Partial<Quote>] = [{}, {}]): CostRollInput => ({
    bom: { qty: 1000, date: '2026-12-01', reportingCurrency: 'USD' },
    profile: { insurancePct: '0.3', defaultDutyPct: '3.7', destinationPct: '1' },
    lines: [{ id: 'line-1', kind: 'part', partId: 'tb-res-10k', qtyPerUnit: '2' }],
    parts: [{ id: 'tb-res-10k', category: 'resistor', mount: 'smt', hsCode: '8533.21' }],
    quotes: prices.map((unitPrice, i) => ({
      id: `quote-${i}`,
      partId: 'tb-res-10k',
      supplierId: 'sup-a',
      currency: 'USD',
      incoterm: 'FOB',
      moq: 1,
      orderMultiple: 1,
      leadTimeDays: 14,
      priceBreaks: [{ minQty: 1, unitPrice }],
      createdAt: '2026-02-01T08:00:00Z',
      ...overrides[i],
    })),
    suppliers: [{ id: 'sup-a', active: true }],
    fxRates: [],
  });
  const chosen = (i: CostRollInput) => costRoll(i).lines[0].quoteId;

  it('takes the quote cheaper by 1 part in 10^17, which a float reads as equal', () => {
    // As floats both prices are the same number; the exact comparison must still see the gap.
    expect(Number('0.00123400000000000001')).toBe(Number('0.001234'));
    expect(chosen(input(['0.00123400000000000001', '0.001234']))).toBe('quote-1');
    expect(chosen(input(['0.001234', '0.00123400000000000001']))).toBe('quote-0');
  });

  it('settles an exact tie by lead time, then age, then id, as the rules say', () => {
    expect(chosen(input(['0.001234', '0.001234'], [{ leadTimeDays: 21 }, { leadTimeDays: 14 }]))).toBe('quote-1');
    expect(chosen(input(['0.001234', '0.001234'], [{ createdAt: '2026-03-01T08:00:00Z' }, {}]))).toBe('quote-1');
    expect(chosen(input(['0.001234', '0.001234']))).toBe('quote-0');
  });

  it('buys up to a break only when that spends strictly less, also when floats cannot tell', () => {
    const buyUp = (second: string) => {
      const i = input(['0.002', '1'], [{ priceBreaks: [{ minQty: 1, unitPrice: '0.002' }, { minQty: 4000, unitPrice: second }] }, {}]);
      return costRoll(i).lines[0].orderQty;
    };
    // R = 2000: 2000 × 0.002 = 4 against 4000 × 0.001 = 4: a tie keeps the smaller order.
    expect(buyUp('0.001')).toBe(2000);
    expect(buyUp('0.00099999999999999999')).toBe(4000);
    expect(buyUp('0.00100000000000000001')).toBe(2000);
  });

  it('ranks prices too large for a float exactly', () => {
    const zeros = '0'.repeat(150);
    expect(chosen(input([`3${zeros}`, `2${zeros}`]))).toBe('quote-1');
    expect(chosen(input([`2${zeros}`, `3${zeros}`]))).toBe('quote-0');
  });
});
