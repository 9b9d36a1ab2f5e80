import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dec, Dec } from './decimal';
import { CostingInputError } from './errors';
import { chooseOrder, prepareOrderTerms, priceAt, requiredQty, toCount, type OrderTerms } from './order-quantity';
import { breaks } from './test-factories';

// Reference §4.4 tiers: 1+ 0.0100; 100+ 0.0050; 1,000+ 0.0020; 5,000+ 0.0012; 10,000+ 0.0008 USD.
const TIERS = breaks([1, '0.0100'], [100, '0.0050'], [1000, '0.0020'], [5000, '0.0012'], [10000, '0.0008']);
const tiered = prepareOrderTerms(TIERS, 1, 1);

const order = (terms: OrderTerms, need: number) => {
  const o = chooseOrder(terms, need);
  return { orderQty: o.orderQty, unitPrice: o.unitPrice.toString(), goods: o.goodsValue.toFixed(4), excess: o.excessQty };
};

describe('all-units price breaks [QTY-DISC]', () => {
  it('prices 4,500 at the 1,000+ tier: unit 0.0020, extended 9.00 (#14) [QTY-DISC] local', () => {
    const price = priceAt(tiered, 4500)!;
    expect(price.toString()).toBe('0.002');
    expect(price.times(4500).toFixed(2)).toBe('9.00');
  });

  it('buys up to 5,000 when 4,500 are needed: 6.00 < 9.00, excess 500 (#15) [QTY-DISC] local', () => {
    expect(order(tiered, 4500)).toEqual({ orderQty: 5000, unitPrice: '0.0012', goods: '6.0000', excess: 500 });
  });

  it('keeps 3,000 on the tie, keeps 2,999 (5.998), buys 5,000 for 3,001 (6.002 > 6.00) (#16) cp, local', () => {
    expect(order(tiered, 3000)).toMatchObject({ orderQty: 3000, goods: '6.0000', excess: 0 });
    expect(order(tiered, 2999)).toMatchObject({ orderQty: 2999, goods: '5.9980', excess: 0 });
    expect(order(tiered, 3001)).toMatchObject({ orderQty: 5000, goods: '6.0000', excess: 1999 });
  });

  it('reproduces the §4.4 worked table: 2,500 kept; 9,000 → 10,000 at 8.00 [QTY-DISC] local', () => {
    expect(order(tiered, 2500)).toMatchObject({ orderQty: 2500, goods: '5.0000' });
    expect(order(tiered, 9000)).toMatchObject({ orderQty: 10000, goods: '8.0000', excess: 1000 });
  });

  it('prices 99 pieces at the first tier: unit 0.0100, extended 0.99 (#17) [QTY-DISC]', () => {
    const price = priceAt(tiered, 99)!;
    expect(price.toString()).toBe('0.01');
    expect(price.times(99).toFixed(2)).toBe('0.99');
    // The buy-up rule then orders 100 at 0.50, which is cheaper than 99 at 0.99.
    expect(order(tiered, 99)).toEqual({ orderQty: 100, unitPrice: '0.005', goods: '0.5000', excess: 1 });
  });

  it('buys the LED driver IC up to 15,000: 12,000 × 0.04 = 480 > 15,000 × 0.03 = 450 (#43) cp, local', () => {
    const ic = prepareOrderTerms(breaks([3000, '0.0400'], [15000, '0.0300']), 3000, 3000);
    expect(order(ic, 10100)).toEqual({ orderQty: 15000, unitPrice: '0.03', goods: '450.0000', excess: 4900 });
  });
});

describe('MOQ and order multiple (common practice)', () => {
  const one = breaks([1, '0.01']);
  it('need 120, MOQ 100, multiple 25 → 125, excess 5 (#18) cp', () => {
    expect(order(prepareOrderTerms(one, 100, 25), 120)).toMatchObject({ orderQty: 125, excess: 5 });
  });
  it('need 60, MOQ 100, multiple 25 → 100, excess 40 (#19) cp', () => {
    expect(order(prepareOrderTerms(one, 100, 25), 60)).toMatchObject({ orderQty: 100, excess: 40 });
  });
  it('need 500, MOQ 1,000, multiple 300 → 1,200: the MOQ is rounded up to the multiple (#20) cp, local', () => {
    expect(order(prepareOrderTerms(one, 1000, 300), 500)).toMatchObject({ orderQty: 1200, excess: 700 });
  });
  it('need 1,237, MOQ 3,000, reel 3,000 → 3,000, excess 1,763 (#21) cp', () => {
    expect(order(prepareOrderTerms(one, 3000, 3000), 1237)).toMatchObject({ orderQty: 3000, excess: 1763 });
  });
  it('treats the smallest break as a minimum too: breaks from 100, MOQ 1, need 50 → 100', () => {
    expect(order(prepareOrderTerms(breaks([100, '0.05']), 1, 1), 50)).toMatchObject({ orderQty: 100, excess: 50 });
  });
  it('rounds a buy-up break to the multiple and prices it at the tier it lands in', () => {
    // Break 1,000 with reel 4,000 lands at 4,000, which is already in the 3,500+ tier.
    const terms = prepareOrderTerms(breaks([1, '0.010'], [1000, '0.008'], [3500, '0.001']), 1, 4000);
    expect(order(terms, 10)).toMatchObject({ orderQty: 4000, unitPrice: '0.001', goods: '4.0000' });
  });
  it('keeps the lower price when two breaks share a minimum quantity', () => {
    const terms = prepareOrderTerms(breaks([1, '0.02'], [1, '0.015']), 1, 1);
    expect(order(terms, 10).unitPrice).toBe('0.015');
  });
  it('refuses a quote without breaks, with a fractional multiple or a price that is not a decimal', () => {
    expect(() => prepareOrderTerms([], 1, 1)).toThrow(CostingInputError);
    expect(() => prepareOrderTerms(breaks([1, '0.01']), 1, 2.5)).toThrow(CostingInputError);
    expect(() => prepareOrderTerms(breaks([1, '1e-3']), 1, 1)).toThrow(CostingInputError);
    expect(() => prepareOrderTerms(breaks([1, '-0.01']), 1, 1)).toThrow(CostingInputError);
  });
  it('refuses a count beyond exact integer range', () => {
    expect(() => toCount(dec('9007199254740993'), 'requiredQty')).toThrow(CostingInputError);
    expect(() => toCount(dec('12.5'), 'requiredQty')).toThrow(CostingInputError);
    expect(toCount(dec('4080'), 'requiredQty')).toBe(4080);
  });
});

