import { useMemo, useState, type ReactNode } from 'react';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { describeError } from '../../../components/ui/error-state';
import { compareDecimal } from '../../../lib/money';
import type { FxRate } from '../api';
import { useDeleteFxRate } from '../hooks';

const column = createColumnHelper<FxRate>();
const sourceLabels: Record<string, string> = { manual: 'Entered', feed: 'Imported feed' };

export function FxRatesTable({ rates, canWrite, empty }: { rates: FxRate[]; canWrite: boolean; empty: ReactNode }) {
  const [sorting, onSortingChange] = useUrlSorting('sort');
  const [deleting, setDeleting] = useState<FxRate | null>(null);
  const deleteRate = useDeleteFxRate();

  const columns = useMemo(
    () => [
      column.accessor('date', { header: 'Date', cell: (info) => <span className="tabular-nums">{info.getValue()}</span> }),
      column.accessor('base', { header: 'Base' }),
      column.accessor('quote', { header: 'Quote' }),
      column.accessor('rate', {
        header: 'Rate',
        meta: { numeric: true },
        sortingFn: (a, b) => compareDecimal(a.original.rate, b.original.rate),
        cell: (info) => (
          <span title={`1 ${info.row.original.base} = ${info.getValue()} ${info.row.original.quote}`}>{info.getValue()}</span>
        ),
      }),
      column.accessor((r) => sourceLabels[r.source] ?? r.source, { id: 'source', header: 'Source' }),
      ...(canWrite
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              meta: { hiddenHeader: true },
              cell: (info) => {
                const r = info.row.original;
                return (
                  <div className="text-right">
                    <Button variant="danger" size="sm" aria-label={`Delete ${r.base}/${r.quote} rate of ${r.date}`} onClick={() => setDeleting(r)}>
                      Delete
                    </Button>
                  </div>
                );
              },
            }),
          ]
        : []),
    ],
    [canWrite],
  );

  return (
    <>
      <DataTable
        label="FX rates"
        columns={columns}
        data={rates}
        getRowId={(r) => r.id}
        sorting={sorting}
        onSortingChange={onSortingChange}
        virtualizeAbove={30}
        maxHeight="60vh"
        empty={empty}
      />
      <ConfirmDialog
        open={deleting !== null}
        title={deleting ? `Delete the ${deleting.base}/${deleting.quote} rate of ${deleting.date}?` : ''}
        confirmLabel="Delete rate"
        pending={deleteRate.isPending}
        error={deleteRate.isError ? describeError(deleteRate.error) : null}
        onCancel={() => {
          setDeleting(null);
          deleteRate.reset();
        }}
        onConfirm={() => {
          if (deleting) deleteRate.mutate(deleting.id, { onSuccess: () => setDeleting(null) });
        }}
      >
        Costs on that date will use the latest earlier rate, or none.
      </ConfirmDialog>
    </>
  );
}

/** An empty list, in words that say what to do. */
export function NoFxRates({ filtered, canWrite }: { filtered: boolean; canWrite: boolean }) {
  const next = canWrite ? 'Enter a rate by hand or import a reference-rate feed above.' : 'Buyers and owners enter rates here.';
  return (
    <EmptyState title={filtered ? 'No rates match these filters.' : 'No FX rates yet.'}>
      {filtered ? 'Widen the dates or clear the currency.' : `${next} Until then, only same-currency offers can be priced.`}
    </EmptyState>
  );
}
