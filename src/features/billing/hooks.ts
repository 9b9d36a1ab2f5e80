import { useMutation } from '@tanstack/react-query';
import { api } from '../../lib/api-client';
import type { PlanId } from '../../shared/plans';

/**
 * Asks for the payment service's hosted checkout page. Nothing in the cache changes yet:
 * the plan changes when the service's webhook arrives, which the billing screen waits for.
 */
export function useStartCheckout() {
  return useMutation({
    mutationFn: (plan: PlanId) => api.post<{ url: string }>('/api/billing/checkout', { plan }),
  });
}

/** Asks for the payment service's billing portal (change plan, card, cancel). */
export function useOpenBillingPortal() {
  return useMutation({
    mutationFn: () => api.post<{ url: string }>('/api/billing/portal'),
  });
}
