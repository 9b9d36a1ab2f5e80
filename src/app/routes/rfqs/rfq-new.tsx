import { useNavigate } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { FormAlert } from '../../../components/ui/form-alert';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { billingQueryOptions } from '../../../features/billing/api';
import { LimitBanner } from '../../../features/billing/components/limit-banner';
import { bomsQueryOptions } from '../../../features/boms/api';
import { partSearchQueryOptions } from '../../../features/parts/api';
import { suppliersQueryOptions } from '../../../features/suppliers/api';
import { RfqForm } from '../../../features/rfqs/components/rfq-form';

export const rfqNewLoader = (queryClient: QueryClient) => async () => {
  void queryClient.prefetchQuery(billingQueryOptions());
  await Promise.all([queryClient.ensureQueryData(suppliersQueryOptions()), queryClient.ensureQueryData(bomsQueryOptions())]);
  return null;
};

/** A new request for quotation; on sending, its page with each supplier's status. */
export function RfqNewRoute() {
  const session = useSession();
  const navigate = useNavigate();
  const { data: suppliers } = useSuspenseQuery(suppliersQueryOptions());
  const { data: boms } = useSuspenseQuery(bomsQueryOptions());

  return (
    <>
      <PageHeader
        title="New RFQ"
        description="Each supplier you tick gets an e-mail with a private link: no account needed, a form or a spreadsheet to answer with."
      />
      <LimitBanner feature="rfq" role={session.role} />
      {/* The RFQs list offers this screen to buyers and the owner only; this guards an address typed by hand. */}
      {!can(session.role, 'rfqs.write') ? (
        <FormAlert tone="info">Only buyers and the workspace owner send requests for quotation.</FormAlert>
      ) : (
        <div className="rounded-lg border border-rule bg-surface p-6">
          <RfqForm
            boms={boms}
            suppliers={suppliers}
            searchParts={partSearchQueryOptions}
            onCancel={() => navigate('/rfqs')}
            onDone={(rfq) => navigate(`/rfqs/${rfq.id}`)}
          />
        </div>
      )}
    </>
  );
}
