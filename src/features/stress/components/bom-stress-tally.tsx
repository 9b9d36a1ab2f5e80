import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { StressTally } from '../../../components/ui/stress-status';
import { stressQueryOptions } from '../api';

/**
 * The stress tally of one BOM for the running-total panel: lines by status under the
 * BOM's policy. It reads the same query as the Stress check tab, which every line save
 * invalidates, so it follows edits as the landed cost does.
 */
export function BomStressTally({ bomId }: { bomId: string }) {
  const stress = useQuery({ ...stressQueryOptions(bomId), placeholderData: keepPreviousData });
  return (
    <div className="flex flex-col gap-1.5" aria-busy={stress.isFetching || undefined}>
      <div className="flex items-baseline justify-between gap-2">
        <h3 className="text-muted">Stress tally</h3>
        {stress.data ? (
          <Link to={`/boms/${bomId}/stress-check`} className="text-xs text-muted underline underline-offset-2 hover:text-ink">
            {stress.data.policyName}
          </Link>
        ) : null}
      </div>
      {stress.data ? (
        <StressTally counts={stress.data.summary} layout="list" />
      ) : stress.isError ? (
        <p className="text-xs text-muted">The stress check could not be run.</p>
      ) : (
        <p className="text-xs text-muted">Checking…</p>
      )}
    </div>
  );
}
