import { describe, expect, it } from 'vitest';
import type { Offer } from './api';
import { boardOrder, offerReasons } from './board';

function offer(over: Partial<Offer>): Offer {
  return {
    quoteId: '1', supplierId: '1', supplierName: 'Demo', eligible: true, reason: null, reasons: [], incoterm: 'FOB',
    leadTimeDays: 21, orderQty: 10000, excessQty: 0, unitPrice: '0.0100000000', unitPriceCurrency: 'CNY',
    unitPriceConverted: '0.0013768842', goodsValue: '13.768842', excessValue: '0.000000', origin: '0', freight: '0',
    insurance: '0', duty: '0', destination: '0', landed: '13.768842', landedPerPiece: '0.0013768842', fxRate: '0.1376884', ...over,
  };
}

describe('the quote board', () => {
  it('names every reason an offer is out, in words', () => {
    expect(offerReasons(offer({ eligible: false, reason: 'expired', reasons: ['expired', 'missing_fx'] }))).toEqual(['Expired', 'No FX rate']);
    expect(offerReasons(offer({ eligible: false, reason: 'lead_time', reasons: [] }))).toEqual(["Lead time over the profile's maximum"]);
    expect(offerReasons(offer({ eligible: false, reason: 'lead_time', reasons: ['lead_time'], leadTimeDays: null }))).toEqual([
      'Lead time not stated; the profile has a maximum',
    ]);
    expect(offerReasons(offer({}))).toEqual([]);
  });

  it('lists the cheapest eligible offer first and the unpriced last', () => {
    const ordered = boardOrder([
      offer({ quoteId: 'nofx', eligible: false, reason: 'missing_fx', reasons: ['missing_fx'], landedPerPiece: null }),
      offer({ quoteId: 'usd', landedPerPiece: '0.0020000000' }),
      offer({ quoteId: 'old', eligible: false, reason: 'expired', reasons: ['expired'], landedPerPiece: '0.0001000000' }),
      offer({ quoteId: 'cny', landedPerPiece: '0.0013768842' }),
    ]);
    expect(ordered.map((o) => o.quoteId)).toEqual(['cny', 'usd', 'old', 'nofx']);
  });
});
