import type { ReactNode } from 'react';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { Spinner } from '../../../components/ui/spinner';
import { describeError } from '../../../components/ui/error-state';
import { costTotalsQueryOptions, type Bom } from '../api';
import { formatCount, formatPerUnit } from '../display';
import { GapFigure } from './gap-figure';

/**
 * The right-hand panel of the BOM page: landed cost per unit at the planned quantity,
 * target and gap, lines left out and warnings. It reads the cost roll's totals only (no
 * lines: a fraction of the work on a large BOM); every line save invalidates it, so it
 * follows the grid while you edit. `stress` is the stress tally, composed in by the page (it
 * belongs to the stress area).
 */
export function RunningTotal({ bom, stress }: { bom: Bom; stress?: ReactNode }) {
  const cost = useQuery({ ...costTotalsQueryOptions(bom.id, bom.plannedQty), placeholderData: keepPreviousData });
  const data = cost.data;
  const warnings = data ? data.warnings.length + data.lineWarningCount : null;

  return (
    <section aria-label="Running total" className="flex flex-col gap-4 rounded-lg border border-rule bg-surface p-4 text-sm">
      <div className="flex items-center justify-between gap-2">
        <h2 className="text-xs font-semibold tracking-wide text-muted uppercase">Running total</h2>
        {cost.isFetching ? (
          <span role="status" className="inline-flex items-center gap-1 text-xs text-muted">
            <Spinner className="size-3" /> Updating
          </span>
        ) : null}
      </div>
      <div>
        <p className="text-muted">Landed cost per unit</p>
        {data ? (
          <p className="mt-0.5 text-2xl font-semibold text-ink tabular-nums">
            {formatPerUnit(data.totals.landedPerUnit)} <span className="text-base font-medium text-muted">{data.currency}</span>
          </p>
        ) : cost.isError ? (
          <p className="mt-1 text-brick">The cost roll could not be computed: {describeError(cost.error)}</p>
        ) : (
          <p className="mt-1 text-muted">Costing…</p>
        )}
        <p className="mt-0.5 text-xs text-muted">
          at {formatCount(bom.plannedQty)} units (planned){data ? `, costed on ${data.date}` : ''}
        </p>
      </div>
      <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-2">
        <dt className="text-muted">Target</dt>
        <dd className="text-right tabular-nums">{bom.targetUnitCost ? formatPerUnit(bom.targetUnitCost) : '—'}</dd>
        <dt className="text-muted">Gap</dt>
        <dd className="text-right">{data ? <GapFigure gap={data.totals.gapToTarget} /> : '—'}</dd>
        <dt className="text-muted">Lines left out</dt>
        <dd className="text-right tabular-nums">
          {data ? (
            data.leftOut.count > 0 ? (
              <Link to={`/boms/${bom.id}/cost-roll`} className="font-medium text-brick underline underline-offset-2">
                {data.leftOut.count}
              </Link>
            ) : (
              '0'
            )
          ) : (
            '—'
          )}
        </dd>
        <dt className="text-muted">Warnings</dt>
        <dd className="text-right tabular-nums">{warnings ?? '—'}</dd>
      </dl>
      {stress}
      {data && data.leftOut.count > 0 ? (
        <p className="text-xs text-muted">Lines left out add nothing to the totals until they have a quote, an FX rate or a weight.</p>
      ) : null}
    </section>
  );
}
