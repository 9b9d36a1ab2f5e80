import { useState, type FormEvent } from 'react';
import { useSearchParams } from 'react-router-dom';
import { keepPreviousData, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { TextField } from '../../../components/ui/text-field';
import { bomQueryOptions, curveQueryOptions } from '../../../features/boms/api';
import { VolumeCurveTable } from '../../../features/boms/components/volume-curve-table';
import { VolumeCurveChart } from '../../../features/boms/components/volume-curve-chart';
import { logSpaced, parseQuantities } from '../../../features/boms/curve';
import { useBomId } from './bom-params';

/** The Volume curve tab: landed cost per unit at several build quantities, as a stepped chart and a table. */
export function BomVolumeCurveRoute() {
  const id = useBomId();
  const { data: bom } = useSuspenseQuery(bomQueryOptions(id));
  const [params, setParams] = useSearchParams();
  const asked = params.get('qty') ?? '';
  const curve = useQuery({ ...curveQueryOptions(id, asked), placeholderData: keepPreviousData });
  const shown = curve.data?.points.map((p) => p.qty).join(', ') ?? asked;
  const [text, setText] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  const show = (quantities: number[]) => {
    setError(null);
    setText(null);
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (quantities.length) next.set('qty', quantities.join(','));
        else next.delete('qty');
        return next;
      },
      { replace: true },
    );
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = parseQuantities(text ?? shown);
    if (!parsed.ok) setError(parsed.message);
    else show(parsed.quantities);
  };

  const points = curve.data?.points ?? [];

  return (
    <div className="flex flex-col gap-5">
      <form onSubmit={submit} aria-label="Volume curve quantities" className="flex flex-wrap items-end gap-3">
        <TextField
          label="Build quantities"
          className="min-w-80 flex-1"
          hint="Separated by commas; 5k means 5,000. Empty: twelve quantities around the planned one."
          value={text ?? shown}
          error={error ?? undefined}
          onChange={(event) => setText(event.target.value)}
        />
        <Button type="submit" variant="secondary">
          Show curve
        </Button>
        {points.length >= 2 ? (
          <Button
            variant="quiet"
            title="Forty quantities from the smallest to the largest, so price breaks and MOQ steps show between them"
            onClick={() => show(logSpaced(points[0].qty, points[points.length - 1].qty, 40))}
          >
            Fill in 40 quantities
          </Button>
        ) : null}
        {asked ? (
          <Button variant="quiet" onClick={() => show([])}>
            Around the planned quantity
          </Button>
        ) : null}
      </form>
      {curve.isPending ? (
        <LoadingState label="Costing each quantity…" />
      ) : curve.isError && !curve.data ? (
        <ErrorState title="The volume curve could not be computed" error={curve.error} onRetry={() => void curve.refetch()} />
      ) : curve.data ? (
        <div className={`flex flex-col gap-5 ${curve.isPlaceholderData ? 'opacity-60' : ''}`} aria-busy={curve.isFetching || undefined}>
          <VolumeCurveChart points={curve.data.points} currency={curve.data.currency} target={bom.targetUnitCost} />
          <VolumeCurveTable points={curve.data.points} currency={curve.data.currency} plannedQty={bom.plannedQty} />
        </div>
      ) : null}
    </div>
  );
}
