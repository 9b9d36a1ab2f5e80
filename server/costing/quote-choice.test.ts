import { describe, expect, it } from 'vitest';
import { CostingInputError } from './errors';
import { eligibilityReasons, prepareQuote, quoteBoard, supplierMap } from './quote-choice';
import { breaks, fxRow, makePart, makeQuote, makeSupplier } from './test-factories';
import type { QuoteBoardInput } from './types';

const part = makePart({ id: 'tb-led-warm', category: 'led', hsCode: '8541.41' });
const active = makeSupplier({ id: 'sup-lamplight' });
const other = makeSupplier({ id: 'sup-brightway' });
const idle = makeSupplier({ id: 'sup-idle', active: false });
const suppliers = supplierMap([active, other, idle]);
const D = '2026-12-01';

describe('eligibility on the costing date', () => {
  const reasons = (overrides: Parameters<typeof makeQuote>[2], supplier = active, maxLead: number | null = null) =>
    eligibilityReasons(prepareQuote(makeQuote(part, supplier, overrides), suppliers), D, maxLead);

  it('accepts open ends and the boundary days themselves', () => {
    expect(reasons({ validFrom: null, validUntil: null })).toEqual([]);
    expect(reasons({ validFrom: D, validUntil: D })).toEqual([]);
  });
  it('names expired, not yet valid, inactive supplier and lead time', () => {
    expect(reasons({ validUntil: '2026-11-30' })).toEqual(['expired']);
    expect(reasons({ validFrom: '2026-12-02' })).toEqual(['not_yet_valid']);
    expect(reasons({}, idle)).toEqual(['inactive_supplier']);
    expect(reasons({ leadTimeDays: 45 }, active, 30)).toEqual(['lead_time']);
    expect(reasons({ leadTimeDays: 30 }, active, 30)).toEqual([]);
  });
  it('does not let an unknown lead time pass a maximum', () => {
    expect(reasons({ leadTimeDays: null }, active, 30)).toEqual(['lead_time']);
    expect(reasons({ leadTimeDays: null }, active, null)).toEqual([]);
  });
  it('refuses a quote whose supplier is not in the input', () => {
    expect(() => prepareQuote(makeQuote(part, makeSupplier({ id: 'sup-ghost' })), suppliers)).toThrow(CostingInputError);
  });
});

function board(overrides: Partial<QuoteBoardInput>): ReturnType<typeof quoteBoard> {
  return quoteBoard({
    partId: part.id,
    qty: 10_000,
    date: D,
    currency: 'USD',
    profile: {},
    part,
    quotes: [],
    suppliers: [active, other, idle],
    fxRates: [fxRow('2026-11-30', 'EUR', 'USD', '1.10'), fxRow('2026-11-30', 'EUR', 'CNY', '7.70')],
    ...overrides,
  });
}

