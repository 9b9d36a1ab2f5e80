import { dec, Dec, ONE, pctToFraction, perUnitText, HUNDRED } from './decimal';
import type { ShelfLadderInput, ShelfLadderResult } from './types';

/**
 * Design to cost, from the shelf down: shelf price P incl. VAT v → net P / (1 + v) →
 * retailer's buying price net × (1 − r) (r = retailer margin on its selling price) →
 * × (1 − i) (i = importer margin on the importer's selling price) → minus freight to store
 * per unit = the allowed landed cost. Margins, not markups. The gap is the computed landed
 * cost minus the allowed one (positive: the product costs too much). One currency.
 */
export function shelfLadder(input: ShelfLadderInput): ShelfLadderResult {
  const price = dec(input.price, 'price');
  const net = price.div(ONE.plus(pctToFraction(input.vatPct, 'vatPct')));
  const retailerBuys = net.times(ONE.minus(pctToFraction(input.retailerMarginPct, 'retailerMarginPct')));
  const importerNet = retailerBuys.times(ONE.minus(pctToFraction(input.importerMarginPct, 'importerMarginPct')));
  const allowed = importerNet.minus(dec(input.freightToStorePerUnit, 'freightToStorePerUnit'));
  const landed: Dec | null =
    input.landedPerUnit === null || input.landedPerUnit === undefined || input.landedPerUnit === ''
      ? null
      : dec(input.landedPerUnit, 'landedPerUnit');
  return {
    rungs: [
      { name: 'shelf_price', value: perUnitText(price) },
      { name: 'net_of_vat', value: perUnitText(net) },
      { name: 'retailer_buying_price', value: perUnitText(retailerBuys) },
      { name: 'importer_net', value: perUnitText(importerNet) },
      { name: 'allowed_landed', value: perUnitText(allowed) },
    ],
    allowedLandedCost: perUnitText(allowed),
    allowedSharePct: price.isZero() ? perUnitText(price) : perUnitText(allowed.div(price).times(HUNDRED)),
    landedPerUnit: landed === null ? null : perUnitText(landed),
    gap: landed === null ? null : perUnitText(landed.minus(allowed)),
  };
}
