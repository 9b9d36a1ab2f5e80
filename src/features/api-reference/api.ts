import { queryOptions } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import type { OpenApiDocument } from './openapi';

export const openApiKeys = {
  all: ['openapi'] as const,
  document: () => [...openApiKeys.all, 'document'] as const,
};

/** The server's own description of itself; it changes only with a deploy. */
export const openApiDocumentQueryOptions = () =>
  queryOptions({
    queryKey: openApiKeys.document(),
    queryFn: ({ signal }) => api.get<OpenApiDocument>('/api/openapi.json', { signal }),
    staleTime: 10 * 60_000,
  });
