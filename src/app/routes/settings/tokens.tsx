import { useState } from 'react';
import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { tokensQueryOptions, type NewApiToken } from '../../../features/tokens/api';
import { CreateTokenForm } from '../../../features/tokens/components/create-token-form';
import { NewTokenNotice } from '../../../features/tokens/components/new-token-notice';
import { TokensTable } from '../../../features/tokens/components/tokens-table';
import { billingQueryOptions } from '../../../features/billing/api';
import { limitState } from '../../../features/billing/limits';
import { LimitBanner } from '../../../features/billing/components/limit-banner';

export const tokensLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(tokensQueryOptions());
  return null;
};

export function TokensRoute() {
  const session = useSession();
  const { data: tokens } = useSuspenseQuery(tokensQueryOptions());
  // The secret of a token just made; held here only, so leaving the page forgets it.
  const [created, setCreated] = useState<NewApiToken | null>(null);
  const billing = useQuery(billingQueryOptions());
  const limit = billing.data ? limitState(billing.data, 'apiTokens') : null;

  return (
    <>
      <PageHeader
        title="API tokens"
        description={`A token lets a script use the API as you, in ${session.workspace.name}, with your role there.`}
      />
      <LimitBanner feature="apiTokens" role={session.role} />
      <div className="flex flex-col gap-6">
        {created ? <NewTokenNotice token={created} onDismiss={() => setCreated(null)} /> : null}
        <CreateTokenForm onCreated={setCreated} blockedReason={limit?.reason ?? null} />
        <TokensTable tokens={tokens} />
      </div>
    </>
  );
}
