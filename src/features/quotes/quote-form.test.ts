import { describe, expect, it } from 'vitest';
import { emptyQuoteForm, quoteFormSchema, quotePatch } from './quote-form';

const filled = emptyQuoteForm({
  partId: '12',
  supplierId: '3',
  currency: 'cny',
  incoterm: 'FOB',
  moq: '5,000',
  orderMultiple: '5000',
  leadTimeDays: '21',
  validFrom: '2026-12-01',
  validUntil: '2027-02-28',
  priceBreaks: [
    { minQty: '5000', unitPrice: '0.0021' },
    { minQty: '50000', unitPrice: '0.0016' },
  ],
});

const paths = (input: unknown) => {
  const result = quoteFormSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => i.path.join('.'));
};

describe('the quote editor', () => {
  it('sends whole numbers, an upper-case ISO 4217 code and the breaks as typed', () => {
    expect(quoteFormSchema.parse(filled)).toMatchObject({
      partId: '12',
      supplierId: '3',
      currency: 'CNY',
      moq: 5000,
      orderMultiple: 5000,
      leadTimeDays: 21,
      validFrom: '2026-12-01',
      validUntil: '2027-02-28',
      priceBreaks: [{ minQty: 5000, unitPrice: '0.0021' }, { minQty: 50000, unitPrice: '0.0016' }],
    });
  });

  it('leaves an unknown lead time and open validity as null', () => {
    const body = quoteFormSchema.parse({ ...filled, leadTimeDays: '', validFrom: '', validUntil: '' });
    expect(body.leadTimeDays).toBeNull();
    expect(body.validFrom).toBeNull();
    expect(body.validUntil).toBeNull();
  });

  it('puts each problem on its field, breaks by row', () => {
    expect(
      paths({
        ...filled,
        supplierId: '',
        currency: 'XYZ',
        moq: 'many',
        validUntil: '2026-11-30',
        priceBreaks: [{ minQty: '5000', unitPrice: '0.0021' }, { minQty: '100', unitPrice: '0.00000001' }],
      }).sort(),
    ).toEqual(['currency', 'moq', 'priceBreaks.1.minQty', 'priceBreaks.1.unitPrice', 'supplierId', 'validUntil']);
  });

  it('refuses an Incoterm outside the eleven of Incoterms 2020', () => {
    expect(paths({ ...filled, incoterm: 'FOT' })).toEqual(['incoterm']);
  });

  it('sends a change without the part and with the version read', () => {
    const patch = quotePatch(quoteFormSchema.parse(filled), 4);
    expect(patch).not.toHaveProperty('partId');
    expect(patch).not.toHaveProperty('source');
    expect(patch.version).toBe(4);
    expect(patch.supplierId).toBe('3');
  });
});
