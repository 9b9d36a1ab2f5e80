import { describe, expect, it } from 'vitest';
import { dec, roundHalfUp } from './decimal';
import { shelfLadder } from './shelf-ladder';

describe('shelf-price ladder', () => {
  it('1.00 incl. 20 % VAT, retailer 35 %, importer 25 %, 0.03 to store → allowed landed 0.376250 (#40) cp, local', () => {
    const r = shelfLadder({ price: '1.00', vatPct: '20', retailerMarginPct: '35', importerMarginPct: '25', freightToStorePerUnit: '0.03' });
    // Reference §8 rungs: 1.000000, 0.833333, 0.541667, 0.406250, 0.376250.
    expect(r.rungs.map((x) => [x.name, roundHalfUp(dec(x.value), 6).toFixed(6)])).toEqual([
      ['shelf_price', '1.000000'],
      ['net_of_vat', '0.833333'],
      ['retailer_buying_price', '0.541667'],
      ['importer_net', '0.406250'],
      ['allowed_landed', '0.376250'],
    ]);
    expect(r.allowedLandedCost).toBe('0.3762500000');
    expect(roundHalfUp(dec(r.allowedSharePct), 1).toFixed(1)).toBe('37.6');
    expect(r.gap).toBeNull();
  });

  it('compares with the computed landed cost: §5.2 at 10,000 units with NRE over the build (0.6968) is 0.3205 over (cp, local)', () => {
    const r = shelfLadder({
      price: '1.00', vatPct: '20', retailerMarginPct: '35', importerMarginPct: '25', freightToStorePerUnit: '0.03', landedPerUnit: '0.6968',
    });
    expect(r.gap).toBe('0.3205500000');
    expect(r.landedPerUnit).toBe('0.6968000000');
  });

  it('applies margins on selling price, not markups: 49.00 → 34.30 → 25.725 (#41) [WATERFALL] local', () => {
    const r = shelfLadder({ price: '49.00', vatPct: '0', retailerMarginPct: '30', importerMarginPct: '25', freightToStorePerUnit: '0' });
    expect(r.rungs[2].value).toBe('34.3000000000');
    expect(r.rungs[3].value).toBe('25.7250000000');
  });
});
