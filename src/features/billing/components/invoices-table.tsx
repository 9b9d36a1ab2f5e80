import { useMemo } from 'react';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { Tag } from '../../../components/ui/tag';
import { formatDate } from '../../../lib/format';
import type { Invoice } from '../api';
import { minorToMajor } from '../display';

const column = createColumnHelper<Invoice>();

const statusWords: Record<string, string> = { paid: 'Paid', open: 'Open', void: 'Void', draft: 'Draft', uncollectible: 'Uncollectible' };

/** The subscription's invoices, newest first, each with the payment service's own page. */
export function InvoicesTable({ invoices }: { invoices: Invoice[] }) {
  const columns = useMemo(
    () => [
      column.accessor('created', { header: 'Date', cell: (info) => <span className="tabular-nums">{formatDate(info.getValue())}</span> }),
      column.accessor('status', {
        header: 'Status',
        cell: (info) => {
          const status = info.getValue() ?? '';
          return <Tag tone={status === 'paid' ? 'ok' : status === 'open' ? 'warning' : 'muted'}>{statusWords[status] ?? status}</Tag>;
        },
      }),
      column.accessor('amountDue', {
        header: 'Amount due',
        meta: { numeric: true },
        cell: (info) => `${minorToMajor(info.getValue(), info.row.original.currency)} ${info.row.original.currency.toUpperCase()}`,
      }),
      column.accessor('amountPaid', {
        header: 'Paid',
        meta: { numeric: true },
        cell: (info) => `${minorToMajor(info.getValue(), info.row.original.currency)} ${info.row.original.currency.toUpperCase()}`,
      }),
      column.display({
        id: 'open',
        header: 'Invoice',
        meta: { hiddenHeader: true },
        cell: (info) =>
          info.row.original.url ? (
            <div className="text-right">
              <a
                href={info.row.original.url}
                target="_blank"
                rel="noreferrer"
                className="text-sm font-medium text-copper-dark underline-offset-2 hover:underline"
                aria-label={`View the invoice of ${formatDate(info.row.original.created)}`}
              >
                View
              </a>
            </div>
          ) : null,
      }),
    ],
    [],
  );
  return (
    <DataTable
      label="Invoices"
      columns={columns}
      data={invoices}
      getRowId={(invoice) => invoice.id}
      empty={<EmptyState title="No invoices yet.">Invoices appear here once a paid plan starts.</EmptyState>}
    />
  );
}
