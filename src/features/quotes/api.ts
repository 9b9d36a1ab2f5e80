import { queryOptions } from '@tanstack/react-query';
import { api, getAllPages } from '../../lib/api-client';
import type { QuoteOut } from '../../shared/schemas/quotes';

export type Quote = QuoteOut;

/** Why an offer cannot be chosen (the quote board's `reasons`). */
export type IneligibleReason = 'expired' | 'not_yet_valid' | 'inactive_supplier' | 'lead_time' | 'missing_fx';

/** One offer on the quote board: money in the board's currency unless a field says otherwise. */
export type Offer = {
  quoteId: string;
  supplierId: string;
  supplierName: string | null;
  eligible: boolean;
  reason: IneligibleReason | null;
  reasons: IneligibleReason[];
  incoterm: string;
  leadTimeDays: number | null;
  orderQty: number;
  excessQty: number;
  /** In the quote's currency. */
  unitPrice: string;
  unitPriceCurrency: string;
  unitPriceConverted: string | null;
  goodsValue: string | null;
  excessValue: string | null;
  origin: string | null;
  freight: string | null;
  insurance: string | null;
  duty: string | null;
  destination: string | null;
  landed: string | null;
  landedPerPiece: string | null;
  fxRate: string | null;
};

export type QuoteBoard = {
  partId: string;
  qty: number;
  date: string;
  currency: string;
  dutyPct: string;
  profileId: string | null;
  profileName: string | null;
  offers: Offer[];
  cheapestQuoteId: string | null;
};

/** The board's inputs; what is left out the server decides (the first profile, its currency, today). */
export type BoardParams = { qty: number; currency?: string; profileId?: string; date?: string };

export type QuoteFilters = { partId?: string; supplierId?: string };

// Offers sit under the quotes key: any change to a quote also changes the board.
export const quoteKeys = {
  all: ['quotes'] as const,
  lists: () => [...quoteKeys.all, 'list'] as const,
  list: (filters: QuoteFilters) => [...quoteKeys.lists(), { partId: filters.partId ?? '', supplierId: filters.supplierId ?? '' }] as const,
  offersAll: () => [...quoteKeys.all, 'offers'] as const,
  offers: (partId: string, params: BoardParams) =>
    [...quoteKeys.offersAll(), partId, { qty: params.qty, currency: params.currency ?? '', profileId: params.profileId ?? '', date: params.date ?? '' }] as const,
};

/** Quotes of one part or one supplier (or all), expired ones included and marked. */
export const quotesQueryOptions = (filters: QuoteFilters) =>
  queryOptions({
    queryKey: quoteKeys.list(filters),
    queryFn: ({ signal }) =>
      filters.partId && !filters.supplierId
        ? getAllPages<Quote>(`/api/parts/${encodeURIComponent(filters.partId)}/quotes`, signal)
        : getAllPages<Quote>('/api/quotes', signal, { partId: filters.partId, supplierId: filters.supplierId }),
  });

export const offersQueryOptions = (partId: string, params: BoardParams) =>
  queryOptions({
    queryKey: quoteKeys.offers(partId, params),
    queryFn: ({ signal }) =>
      api.get<QuoteBoard>(`/api/parts/${encodeURIComponent(partId)}/offers`, {
        query: { qty: params.qty, currency: params.currency || undefined, profileId: params.profileId || undefined, date: params.date || undefined },
        signal,
      }),
  });
