import { queryOptions } from '@tanstack/react-query';
import { api, getAllPages } from '../../lib/api-client';
import type { PartCategory } from '../../shared/schemas/trade';

/** A landed-cost profile as the API answers it: percentages and money as decimal strings. */
export type Profile = {
  id: string;
  name: string;
  currency: string;
  originPct: string;
  freightPct: string;
  freightPerShipment: string;
  freightCurrency: string | null;
  shipments: number;
  freightBasis: 'value' | 'weight';
  insurancePct: string;
  dutyBasis: 'FOB' | 'CIF';
  dutyRates: { hsPrefix: string; ratePct: string }[];
  defaultDutyPct: string;
  feesPerShipment: string;
  destinationPct: string;
  maxLeadTimeDays: number | null;
  attritionPct: Partial<Record<PartCategory, string>>;
  smtRatePerPlacement: string;
  thtRatePerJoint: string;
  handRatePerOp: string;
  notes: string;
  version: number;
};

export const profileKeys = {
  all: ['landed-cost-profiles'] as const,
  lists: () => [...profileKeys.all, 'list'] as const,
  list: () => [...profileKeys.lists(), {}] as const,
  details: () => [...profileKeys.all, 'detail'] as const,
  detail: (id: string) => [...profileKeys.details(), id] as const,
};

export const profilesQueryOptions = () =>
  queryOptions({
    queryKey: profileKeys.list(),
    queryFn: ({ signal }) => getAllPages<Profile>('/api/landed-cost-profiles', signal),
  });

export const profileQueryOptions = (id: string) =>
  queryOptions({
    queryKey: profileKeys.detail(id),
    queryFn: ({ signal }) => api.get<Profile>(`/api/landed-cost-profiles/${encodeURIComponent(id)}`, { signal }),
  });
