import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import { isStaleVersion } from '../../lib/stale-version';
import type { QuoteCreateBody } from '../../shared/schemas/quotes';
import { quoteKeys, type Quote } from './api';
import type { quotePatch } from './quote-form';

// A quote change moves every list it is in and the quote board (both under quoteKeys.all).

export function useCreateQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: QuoteCreateBody) => api.post<Quote>('/api/quotes', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quoteKeys.all }),
  });
}

export function useUpdateQuote(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReturnType<typeof quotePatch>) => api.patch<Quote>(`/api/quotes/${encodeURIComponent(id)}`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quoteKeys.all }),
    onError: (error) => (isStaleVersion(error) ? queryClient.invalidateQueries({ queryKey: quoteKeys.lists() }) : undefined),
  });
}

export function useDeleteQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(`/api/quotes/${encodeURIComponent(id)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quoteKeys.all }),
  });
}
