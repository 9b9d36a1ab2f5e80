import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { keepPreviousData, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { compareDecimal } from '../../../lib/money';
import { ErrorState } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { useSession } from '../../../features/auth/session-context';
import { bomQueryOptions, costQueryOptions, linesQueryOptions, profileChoicesQueryOptions } from '../../../features/boms/api';
import { BreakdownChart } from '../../../features/boms/components/cost-roll/breakdown-chart';
import { CostLinesTable } from '../../../features/boms/components/cost-roll/cost-lines-table';
import { CostParamsForm } from '../../../features/boms/components/cost-roll/cost-params-form';
import { CostTotals } from '../../../features/boms/components/cost-roll/cost-totals';
import { Snapshots } from '../../../features/boms/components/cost-roll/snapshots';
import { useBomId } from './bom-params';

/** Largest share first, compared exactly. */
const byLanded = <T extends { landedPerUnit: string }>(rows: T[]) => [...rows].sort((a, b) => compareDecimal(b.landedPerUnit, a.landedPerUnit));

const COPPER = '#B5652B';
const SLATE = '#3D5A80';

/** Reads `?qty=` and `?date=`; anything unreadable falls back to the planned quantity and today. */
function useCostParams(plannedQty: number) {
  const [params, setParams] = useSearchParams();
  const raw = Number(params.get('qty'));
  const qty = Number.isInteger(raw) && raw >= 1 ? raw : plannedQty;
  const date = /^\d{4}-\d{2}-\d{2}$/.test(params.get('date') ?? '') ? params.get('date')! : undefined;
  const apply = (nextQty: number, nextDate: string | undefined) => {
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (nextQty === plannedQty) next.delete('qty');
        else next.set('qty', String(nextQty));
        if (nextDate) next.set('date', nextDate);
        else next.delete('date');
        return next;
      },
      { replace: true },
    );
  };
  return { qty, date, apply };
}

/** The Cost roll tab: landed cost per unit at a quantity and date, line by line, with totals, breakdowns and snapshots. */
export function BomCostRollRoute() {
  const id = useBomId();
  const session = useSession();
  const { data: bom } = useSuspenseQuery(bomQueryOptions(id));
  const { qty, date, apply } = useCostParams(bom.plannedQty);
  const cost = useQuery({ ...costQueryOptions(id, { qty, date }), placeholderData: keepPreviousData });
  const profiles = useQuery(profileChoicesQueryOptions());
  const lines = useQuery(linesQueryOptions(id));
  const profile = profiles.data?.find((p) => p.id === bom.profileId);
  const refDes = useMemo(() => new Map((lines.data ?? []).map((l) => [l.id, l.refDes])), [lines.data]);

  return (
    <div className="flex flex-col gap-5">
      <CostParamsForm key={`${qty}-${date ?? ''}`} qty={qty} date={date} plannedQty={bom.plannedQty} onApply={apply} />
      {!bom.profileId ? (
        <FormAlert tone="info">This BOM has no landed-cost profile, so the roll holds goods and cost lines only: no freight, insurance, duty, fees or assembly.</FormAlert>
      ) : profile?.dutyBasis === 'FOB' ? (
        <FormAlert tone="info">
          The profile “{profile.name}” charges duty on an FOB basis. A C- or D-term price already holds the carriage, so for such quotes the dutiable value here is
          overstated when the freight is stated separately on the invoice.
        </FormAlert>
      ) : null}
      {cost.isPending ? (
        <LoadingState label="Rolling up the cost…" />
      ) : cost.isError && !cost.data ? (
        <ErrorState title="The cost roll could not be computed" error={cost.error} onRetry={() => void cost.refetch()} />
      ) : cost.data ? (
        <div className={`flex flex-col gap-5 ${cost.isPlaceholderData ? 'opacity-60' : ''}`} aria-busy={cost.isFetching || undefined}>
          <p className="text-sm text-muted">
            {cost.data.qty.toLocaleString('en-GB')} units, costed on {cost.data.date}, in {cost.data.currency}
            {cost.data.profileName ? ` with the profile “${cost.data.profileName}”` : ''}. Unit prices are shown to 6 decimals in the quote currency and in {cost.data.currency}.
          </p>
          <CostLinesTable cost={cost.data} />
          <CostTotals cost={cost.data} refDesOf={(lineId) => refDes.get(lineId) ?? null} />
          <div className="grid gap-4">
            <BreakdownChart
              title="By category"
              colour={COPPER}
              currency={cost.data.currency}
              rows={byLanded(cost.data.byCategory.map((c) => ({ name: c.category, landedPerUnit: c.landedPerUnit, lines: c.lineCount })))}
            />
            <BreakdownChart
              title="By supplier"
              colour={SLATE}
              currency={cost.data.currency}
              rows={byLanded(cost.data.bySupplier.map((s) => ({ name: s.supplierName ?? `Supplier ${s.supplierId}`, landedPerUnit: s.landedPerUnit, lines: s.lineCount })))}
            />
          </div>
          <Snapshots bom={bom} qty={qty} date={date} mayWrite={can(session.role, 'snapshots.write')} />
        </div>
      ) : null}
    </div>
  );
}
