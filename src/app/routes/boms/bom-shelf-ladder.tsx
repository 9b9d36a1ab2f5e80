import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { isApiError } from '../../../lib/api-client';
import { ErrorState } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { useSession } from '../../../features/auth/session-context';
import { bomQueryOptions, ladderQueryOptions } from '../../../features/boms/api';
import { ShelfForm } from '../../../features/boms/components/shelf-form';
import { ShelfLadderView } from '../../../features/boms/components/shelf-ladder-view';
import { useBomId } from './bom-params';

/** The Shelf-price ladder tab: design to cost, from the shelf price down to the landed cost it allows. */
export function BomShelfLadderRoute() {
  const id = useBomId();
  const session = useSession();
  const { data: bom } = useSuspenseQuery(bomQueryOptions(id));
  const hasPrice = Boolean(bom.shelf.price);
  const ladder = useQuery({ ...ladderQueryOptions(id, null), enabled: hasPrice });
  const readOnly = bom.state === 'released' || !can(session.role, 'boms.write');
  // The server answers 400 while no shelf price is set; the form is the way forward then.
  const noPrice = !hasPrice || (isApiError(ladder.error) && ladder.error.status === 400);

  return (
    <div className="flex flex-col gap-5">
      <p className="max-w-prose text-sm text-muted">
        From the price on the shelf, take off VAT, the retailer&apos;s margin, your margin and the freight to the store: what is left is the landed cost this
        product may have. Margins are on the selling price, not markups on cost.
      </p>
      {noPrice ? (
        <FormAlert tone="info">
          {readOnly ? 'No shelf price is set for this revision yet.' : 'Set the shelf price of this BOM to see the ladder.'}
        </FormAlert>
      ) : ladder.isPending ? (
        <LoadingState label="Working down the ladder…" />
      ) : ladder.isError ? (
        <ErrorState title="The ladder could not be worked out" error={ladder.error} onRetry={() => void ladder.refetch()} />
      ) : (
        <ShelfLadderView ladder={ladder.data} />
      )}
      <ShelfForm bom={bom} readOnly={readOnly} />
    </div>
  );
}
