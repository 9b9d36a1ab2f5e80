import { Link, useNavigate } from 'react-router-dom';
import { useSuspenseQuery } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { formatDate } from '../../../lib/format';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { useSession } from '../../../features/auth/session-context';
import { bomQueryOptions } from '../../../features/boms/api';
import { StateBadge } from '../../../features/boms/components/state-badge';
import { useNewRevision } from '../../../features/boms/hooks';
import { useBomId } from './bom-params';

/** The Revisions tab: every revision of this product with its state and release date. */
export function BomRevisionsRoute() {
  const id = useBomId();
  const session = useSession();
  const navigate = useNavigate();
  const { data: bom } = useSuspenseQuery(bomQueryOptions(id));
  const newRevision = useNewRevision(id);
  const th = 'border-b border-rule px-3 py-2 text-left text-xs font-semibold tracking-wide text-muted uppercase';

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="max-w-prose text-sm text-muted">
          A released revision is final. A new revision starts as a draft copy of this one, lines included; the highest number comes next.
        </p>
        {can(session.role, 'boms.write') ? (
          <Button
            variant="secondary"
            pending={newRevision.isPending}
            onClick={() => newRevision.mutate(undefined, { onSuccess: (next) => navigate(`/boms/${next.id}/lines`) })}
          >
            New revision
          </Button>
        ) : null}
      </div>
      {newRevision.isError ? <FormAlert>{describeError(newRevision.error)}</FormAlert> : null}
      <div className="overflow-auto rounded-lg border border-rule bg-surface">
        <table aria-label="Revisions" className="w-full border-collapse text-sm">
          <thead>
            <tr>
              <th scope="col" className={th}>Revision</th>
              <th scope="col" className={th}>State</th>
              <th scope="col" className={th}>Released</th>
              <th scope="col" className={th}>
                <span className="sr-only">Open</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {[...bom.revisions].reverse().map((r) => (
              <tr key={r.id} className={`border-b border-rule/70 last:border-b-0 ${r.id === bom.id ? 'bg-copper/5' : ''}`}>
                <td className="px-3 py-2">
                  <Link to={`/boms/${r.id}/lines`} className="font-medium underline-offset-2 hover:text-copper-dark hover:underline" aria-current={r.id === bom.id ? 'page' : undefined}>
                    Revision {r.revision}
                  </Link>
                  {r.id === bom.id ? <span className="ml-2 text-xs text-muted">(this one)</span> : null}
                </td>
                <td className="px-3 py-2">
                  <StateBadge state={r.state} />
                </td>
                <td className="px-3 py-2 tabular-nums">{r.releasedAt ? formatDate(r.releasedAt) : <span className="text-muted">—</span>}</td>
                <td className="px-3 py-2 text-right">
                  <Link to={`/boms/${r.id}/cost-roll`} className="text-sm text-slate-info underline underline-offset-2">
                    Cost roll of revision {r.revision}
                  </Link>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
