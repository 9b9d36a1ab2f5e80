import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { byQuoteId, costingQuoteFromText, parseBreaksText } from './repository';

// The text a quote row is read as (COSTING_QUOTE_TEXT_SQL): twelve fields joined by "|",
// the last the breaks as "minQty price minQty price …". These check the hand-written
// scanners against the plain String.prototype.split reading of the same text.
const breakList = fc.array(
  fc.record({ minQty: fc.integer({ min: 1, max: 10_000_000 }), unitPrice: fc.stringMatching(/^\d{1,6}\.\d{6}$/) }),
  { maxLength: 8 },
);

function bySplit(text: string) {
  const words = text ? text.split(' ') : [];
  const out: { minQty: number; unitPrice: string }[] = [];
  for (let i = 0; i < words.length; i += 2) out.push({ minQty: Number(words[i]), unitPrice: words[i + 1] ?? '' });
  return out;
}

describe('reading quotes from their row text', () => {
  it('reads every break as a split on spaces would', () => {
    fc.assert(
      fc.property(breakList, (breaks) => {
        const text = breaks.map((b) => `${b.minQty} ${b.unitPrice}`).join(' ');
        expect(parseBreaksText(text)).toEqual(breaks);
        expect(parseBreaksText(text)).toEqual(bySplit(text));
      }),
    );
  });

  it('gives a quantity without a price an empty price, which the engine then rejects', () => {
    expect(parseBreaksText('1000 0.002000 5000')).toEqual([{ minQty: 1000, unitPrice: '0.002000' }, { minQty: 5000, unitPrice: '' }]);
    expect(parseBreaksText(null)).toEqual([]);
    expect(parseBreaksText('')).toEqual([]);
  });

  it('reads the twelve fields, an empty one as null, and refuses a row with more or fewer', () => {
    fc.assert(
      fc.property(
        fc.record({
          id: fc.integer({ min: 1 }).map(String),
          partId: fc.integer({ min: 1 }).map(String),
          supplierId: fc.integer({ min: 1 }).map(String),
          currency: fc.constantFrom('USD', 'CNY', 'EUR', 'JPY'),
          incoterm: fc.constantFrom('EXW', 'FOB', 'CIF', 'DAP', 'DDP'),
          moq: fc.integer({ min: 1, max: 1_000_000 }),
          orderMultiple: fc.integer({ min: 1, max: 10_000 }),
          leadTimeDays: fc.option(fc.integer({ min: 0, max: 365 })),
          validFrom: fc.option(fc.constantFrom('2026-01-01', '2026-06-30')),
          validUntil: fc.option(fc.constantFrom('2026-12-31', '2027-03-31')),
          createdAt: fc.constant('2026-12-02T06:13:28.077Z'),
          breaks: breakList,
        }),
        (q) => {
          const breaksText = q.breaks.map((b) => `${b.minQty} ${b.unitPrice}`).join(' ');
          const text = [q.id, q.partId, q.supplierId, q.currency, q.incoterm, q.moq, q.orderMultiple, q.leadTimeDays ?? '', q.validFrom ?? '', q.validUntil ?? '', q.createdAt, breaksText].join('|');
          const { breaks, ...fields } = q;
          expect(costingQuoteFromText(text)).toEqual({ ...fields, priceBreaks: breaks });
        },
      ),
    );
    expect(() => costingQuoteFromText('1|2|3|USD|FOB|1|1||||2026-12-02T06:13:28.077Z')).toThrow(/12 fields/);
    expect(() => costingQuoteFromText('1|2|3|USD|FOB|1|1||||2026-12-02T06:13:28.077Z|1 0.1|x')).toThrow(/12 fields/);
  });

  it('orders quote ids as numbers, not as text', () => {
    const ids = ['10', '9', '100', '11', '2'].map((id) => ({ id }));
    expect(ids.sort(byQuoteId).map((q) => q.id)).toEqual(['2', '9', '10', '11', '100']);
  });
});
