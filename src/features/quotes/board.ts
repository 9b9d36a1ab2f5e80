import { compareDecimal } from '../../lib/money';
import type { IneligibleReason, Offer } from './api';

/** Each reason an offer cannot be chosen, in the buyer's words. */
export const reasonWords: Record<IneligibleReason, string> = {
  expired: 'Expired',
  not_yet_valid: 'Not yet valid',
  inactive_supplier: 'Supplier inactive',
  lead_time: "Lead time over the profile's maximum",
  missing_fx: 'No FX rate',
};

/**
 * Every reason of an offer in words, the server's order kept ("Expired; No FX rate").
 * A quote that states no lead time fails a profile's maximum too; it says so plainly.
 */
export function offerReasons(offer: Pick<Offer, 'reasons' | 'reason' | 'leadTimeDays'>): string[] {
  const reasons = offer.reasons.length ? offer.reasons : offer.reason ? [offer.reason] : [];
  return reasons.map((r) =>
    r === 'lead_time' && offer.leadTimeDays === null ? "Lead time not stated; the profile has a maximum" : reasonWords[r] ?? r,
  );
}

/**
 * The board's first order: eligible offers from the lowest landed cost per piece, then
 * the ineligible ones (priced where a rate allowed, unpriced last), ties by supplier.
 */
export function boardOrder(offers: readonly Offer[]): Offer[] {
  const rank = (o: Offer) => (o.eligible ? 0 : o.landedPerPiece !== null ? 1 : 2);
  return [...offers].sort((a, b) => {
    const byRank = rank(a) - rank(b);
    if (byRank !== 0) return byRank;
    if (a.landedPerPiece !== null && b.landedPerPiece !== null) {
      const byCost = compareDecimal(a.landedPerPiece, b.landedPerPiece);
      if (byCost !== 0) return byCost;
    }
    return (a.supplierName ?? '').localeCompare(b.supplierName ?? '');
  });
}