describe('quote board', () => {
  it('compares offers in one currency, landed per piece needed, and picks the cheapest eligible', () => {
    const usd = makeQuote(part, active, { id: 'q-usd', currency: 'USD', incoterm: 'DDP', priceBreaks: breaks([1, '0.0100']) });
    // 0.0680 CNY at 7.70 CNY/EUR and 1.10 USD/EUR = 0.009714… USD, FOB with 10 % freight and 3.7 % CIF-basis duty.
    const cny = makeQuote(part, other, { id: 'q-cny', currency: 'CNY', incoterm: 'FOB', priceBreaks: breaks([1, '0.0680']) });
    const r = board({
      quotes: [usd, cny],
      profile: { freightPct: '10', dutyBasis: 'CIF', defaultDutyPct: '3.7', freightPerShipment: '500', shipments: 2 },
    });
    const [a, b] = r.offers;
    expect(a).toMatchObject({ quoteId: 'q-usd', eligible: true, reason: null, orderQty: 10000, goodsValue: '100.000000', landed: '100.000000' });
    // CNY goods 680 → 97.142857… USD; freight 9.714286; duty 3.7 % × 106.857143 = 3.953714; landed 110.81.
    expect(b.goodsValue).toBe('97.142857');
    expect(b.freight).toBe('9.714286');
    expect(b.duty).toBe('3.953714');
    expect(b.landed).toBe('110.810857');
    expect(b.landedPerPiece).toBe('0.0110810857');
    expect(b.fxRates.map((x) => x.quote)).toEqual(['CNY', 'USD']);
    expect(r.cheapestQuoteId).toBe('q-usd');
    expect(r.dutyPct).toBe('3.7');
  });

  it('charges the excess: landed per piece is the whole order over the pieces needed', () => {
    const reel = makeQuote(part, active, { moq: 4000, orderMultiple: 4000, priceBreaks: breaks([1, '0.01']) });
    const [o] = board({ qty: 4100, quotes: [reel] }).offers;
    expect(o).toMatchObject({ orderQty: 8000, excessQty: 3900, goodsValue: '80.000000', excessValue: '39.000000' });
    expect(o.landedPerPiece).toBe('0.0195121951');
  });

  it('prices ineligible offers too, says why, and never picks them', () => {
    const expired = makeQuote(part, active, { id: 'q-old', validUntil: '2026-06-30', priceBreaks: breaks([1, '0.001']) });
    const idleQ = makeQuote(part, idle, { id: 'q-idle', priceBreaks: breaks([1, '0.002']) });
    const jpy = makeQuote(part, active, { id: 'q-jpy', currency: 'JPY', priceBreaks: breaks([1, '1']) });
    const ok = makeQuote(part, other, { id: 'q-ok', priceBreaks: breaks([1, '0.02']) });
    const r = board({ quotes: [expired, idleQ, jpy, ok] });
    expect(r.offers.map((o) => [o.quoteId, o.eligible, o.reason])).toEqual([
      ['q-old', false, 'expired'],
      ['q-idle', false, 'inactive_supplier'],
      ['q-jpy', false, 'missing_fx'],
      ['q-ok', true, null],
    ]);
    expect(r.offers[0].landed).toBe('10.000000');
    expect(r.offers[2]).toMatchObject({ goodsValue: null, landed: null, orderQty: 10000, unitPrice: '1.0000000000' });
    expect(r.cheapestQuoteId).toBe('q-ok');
  });

  it('breaks a tie on landed cost by shorter lead time, then by the older quote', () => {
    const slow = makeQuote(part, active, { id: 'q-slow', leadTimeDays: 40, createdAt: '2026-01-01T00:00:00Z' });
    const fast = makeQuote(part, other, { id: 'q-fast', leadTimeDays: 10, createdAt: '2026-03-01T00:00:00Z' });
    expect(board({ quotes: [slow, fast] }).cheapestQuoteId).toBe('q-fast');
    const newer = makeQuote(part, active, { id: 'q-a-newer', leadTimeDays: 10, createdAt: '2026-05-01T00:00:00Z' });
    const older = makeQuote(part, other, { id: 'q-z-older', leadTimeDays: 10, createdAt: '2025-05-01T00:00:00Z' });
    expect(board({ quotes: [newer, older] }).cheapestQuoteId).toBe('q-z-older');
    expect(board({ quotes: [older, newer] }).cheapestQuoteId).toBe('q-z-older');
  });

  it('leaves per-shipment amounts to the cost roll: a FOB offer carries only percentage freight', () => {
    const fob = makeQuote(part, active, { incoterm: 'FOB' });
    const [o] = board({ quotes: [fob], profile: { freightPerShipment: '400', shipments: 1, feesPerShipment: '75' } }).offers;
    expect(o.freight).toBe('0.000000');
    expect(o.landed).toBe('100.000000');
  });

  it('has no cheapest quote when none is eligible', () => {
    const late = makeQuote(part, active, { leadTimeDays: 90 });
    expect(board({ quotes: [late], profile: { maxLeadTimeDays: 60 } }).cheapestQuoteId).toBeNull();
  });
});
