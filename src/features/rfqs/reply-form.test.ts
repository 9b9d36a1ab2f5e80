import { describe, expect, it } from 'vitest';
import { checkReply, formPath, initialReplyForm, type ReplyForm } from './reply-form';

const view = {
  quantities: [10000, 50000, 100000],
  defaultCurrency: 'CNY',
  defaultIncoterm: 'FOB' as const,
  items: ['1', '2', '3'].map((itemId) => ({ itemId, internalPn: `P-${itemId}`, mpn: '', manufacturer: '', description: '', package: '', note: '' })),
};

function filled(): ReplyForm {
  const form = initialReplyForm(view);
  // Part 2 priced at two of the three quantities, part 3 declined, part 1 left for later.
  const two = form.items[1];
  Object.assign(two, { moq: '5k', orderMultiple: '5,000', leadTimeDays: '21', validUntil: '2099-12-31' });
  two.priceBreaks[0].unitPrice = '0.0021';
  two.priceBreaks[2].unitPrice = '0.0016';
  form.items[2].declined = true;
  return form;
}

describe('the supplier answer form', () => {
  it('starts with one price-break row per requested quantity, in the supplier’s currency and Incoterm', () => {
    const form = initialReplyForm(view);
    expect(form.items[0]).toMatchObject({ currency: 'CNY', incoterm: 'FOB', orderMultiple: '1' });
    expect(form.items[0].priceBreaks.map((row) => row.minQty)).toEqual(['10000', '50000', '100000']);
  });

  it('sends priced and declined parts only, skipping rows without a price', () => {
    const checked = checkReply(filled(), '2026-01-01');
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    expect(checked.body.items).toEqual([
      {
        itemId: '2', declined: false, currency: 'CNY', incoterm: 'FOB', moq: 5000, orderMultiple: 5000, leadTimeDays: 21, validUntil: '2099-12-31',
        priceBreaks: [{ minQty: 10000, unitPrice: '0.0021' }, { minQty: 100000, unitPrice: '0.0016' }],
      },
      { itemId: '3', declined: true },
    ]);
    expect(checked.map).toEqual([{ item: 1, rows: [0, 2] }, { item: 2, rows: [] }]);
  });

  it('puts problems on the fields typed, with the shared schema’s rules', () => {
    const form = filled();
    form.items[1].priceBreaks[2].unitPrice = '0.00000001';
    form.items[1].leadTimeDays = '';
    form.items[1].currency = 'XX';
    const checked = checkReply(form, '2026-01-01');
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    const paths = checked.problems.map((p) => p.path);
    expect(paths).toEqual(expect.arrayContaining(['items.1.priceBreaks.2.unitPrice', 'items.1.leadTimeDays', 'items.1.currency']));
    expect(checked.problems.find((p) => p.path === 'items.1.leadTimeDays')?.message).toBe('is required');
  });

  it('refuses an offer that has already expired, and an empty answer', () => {
    const form = filled();
    form.items[1].validUntil = '2025-12-31';
    const checked = checkReply(form, '2026-01-01');
    expect(!checked.ok && checked.problems).toEqual([{ path: 'items.1.validUntil', message: 'must be today or later' }]);
    const empty = checkReply(initialReplyForm(view), '2026-01-01');
    expect(!empty.ok && empty.message).toMatch(/at least one part/);
  });

  it('maps the server’s body positions, and its item ids, back to the form', () => {
    const form = filled();
    const map = [{ item: 1, rows: [0, 2] }, { item: 2, rows: [] }];
    expect(formPath('items.0.priceBreaks.1.unitPrice', map, form)).toBe('items.1.priceBreaks.2.unitPrice');
    expect(formPath('items.0.moq', map, form)).toBe('items.1.moq');
    // The after-schema check names the item by id ("2" is form item 1), even where an id looks like a position.
    expect(formPath('items.2.validUntil', map, form, 'must be today or later')).toBe('items.1.validUntil');
    expect(formPath('items.9.moq', map, form)).toBeNull();
  });
});
