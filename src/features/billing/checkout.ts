import { useEffect, useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { billingQueryOptions, type Billing } from './api';

/** A paid subscription is in force: what a successful checkout leads to once the webhook lands. */
export function paymentConfirmed(billing: Billing): boolean {
  return billing.status === 'active' && billing.subscribedPlan !== 'bench';
}

// The webhook usually lands within a second or two of the return; after this the screen
// says it is taking longer and asks less often.
const PATIENCE_MS = 20_000;

export type CheckoutPhase = 'confirming' | 'slow' | 'confirmed';

/**
 * After the return from the hosted checkout page the plan changes only when the payment
 * service's webhook reaches the server. While `waiting`, this polls the one billing query
 * (so every limit banner follows) until the subscription shows as active.
 */
export function useCheckoutConfirmation(waiting: boolean): { phase: CheckoutPhase | null; billing: Billing } {
  const [slow, setSlow] = useState(false);
  useEffect(() => {
    if (!waiting) return;
    const timer = window.setTimeout(() => setSlow(true), PATIENCE_MS);
    return () => window.clearTimeout(timer);
  }, [waiting]);

  const billing = useSuspenseQuery({
    ...billingQueryOptions(),
    refetchInterval: (query) => {
      if (!waiting || (query.state.data && paymentConfirmed(query.state.data))) return false;
      return slow ? 5_000 : 1_000;
    },
  });

  if (!waiting) return { phase: null, billing: billing.data };
  if (paymentConfirmed(billing.data)) return { phase: 'confirmed', billing: billing.data };
  return { phase: slow ? 'slow' : 'confirming', billing: billing.data };
}
