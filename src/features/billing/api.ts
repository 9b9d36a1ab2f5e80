import { queryOptions } from '@tanstack/react-query';
import { api, type Page } from '../../lib/api-client';
import type { Plan, PlanId } from '../../shared/plans';

export type PlanLimits = Plan['limits'];
export type BillingStatus = 'none' | 'active' | 'past_due' | 'canceled';

/** GET /api/billing: the plan in force, the subscription behind it, and usage against its limits. */
export type Billing = {
  /** The plan whose limits apply now (Bench once a grace period has run out). */
  plan: PlanId;
  planName: string;
  /** The plan paid for, which may differ from `plan` while a payment is overdue. */
  subscribedPlan: PlanId;
  status: BillingStatus;
  currentPeriodEnd: string | null;
  cancelAtPeriodEnd: boolean;
  graceEndsAt: string | null;
  limits: PlanLimits;
  usage: { boms: number; members: number; pendingInvites: number };
  plans: { id: PlanId; name: string; monthlyCents: number; limits: PlanLimits }[];
};

/** One invoice of the subscription; amounts in the currency's minor unit. */
export type Invoice = {
  id: string;
  status: string | null;
  amountDue: number;
  amountPaid: number;
  currency: string;
  created: string;
  url: string | null;
};

export const billingKeys = {
  all: ['billing'] as const,
  /** The one key every limit on every screen reads. */
  current: () => [...billingKeys.all, 'current'] as const,
  invoices: () => [...billingKeys.all, 'invoices'] as const,
};

export const billingQueryOptions = () =>
  queryOptions({
    queryKey: billingKeys.current(),
    queryFn: ({ signal }) => api.get<Billing>('/api/billing', { signal }),
    // Usage moves with every BOM and invitation made elsewhere: look again on each visit.
    staleTime: 5_000,
  });

/** Invoices; only an owner may read them. */
export const invoicesQueryOptions = () =>
  queryOptions({
    queryKey: billingKeys.invoices(),
    queryFn: async ({ signal }) => (await api.get<Page<Invoice>>('/api/billing/invoices', { signal })).items,
  });
