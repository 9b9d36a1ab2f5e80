import { useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { ErrorState, describeError } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions } from '../../../features/auth/api';
import { useSession } from '../../../features/auth/session-context';
import { billingKeys, billingQueryOptions, invoicesQueryOptions } from '../../../features/billing/api';
import { useCheckoutConfirmation } from '../../../features/billing/checkout';
import { useOpenBillingPortal } from '../../../features/billing/hooks';
import { CheckoutNotice } from '../../../features/billing/components/checkout-notice';
import { InvoicesTable } from '../../../features/billing/components/invoices-table';
import { PlanCards } from '../../../features/billing/components/plan-cards';
import { PlanStatus } from '../../../features/billing/components/plan-status';
import { UsageList } from '../../../features/billing/components/usage-list';

export const billingLoader = (queryClient: QueryClient) => async () => {
  const session = await queryClient.ensureQueryData(meQueryOptions());
  if (!session) return null; // the app shell's loader sends this visitor to sign in
  // Invoices come from the payment service: warmed, but the page does not wait on them.
  if (can(session.role, 'billing.manage')) void queryClient.prefetchQuery(invoicesQueryOptions());
  await queryClient.ensureQueryData(billingQueryOptions());
  return null;
};

/** Leaves for a page of the payment service (checkout or portal); it sends the owner back here. */
function goTo(url: string) {
  window.location.assign(url);
}

function Invoices() {
  const invoices = useQuery(invoicesQueryOptions());
  if (invoices.isPending) return <LoadingState label="Reading invoices…" />;
  if (invoices.isError) return <ErrorState title="The invoices could not be read" error={invoices.error} onRetry={() => void invoices.refetch()} />;
  return <InvoicesTable invoices={invoices.data} />;
}

function ManageBillingButton() {
  const portal = useOpenBillingPortal();
  return (
    <div className="flex flex-col items-end gap-1">
      <Button variant="secondary" pending={portal.isPending} onClick={() => portal.mutate(undefined, { onSuccess: ({ url }) => goTo(url) })}>
        Manage billing
      </Button>
      {portal.isError ? (
        <p role="alert" className="text-xs text-brick">
          {describeError(portal.error)}
        </p>
      ) : null}
    </div>
  );
}

/**
 * The workspace's plan: what it is on and until when, what it uses against the limits,
 * the three plans with the way up, and the invoices. Every member may read it (the limits
 * concern them all); only the owner pays, changes the plan and sees invoices.
 */
export function BillingRoute() {
  const session = useSession();
  const queryClient = useQueryClient();
  const canManage = can(session.role, 'billing.manage');
  const [params] = useSearchParams();
  const outcome = params.get('checkout');
  const returned = canManage && (outcome === 'success' || outcome === 'cancelled') ? outcome : null;
  const { phase, billing } = useCheckoutConfirmation(returned === 'success');

  useEffect(() => {
    // A confirmed payment comes with its first invoice.
    if (phase === 'confirmed') void queryClient.invalidateQueries({ queryKey: billingKeys.invoices() });
  }, [phase, queryClient]);

  return (
    <>
      <PageHeader
        title="Plan & billing"
        description={`The plan of ${session.workspace.name}, what it uses against the plan's limits, and what it pays.`}
        actions={canManage && billing.status !== 'none' ? <ManageBillingButton /> : null}
      />
      <div className="flex flex-col gap-8">
        {returned ? <CheckoutNotice outcome={returned} phase={phase} planName={billing.planName} /> : null}
        {canManage ? null : (
          <FormAlert tone="info">Only the workspace owner changes the plan and sees the invoices. This is a read-only summary.</FormAlert>
        )}

        <section aria-labelledby="current-plan" className="grid gap-6 rounded-lg border border-rule bg-surface p-6 md:grid-cols-2">
          <div className="flex flex-col gap-2">
            <h2 id="current-plan" className="text-xs font-semibold tracking-wide text-muted uppercase">
              Current plan
            </h2>
            <PlanStatus billing={billing} />
          </div>
          <div className="flex flex-col gap-2">
            <h2 className="text-xs font-semibold tracking-wide text-muted uppercase">Usage</h2>
            <UsageList billing={billing} />
          </div>
        </section>

        <section aria-labelledby="plans-title" className="flex flex-col gap-3">
          <h2 id="plans-title" className="text-lg font-semibold">
            Plans
          </h2>
          <PlanCards billing={billing} canManage={canManage} onCheckout={goTo} />
          <p className="max-w-prose text-xs text-muted">
            Payment is taken by our payment service on its own page; Farthing never sees the card. Moving to a smaller plan never deletes
            anything: over a limit, new BOMs or invitations wait until there is room.
          </p>
        </section>

        {canManage ? (
          <section aria-labelledby="invoices-title" className="flex flex-col gap-3">
            <h2 id="invoices-title" className="text-lg font-semibold">
              Invoices
            </h2>
            <Invoices />
          </section>
        ) : null}
      </div>
    </>
  );
}
