import { useQuery } from '@tanstack/react-query';
import { formatDecimal, compareDecimal } from '../../../lib/money';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { describeError, ErrorState } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { StatusBadge } from '../../../components/ui/stress-status';
import { Tag } from '../../../components/ui/tag';
import { alternativesQueryOptions, type Alternative, type StressLine, type SwapResult } from '../api';
import { useSwapPart } from '../hooks';
import { isPassing } from '../words';

/** Per-unit money to 4 decimals, as the BOM page shows it. */
const perUnit = (value: string) => formatDecimal(value, 4);

/** "+0.0193 more", "0.0126 less": the sign in words as well. */
function Difference({ value, currency }: { value: string; currency: string }) {
  const more = compareDecimal(value, '0') > 0;
  const shown = perUnit(value).replace(/^[−-]/, '');
  if (!/[1-9]/.test(shown)) return <span className="text-muted">same</span>;
  return (
    <span className={`whitespace-nowrap ${more ? 'text-brick' : 'text-verdigris'}`}>
      {more ? '+' : '−'}
      {shown} <span className="text-muted">{currency}</span> {more ? 'more' : 'less'}
    </span>
  );
}

export type PartValue = { text: string; differs: boolean } | null;

/**
 * Parts of the line's category that pass at its operating point, ranked by the BOM's
 * landed cost per unit with each on the line; for a passing line only cheaper ones.
 * "Use this part" swaps it in (on a released revision: into the next revision).
 * `valueOf` shows each part's value beside the current one: the server matches parts by
 * category and stress only, so a part of another value must be plain to see.
 */
function AlternativesBody({
  bomId,
  line,
  lineVersion,
  released,
  revision,
  nextRevision,
  mayWrite,
  valueOf,
  onSwapped,
}: {
  bomId: string;
  line: StressLine;
  lineVersion: number | null;
  released: boolean;
  revision: number;
  /** The revision number a swap on a released revision makes (the family's highest plus one). */
  nextRevision: number;
  mayWrite: boolean;
  valueOf: (partId: string) => PartValue;
  onSwapped: (result: SwapResult, part: Alternative, before: string, currency: string) => void;
}) {
  const alternatives = useQuery(alternativesQueryOptions(bomId, line.lineId));
  const swap = useSwapPart(bomId);

  if (alternatives.isPending) return <LoadingState label="Costing the parts that pass…" />;
  if (alternatives.isError) return <ErrorState title="The parts that pass could not be found" error={alternatives.error} onRetry={() => void alternatives.refetch()} />;
  const data = alternatives.data;

  const current = line.partId ? valueOf(line.partId) : null;
  const use = (part: Alternative) => {
    if (lineVersion === null) return;
    swap.mutate({ lineId: line.lineId, partId: part.id, version: lineVersion }, { onSuccess: (result) => onSwapped(result, part, data.currentLandedPerUnit, data.currency) });
  };

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm">
        Now: <span className="font-medium">{line.internalPn}</span>
        {current ? <span className="text-muted"> ({current.text})</span> : null}, <StatusBadge status={data.currentStatus} className="align-middle" />, landed{' '}
        <span className="tabular-nums">{perUnit(data.currentLandedPerUnit)}</span> {data.currency} per unit at {data.qty.toLocaleString('en-GB')} units.
      </p>
      {released && mayWrite ? (
        <FormAlert tone="info">Revision {revision} is released. Using a part makes revision {nextRevision} as a draft and puts the part there; this revision stays as it is.</FormAlert>
      ) : null}
      {swap.error ? <FormAlert>{isStaleVersion(swap.error) ? STALE_VERSION_MESSAGE : describeError(swap.error)}</FormAlert> : null}
      {data.candidates.length === 0 ? (
        <p className="rounded-md border border-dashed border-rule px-4 py-6 text-center text-sm text-muted">
          {data.direction === 'cheaper'
            ? 'No cheaper part in the library passes at this operating point.'
            : 'No part in the library passes at this operating point with a quote to cost it. Add one to the parts library, or change the circuit.'}
        </p>
      ) : (
        <div className="relative overflow-x-auto rounded-md border border-rule">
          <table aria-label={data.direction === 'cheaper' ? 'Cheaper parts that pass' : 'Parts that pass'} className="w-full text-sm">
            <thead className="text-xs font-semibold tracking-wide text-muted uppercase">
              <tr className="border-b border-rule">
                <th scope="col" className="px-3 py-2 text-left">
                  Part
                </th>
                <th scope="col" className="px-3 py-2 text-left">
                  Status
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Landed / unit
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Difference
                </th>
                <th scope="col" className="px-3 py-2">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {data.candidates.map((part, i) => {
                const value = valueOf(part.id);
                return (
                  <tr key={part.id} className="border-b border-rule/70 last:border-b-0">
                    <th scope="row" className="px-3 py-2 text-left font-normal">
                      <span className="flex flex-wrap items-center gap-2">
                        <span className="font-medium text-ink">{part.internalPn}</span>
                        {i === 0 ? <Tag tone="copper">Cheapest landed</Tag> : null}
                        {value?.differs ? <Tag tone="warning">Value differs: {value.text}</Tag> : null}
                      </span>
                      <span className="block text-xs text-muted">
                        {part.mpn} · {part.manufacturer} · {part.package}
                        {value && !value.differs ? ` · ${value.text}` : ''}
                      </span>
                      <span className="block text-xs text-muted">{part.description}</span>
                    </th>
                    <td className="px-3 py-2">
                      <StatusBadge status={part.status} />
                    </td>
                    <td className="num px-3 py-2 whitespace-nowrap">
                      {perUnit(part.landedPerUnit)} <span className="text-muted">{data.currency}</span>
                    </td>
                    <td className="num px-3 py-2">
                      <Difference value={part.costDifference} currency={data.currency} />
                    </td>
                    <td className="px-3 py-2 text-right">
                      {mayWrite ? (
                        <Button size="sm" variant={i === 0 ? 'primary' : 'secondary'} pending={swap.isPending && swap.variables?.partId === part.id} disabled={swap.isPending || lineVersion === null} onClick={() => use(part)}>
                          Use this part<span className="sr-only"> {part.internalPn}</span>
                        </Button>
                      ) : null}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      <p className="text-xs text-muted">
        Landed cost per unit of the whole BOM at the planned quantity with each part on this line, from today&apos;s quotes and rates. Check the part&apos;s value,
        package and footprint before you use it.
      </p>
    </div>
  );
}

export function AlternativesDialog(props: {
  bomId: string;
  line: StressLine | null;
  lineVersion: number | null;
  released: boolean;
  revision: number;
  nextRevision: number;
  mayWrite: boolean;
  valueOf: (partId: string) => PartValue;
  onSwapped: (result: SwapResult, part: Alternative, before: string, currency: string) => void;
  onClose: () => void;
}) {
  const { line, onClose } = props;
  const passing = line ? isPassing(line.status) : false;
  const who = line?.refDes || line?.internalPn || 'line';
  return (
    <Dialog
      open={line !== null}
      size="xl"
      title={passing ? `Cheaper parts that pass for ${who}` : `Parts that pass for ${who}`}
      description="Parts of the same category that pass at this line's operating point under the BOM's stress policy."
      onClose={onClose}
    >
      {line ? <AlternativesBody {...props} line={line} /> : <span />}
    </Dialog>
  );
}
