import { Outlet, type LoaderFunctionArgs } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useSession } from '../../../features/auth/session-context';
import { bomQueryOptions, costQueryOptions } from '../../../features/boms/api';
import { BomHeader } from '../../../features/boms/components/bom-header';
import { BomTabs } from '../../../features/boms/components/bom-tabs';
import { RunningTotal } from '../../../features/boms/components/running-total';
import { BomStressTally } from '../../../features/stress/components/bom-stress-tally';
import { bomIdFrom, useBomId } from './bom-params';

export const bomPageLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = bomIdFrom(params);
    const bom = await queryClient.ensureQueryData(bomQueryOptions(id));
    // Warm the running total; the page does not wait for it.
    void queryClient.prefetchQuery(costQueryOptions(id, { qty: bom.plannedQty }));
    return null;
  };

/** The BOM page: heading and state actions, the tabs, and the running total beside them. */
export function BomPageRoute() {
  const session = useSession();
  const { data: bom } = useSuspenseQuery(bomQueryOptions(useBomId()));
  return (
    <>
      <BomHeader key={bom.id} bom={bom} role={session.role} />
      <BomTabs bomId={bom.id} />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_15rem]">
        <div className="min-w-0">
          <Outlet />
        </div>
        <aside className="lg:sticky lg:top-4 lg:self-start">
          <RunningTotal bom={bom} stress={<BomStressTally bomId={bom.id} />} />
        </aside>
      </div>
    </>
  );
}
