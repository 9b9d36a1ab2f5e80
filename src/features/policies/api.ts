import { queryOptions } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
// Types only (erased at build): the derating engine's policy schema is the source of this shape.
import type { PolicyLimits } from '../../../server/derating';

export type { PolicyLimit, PolicyLimits, TjAllowed, Confidence } from '../../../server/derating';

export type StressPolicy = {
  id: string;
  name: string;
  /** The seeded policy this one was made from ("shelf-grade", "careful", "hi-rel"), null for one made here. */
  seededFrom: string | null;
  limits: PolicyLimits;
  notes: string;
  version: number;
  isDefault: boolean;
};

export type StressPolicies = { items: StressPolicy[]; caution: string };

export const policyKeys = {
  all: ['stress-policies'] as const,
  lists: () => [...policyKeys.all, 'list'] as const,
  list: () => [...policyKeys.lists(), {}] as const,
};

/** A workspace holds a handful of policies: the list answers them all at once, with the caution. */
export const policiesQueryOptions = () =>
  queryOptions({
    queryKey: policyKeys.list(),
    queryFn: async ({ signal }) => {
      const page = await api.get<StressPolicies & { nextCursor: string | null }>('/api/stress-policies', { signal });
      return { items: page.items, caution: page.caution } satisfies StressPolicies;
    },
  });
