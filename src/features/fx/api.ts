import { queryOptions } from '@tanstack/react-query';
import { getAllPages } from '../../lib/api-client';

/** 1 `base` = `rate` `quote` on `date`. */
export type FxRate = { id: string; date: string; base: string; quote: string; rate: string; source: string };

export type FxFilters = { from?: string; to?: string; currency?: string };

export const fxKeys = {
  all: ['fx-rates'] as const,
  lists: () => [...fxKeys.all, 'list'] as const,
  list: (filters: FxFilters) => [...fxKeys.lists(), { from: filters.from ?? '', to: filters.to ?? '', currency: filters.currency ?? '' }] as const,
};

// The server answers newest first, up to this many rows per request.
export const FX_LIST_LIMIT = 5000;

export const fxRatesQueryOptions = (filters: FxFilters) =>
  queryOptions({
    queryKey: fxKeys.list(filters),
    queryFn: ({ signal }) =>
      getAllPages<FxRate>('/api/fx-rates', signal, {
        from: filters.from || undefined,
        to: filters.to || undefined,
        currency: filters.currency || undefined,
        limit: FX_LIST_LIMIT,
      }),
  });
