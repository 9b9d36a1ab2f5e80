import { Link } from 'react-router-dom';
import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { billingQueryOptions } from '../../../features/billing/api';
import { limitState } from '../../../features/billing/limits';
import { LimitBanner } from '../../../features/billing/components/limit-banner';
import { rfqsQueryOptions } from '../../../features/rfqs/api';
import { RfqsTable } from '../../../features/rfqs/components/rfqs-table';

export const rfqsListLoader = (queryClient: QueryClient) => async () => {
  // The plan decides whether "New RFQ" is offered; it is warmed, not waited for.
  void queryClient.prefetchQuery(billingQueryOptions());
  await queryClient.ensureQueryData(rfqsQueryOptions());
  return null;
};

/** Requests for quotation sent to suppliers, with how far each has been answered. */
export function RfqsListRoute() {
  const session = useSession();
  const { data: rfqs } = useSuspenseQuery(rfqsQueryOptions());
  const billing = useQuery(billingQueryOptions());
  const mayWrite = can(session.role, 'rfqs.write');
  const blocked = billing.data ? limitState(billing.data, 'rfq') : null;

  const newButton = !mayWrite ? null : blocked ? (
    <>
      {/* The banner below says it on screen; the button carries the reason for screen readers and as a tooltip. */}
      <span id="new-rfq-blocked" className="sr-only">
        {blocked.reason}
      </span>
      <Button disabled aria-describedby="new-rfq-blocked" title={blocked.reason ?? undefined}>
        New RFQ
      </Button>
    </>
  ) : (
    <Link to="/rfqs/new" className={buttonClasses()}>
      New RFQ
    </Link>
  );

  return (
    <>
      <PageHeader
        title="RFQs"
        description="Requests for quotation sent to suppliers by e-mail; each answers on a private link and the offers land on the quote board."
        actions={newButton}
      />
      <LimitBanner feature="rfq" role={session.role} />
      <RfqsTable
        rfqs={rfqs}
        empty={
          <EmptyState title="No requests for quotation yet.">
            {!mayWrite
              ? 'A buyer or the owner sends RFQs; they appear here for everyone in the workspace.'
              : blocked
                ? `Requests for quotation come with the ${blocked.upgradeTo?.name ?? 'paid'} plan and above.`
                : 'Choose the parts (or a whole BOM), the suppliers and the quantities; each supplier gets a private link to answer on. Use New RFQ above.'}
          </EmptyState>
        }
      />
    </>
  );
}