describe('required quantity R = ceil(q × N × (1 + a))', () => {
  it('gives the §5.2 needs at N = 1,000 and 10,000 (cp, local)', () => {
    expect(requiredQty(dec(4), dec(1000), dec('0.02')).toNumber()).toBe(4080);
    expect(requiredQty(dec(1), dec(10000), dec('0.005')).toNumber()).toBe(10050);
    expect(requiredQty(dec(2), dec(10000), dec('0.02')).toNumber()).toBe(20400);
  });
  it('computes in exact decimal: 0.07 m × 100 is 7, where binary floats give 7.000000000000001 and ceil 8', () => {
    expect(Math.ceil(0.07 * 100)).toBe(8);
    expect(requiredQty(dec('0.07'), dec(100), dec(0)).toNumber()).toBe(7);
    expect(requiredQty(dec('0.15'), dec(1000), dec('0.02')).toNumber()).toBe(153);
  });
});

// Random quotes: ascending breaks with falling prices (as suppliers quote), MOQ and multiple.
const quoteArb = fc
  .record({
    steps: fc.array(fc.record({ gap: fc.integer({ min: 1, max: 5000 }), drop: fc.integer({ min: 0, max: 40 }) }), {
      minLength: 0,
      maxLength: 5,
    }),
    firstMin: fc.integer({ min: 1, max: 500 }),
    firstPrice: fc.integer({ min: 1, max: 100_000 }),
    moq: fc.integer({ min: 1, max: 4000 }),
    multiple: fc.integer({ min: 1, max: 3000 }),
  })
  .map(({ steps, firstMin, firstPrice, moq, multiple }) => {
    const list: [number, string][] = [[firstMin, dec(firstPrice).div(1e6).toString()]];
    let min = firstMin;
    let price = dec(firstPrice);
    for (const s of steps) {
      min += s.gap;
      price = price.times(100 - s.drop).div(100).ceil();
      list.push([min, price.div(1e6).toString()]);
    }
    return { terms: prepareOrderTerms(breaks(...list), moq, multiple), moq, multiple };
  });

function bruteForceMin(terms: OrderTerms, need: number): Dec {
  // Every feasible Q (≥ max(R, m'), a multiple of k) up to one multiple past the top break.
  const k = terms.multiple;
  const start = Math.ceil(Math.max(need, terms.effectiveMoq) / k) * k;
  const top = terms.minQtys[terms.minQtys.length - 1] + k;
  let best: Dec | undefined;
  for (let q = start; q <= Math.max(start, top); q += k) {
    const spend = priceAt(terms, q)!.times(q);
    if (!best || spend.lt(best)) best = spend;
  }
  return best!;
}

describe('order quantity properties (fast-check)', () => {
  it('orders at least R and the MOQ, in whole multiples', () => {
    fc.assert(
      fc.property(quoteArb, fc.integer({ min: 1, max: 50_000 }), ({ terms, moq, multiple }, need) => {
        const o = chooseOrder(terms, need);
        expect(o.orderQty).toBeGreaterThanOrEqual(need);
        expect(o.orderQty).toBeGreaterThanOrEqual(moq);
        expect(o.orderQty % multiple).toBe(0);
        expect(o.excessQty).toBe(o.orderQty - need);
        expect(o.goodsValue.eq(o.unitPrice.times(o.orderQty))).toBe(true);
      }),
    );
  });

  it('never lets total spend fall when the requirement grows', () => {
    fc.assert(
      fc.property(quoteArb, fc.integer({ min: 1, max: 30_000 }), fc.integer({ min: 1, max: 5_000 }), ({ terms }, need, more) => {
        const a = chooseOrder(terms, need).goodsValue;
        const b = chooseOrder(terms, need + more).goodsValue;
        expect(b.gte(a)).toBe(true);
      }),
    );
  });

  it('finds the lowest spend of every feasible quantity (brute force over all of them)', () => {
    fc.assert(
      fc.property(quoteArb, fc.integer({ min: 1, max: 20_000 }), ({ terms }, need) => {
        expect(chooseOrder(terms, need).goodsValue.eq(bruteForceMin(terms, need))).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
});
