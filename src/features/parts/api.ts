import { queryOptions } from '@tanstack/react-query';
import { api, getAllPages, type Page } from '../../lib/api-client';
import type { PartOut } from '../../shared/schemas/parts';
import type { PartCategory } from '../../shared/schemas/trade';

export type Part = PartOut;

/** A datasheet attached to a part (GET /api/parts/:id/files). */
export type PartFile = {
  id: string;
  partId: string;
  filename: string;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  createdAt: string;
  url: string;
};

/** The server-side filters of the library: `q` in the trade's words, and a category. */
export type PartFilters = { q?: string; category?: PartCategory };

export const partKeys = {
  all: ['parts'] as const,
  lists: () => [...partKeys.all, 'list'] as const,
  list: (filters: PartFilters) => [...partKeys.lists(), { q: filters.q ?? '', category: filters.category ?? '' }] as const,
  searches: () => [...partKeys.all, 'search'] as const,
  search: (q: string) => [...partKeys.searches(), q] as const,
  details: () => [...partKeys.all, 'detail'] as const,
  detail: (id: string) => [...partKeys.details(), id] as const,
  files: (id: string) => [...partKeys.detail(id), 'files'] as const,
  boms: (id: string) => [...partKeys.detail(id), 'boms'] as const,
};

// Large pages: a library of 10,000 parts arrives in two requests, not twenty.
const LIBRARY_PAGE = 5000;

/** The whole library (or every part matching the filters), following cursors to the end. */
export const partsQueryOptions = (filters: PartFilters = {}) =>
  queryOptions({
    queryKey: partKeys.list(filters),
    queryFn: ({ signal }) =>
      getAllPages<Part>('/api/parts', signal, { q: filters.q || undefined, category: filters.category, limit: LIBRARY_PAGE }),
  });

/** The first matches of a search, for a picker (the quote board, a quote's part). */
export const partSearchQueryOptions = (q: string, limit = 25) =>
  queryOptions({
    queryKey: partKeys.search(q),
    queryFn: async ({ signal }) =>
      (await api.get<Page<Part>>('/api/parts', { query: { q: q.trim() || undefined, limit }, signal })).items,
  });

export const partQueryOptions = (id: string) =>
  queryOptions({
    queryKey: partKeys.detail(id),
    queryFn: ({ signal }) => api.get<Part>(`/api/parts/${encodeURIComponent(id)}`, { signal }),
  });

export const partFilesQueryOptions = (id: string) =>
  queryOptions({
    queryKey: partKeys.files(id),
    queryFn: ({ signal }) => getAllPages<PartFile>(`/api/parts/${encodeURIComponent(id)}/files`, signal),
  });

export interface PartBomUse {
  id: string;
  name: string;
  revision: number;
  state: string;
  refDes: string | null;
  qtyPerUnit: string;
}

export const partBomsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: partKeys.boms(id),
    queryFn: ({ signal }) => getAllPages<PartBomUse>(`/api/parts/${encodeURIComponent(id)}/boms`, signal),
  });

/** How a part is named in a list or a picker: our number, then the maker's. */
export function partLabel(part: Pick<Part, 'internalPn' | 'mpn'>): string {
  return part.mpn ? `${part.internalPn} · ${part.mpn}` : part.internalPn;
}
