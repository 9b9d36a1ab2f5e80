import { queryOptions } from '@tanstack/react-query';
import { getAllPages } from '../../lib/api-client';
import type { TokenOut } from '../../shared/schemas/auth';

export type ApiToken = TokenOut;
/** The create answer: the only time the secret itself is seen. */
export type NewApiToken = TokenOut & { token: string };

export const tokenKeys = {
  all: ['tokens'] as const,
  list: () => [...tokenKeys.all, 'list'] as const,
};

export const tokensQueryOptions = () =>
  queryOptions({
    queryKey: tokenKeys.list(),
    queryFn: ({ signal }) => getAllPages<ApiToken>('/api/tokens', signal),
  });
