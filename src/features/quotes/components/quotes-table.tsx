import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { describeError } from '../../../components/ui/error-state';
import { formatDate } from '../../../lib/format';
import { formatUnitPrice } from '../../../lib/money';
import type { Quote } from '../api';
import { useDeleteQuote } from '../hooks';
import { QuoteStatus } from './quote-status';

// A quote with its part's name beside it: the name is part of the row (not looked up in a
// cell), so the table's per-row value cache cannot keep a name from before it loaded.
type QuoteRow = Quote & { partLabel: string };

const column = createColumnHelper<QuoteRow>();
const sourceLabels: Record<Quote['source'], string> = { manual: 'Entered', import: 'Imported', rfq: 'RFQ answer' };
const qtyFormat = new Intl.NumberFormat('en-GB');

function validity(quote: Quote): string {
  if (!quote.validFrom && !quote.validUntil) return 'Open';
  const from = quote.validFrom ? formatDate(quote.validFrom) : 'any time';
  const until = quote.validUntil ? formatDate(quote.validUntil) : 'no end';
  return `${from} – ${until}`;
}

/** A quote's tiers, smallest first: "5,000+  0.002100". */
export function PriceBreakList({ quote }: { quote: Quote }) {
  return (
    <ul aria-label="Price breaks" className="flex flex-col gap-0.5">
      {quote.priceBreaks.map((b) => (
        <li key={b.minQty} className="flex justify-between gap-3 tabular-nums whitespace-nowrap">
          <span className="text-muted">{qtyFormat.format(b.minQty)}+</span>
          <span>
            {formatUnitPrice(b.unitPrice)} <span className="text-xs text-muted">{quote.currency}</span>
          </span>
        </li>
      ))}
    </ul>
  );
}

/**
 * Quotes with their price breaks. Expired quotes stay in the list, greyed and tagged,
 * because a buyer still reads them when asking for a new price.
 */
export function QuotesTable({
  quotes,
  show,
  partName,
  canWrite,
  onEdit,
  empty,
}: {
  quotes: Quote[];
  /** Name each row by its supplier (a part's page) or by its part (a supplier's page). */
  show: 'supplier' | 'part';
  partName?: (partId: string) => string;
  canWrite: boolean;
  onEdit: (quote: Quote) => void;
  empty: string;
}) {
  const [deleting, setDeleting] = useState<Quote | null>(null);
  const today = new Date().toISOString().slice(0, 10);
  const rows = useMemo<QuoteRow[]>(() => quotes.map((q) => ({ ...q, partLabel: partName?.(q.partId) ?? `Part #${q.partId}` })), [quotes, partName]);
  const deleteQuote = useDeleteQuote();

  const columns = useMemo(
    () => [
      show === 'supplier'
        ? column.accessor((q) => q.supplierName ?? '', {
            id: 'supplier',
            header: 'Supplier',
            cell: (info) => (
              <div className="flex flex-col items-start gap-1">
                <Link to={`/suppliers/${info.row.original.supplierId}`} className="font-medium text-copper-dark underline-offset-2 hover:underline">
                  {info.getValue() || `Supplier #${info.row.original.supplierId}`}
                </Link>
                <QuoteStatus quote={info.row.original} />
              </div>
            ),
          })
        : column.accessor('partLabel', {
            id: 'part',
            header: 'Part',
            cell: (info) => (
              <div className="flex flex-col items-start gap-1">
                <Link to={`/parts/${info.row.original.partId}`} className="font-medium whitespace-nowrap text-copper-dark underline-offset-2 hover:underline">
                  {info.getValue()}
                </Link>
                <QuoteStatus quote={info.row.original} />
              </div>
            ),
          }),
      column.accessor('incoterm', { header: 'Incoterm' }),
      column.accessor('moq', { header: 'MOQ', meta: { numeric: true }, cell: (info) => qtyFormat.format(info.getValue()) }),
      column.accessor('orderMultiple', { header: 'Multiple', meta: { numeric: true }, cell: (info) => qtyFormat.format(info.getValue()) }),
      column.accessor((q) => q.leadTimeDays ?? -1, {
        id: 'leadTimeDays',
        header: 'Lead time',
        meta: { numeric: true },
        cell: (info) => (info.row.original.leadTimeDays === null ? <span className="text-muted">—</span> : `${info.row.original.leadTimeDays} d`),
      }),
      column.accessor((q) => q.validUntil ?? '9999', { id: 'validity', header: 'Valid', cell: (info) => <span className="whitespace-nowrap tabular-nums">{validity(info.row.original)}</span> }),
      column.display({ id: 'priceBreaks', header: 'Price breaks', cell: (info) => <PriceBreakList quote={info.row.original} /> }),
      column.accessor((q) => sourceLabels[q.source], { id: 'source', header: 'Source' }),
      ...(canWrite
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              meta: { hiddenHeader: true },
              cell: (info) => {
                const name = show === 'supplier' ? info.row.original.supplierName ?? 'supplier' : info.row.original.partLabel;
                return (
                  <div className="flex justify-end gap-1">
                    <Button variant="secondary" size="sm" aria-label={`Edit quote from ${name}`} onClick={() => onEdit(info.row.original)}>
                      Edit
                    </Button>
                    <Button variant="danger" size="sm" aria-label={`Delete quote from ${name}`} onClick={() => setDeleting(info.row.original)}>
                      Delete
                    </Button>
                  </div>
                );
              },
            }),
          ]
        : []),
    ],
    [canWrite, onEdit, show],
  );

  return (
    <>
      <DataTable
        label="Quotes"
        columns={columns}
        data={rows}
        getRowId={(q) => q.id}
        rowClassName={(q) => (q.expired || (q.validFrom !== null && q.validFrom > today) ? 'bg-paper/70 text-muted' : undefined)}
        virtualizeAbove={40}
        maxHeight="75vh"
        empty={<EmptyState title={empty} />}
      />
      <ConfirmDialog
        open={deleting !== null}
        title="Delete this quote?"
        confirmLabel="Delete quote"
        pending={deleteQuote.isPending}
        error={deleteQuote.isError ? describeError(deleteQuote.error) : null}
        onCancel={() => {
          setDeleting(null);
          deleteQuote.reset();
        }}
        onConfirm={() => {
          if (deleting) deleteQuote.mutate(deleting.id, { onSuccess: () => setDeleting(null) });
        }}
      >
        Its price breaks go with it. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
