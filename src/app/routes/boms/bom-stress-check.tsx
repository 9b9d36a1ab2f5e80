import { useMemo, useState } from 'react';
import { useLocation, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { keepPreviousData, useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { formatValue } from '../../../shared/units';
import { formatDecimal } from '../../../lib/money';
import { Button } from '../../../components/ui/button';
import { CautionNotice } from '../../../components/ui/caution-notice';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { STRESS_STATUSES } from '../../../components/ui/stress-status';
import { useSession } from '../../../features/auth/session-context';
import { bomQueryOptions, linesQueryOptions, partIndexQueryOptions } from '../../../features/boms/api';
import { policiesQueryOptions } from '../../../features/policies/api';
import { stressQueryOptions, type StressLine, type StressStatus } from '../../../features/stress/api';
import { AlternativesDialog, type PartValue } from '../../../features/stress/components/alternatives-dialog';
import { PolicyPicker } from '../../../features/stress/components/policy-picker';
import { StatusFilter } from '../../../features/stress/components/status-filter';
import { StressTable } from '../../../features/stress/components/stress-table';
import { WaiveDialog } from '../../../features/stress/components/waive-dialog';
import type { LineRef } from '../../../features/stress/line-ref';
import { bomIdFrom, useBomId } from './bom-params';
import { StressHelpersPanel } from './bom-stress-helpers';

export const bomStressCheckLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = bomIdFrom(params);
    // The check may fail on its own (a workspace without a policy): the tab says so, the page still opens.
    await Promise.all([queryClient.prefetchQuery(stressQueryOptions(id)), queryClient.ensureQueryData(linesQueryOptions(id))]);
    void queryClient.prefetchQuery(policiesQueryOptions());
    return null;
  };

const isStatus = (value: string | null): value is StressStatus => STRESS_STATUSES.some((s) => s === value);

/** The value that makes two parts of one category interchangeable, in words. */
function partValue(ratings: Record<string, unknown> | undefined): { text: string; value: number } | null {
  const r = ratings ?? {};
  if (typeof r.resistanceOhm === 'number') return { text: formatValue(r.resistanceOhm, 'resistance'), value: r.resistanceOhm };
  if (typeof r.capacitanceF === 'number') return { text: formatValue(r.capacitanceF, 'capacitance'), value: r.capacitanceF };
  return null;
}

/**
 * The Stress check tab: each rated line's checks at its operating point under the BOM's
 * policy, with the caution always at the top; waivers, parts that pass, operating
 * points and the circuit helpers from here.
 */
export function BomStressCheckRoute() {
  const id = useBomId();
  // A swap on a released revision moves to the new one: start afresh there (its notice, no open dialogs).
  return <StressCheckScreen key={id} id={id} />;
}

function StressCheckScreen({ id }: { id: string }) {
  const session = useSession();
  const navigate = useNavigate();
  const location = useLocation();
  const { data: bom } = useSuspenseQuery(bomQueryOptions(id));
  const stress = useQuery({ ...stressQueryOptions(id), placeholderData: keepPreviousData });
  const lines = useQuery(linesQueryOptions(id));
  const policies = useQuery(policiesQueryOptions());
  const parts = useQuery(partIndexQueryOptions());
  const [params, setParams] = useSearchParams();
  const [waiving, setWaiving] = useState<StressLine | null>(null);
  const [choosing, setChoosing] = useState<StressLine | null>(null);
  const [helpersOpen, setHelpersOpen] = useState(false);
  const [notice, setNotice] = useState<string | null>((location.state as { swapped?: string } | null)?.swapped ?? null);

  const released = bom.state === 'released';
  const mayWrite = can(session.role, 'boms.write');
  const status = isStatus(params.get('status')) ? (params.get('status') as StressStatus) : null;
  const setStatus = (next: StressStatus | null) =>
    setParams(
      (current) => {
        const copy = new URLSearchParams(current);
        if (next) copy.set('status', next);
        else copy.delete('status');
        return copy;
      },
      { replace: true },
    );

  const lineRefs = useMemo(() => new Map<string, LineRef>((lines.data ?? []).map((l) => [l.id, l])), [lines.data]);
  const valueOf = (partId: string): PartValue => {
    const mine = partValue(parts.data?.get(partId)?.ratings);
    if (!mine) return null;
    const currentId = choosing?.partId;
    const current = currentId ? partValue(parts.data?.get(currentId)?.ratings) : null;
    const differs = current !== null && Math.abs(mine.value - current.value) > 1e-9 * Math.max(Math.abs(current.value), 1e-30);
    return { text: mine.text, differs };
  };

  if (stress.isPending) return <LoadingState label="Checking every line against its ratings…" />;
  if (stress.isError) return <ErrorState title="The stress check could not be run" error={stress.error} onRetry={() => void stress.refetch()} />;
  const check = stress.data;
  const shown = status ? check.lines.filter((l) => l.status === status) : check.lines;
  const policy = policies.data?.items.find((p) => p.id === check.policyId);

  return (
    <div className="flex flex-col gap-4" aria-busy={stress.isFetching || undefined}>
      <CautionNotice>{check.caution}</CautionNotice>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div className="flex flex-wrap items-center gap-x-5 gap-y-2">
          <PolicyPicker
            bomId={bom.id}
            bomVersion={bom.version}
            value={bom.stressPolicyId}
            policies={policies.data?.items ?? []}
            editable={mayWrite && !released && policies.isSuccess}
            currentName={check.policyName}
          />
          <p className="text-sm text-muted">
            Ambient <span className="text-ink tabular-nums">{formatValue(check.ambientC, 'temperature')}</span> unless a line sets its own
          </p>
        </div>
        <Button variant="secondary" onClick={() => setHelpersOpen(true)}>
          Circuit helpers
        </Button>
      </div>
      {notice ? <FormAlert tone="success">{notice}</FormAlert> : null}
      {check.lines.length === 0 ? (
        <EmptyState title="No rated lines in this BOM yet.">
          The check covers resistors, capacitors, transistors, diodes and LEDs. Add such parts in the Lines tab, with their operating points.
        </EmptyState>
      ) : (
        <>
          <StatusFilter counts={check.summary} value={status} onChange={setStatus} />
          {shown.length === 0 ? (
            <p className="rounded-lg border border-dashed border-rule px-4 py-6 text-center text-sm text-muted">No line has this status.</p>
          ) : (
            <StressTable
              bomId={bom.id}
              ambientC={check.ambientC}
              lines={shown}
              lineRefs={lineRefs}
              mayWrite={mayWrite}
              released={released}
              actions={{ onWaive: setWaiving, onAlternatives: setChoosing }}
            />
          )}
          <p className="text-xs text-muted">
            Ratio: the applied stress as a share of the part&apos;s rating at this operating point. Limit: the share the policy allows. On each bar the ink tick is the
            limit, the shaded band the last 10 % below it (Close), the end of the track the rating itself.
          </p>
        </>
      )}
      <WaiveDialog bomId={bom.id} line={waiving} onClose={() => setWaiving(null)} />
      <AlternativesDialog
        bomId={bom.id}
        line={choosing}
        lineVersion={choosing ? (lineRefs.get(choosing.lineId)?.version ?? null) : null}
        released={released}
        revision={bom.revision}
        nextRevision={Math.max(bom.revision, ...bom.revisions.map((r) => r.revision)) + 1}
        mayWrite={mayWrite}
        valueOf={valueOf}
        onClose={() => setChoosing(null)}
        onSwapped={(result, part, before, currency) => {
          const who = choosing?.refDes || choosing?.internalPn || 'The line';
          const text = `${who} now uses ${part.internalPn}. Landed cost per unit at the planned quantity: ${formatDecimal(before, 4)} → ${formatDecimal(part.landedPerUnit, 4)} ${currency}.`;
          setChoosing(null);
          if (result.newRevision) {
            navigate(`/boms/${result.bomId}/stress-check`, { state: { swapped: `Revision ${result.revision} was made from the released revision ${bom.revision}. ${text}` } });
          } else {
            setNotice(text);
          }
        }}
      />
      <StressHelpersPanel
        open={helpersOpen}
        onClose={() => setHelpersOpen(false)}
        bomId={bom.id}
        stress={check}
        lineRefs={lineRefs}
        parts={parts.data}
        limits={policy?.limits}
        editable={mayWrite && !released}
      />
    </div>
  );
}
