import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { Tag } from '../../../components/ui/tag';
import { formatDate } from '../../../lib/format';
import type { RfqListItem } from '../api';
import { formatCount } from '../quantities';
import { isOverdue } from '../overdue';
import { RecipientStatusBadge } from './recipient-status';

const column = createColumnHelper<RfqListItem>();

/** Every request with its state, reply-by date (overdue flagged) and how many suppliers answered. */
export function RfqsTable({ rfqs, empty }: { rfqs: RfqListItem[]; empty: ReactNode }) {
  const [sorting, onSortingChange] = useUrlSorting('sort');
  const columns = useMemo(
    () => [
      column.accessor('title', {
        header: 'Title',
        cell: (info) => (
          <Link to={`/rfqs/${info.row.original.id}`} className="font-medium text-copper-dark underline-offset-2 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('state', {
        header: 'State',
        cell: (info) => (info.getValue() === 'open' ? <Tag tone="copper">Open</Tag> : <Tag tone="muted">Closed</Tag>),
      }),
      column.accessor('replyBy', {
        header: 'Reply by',
        cell: (info) => (
          <span className="inline-flex items-center gap-2 tabular-nums">
            {formatDate(info.getValue())}
            {isOverdue(info.row.original) ? <RecipientStatusBadge status="overdue" /> : null}
          </span>
        ),
      }),
      column.accessor((row) => (row.recipients ? row.answered / row.recipients : 0), {
        id: 'answered',
        header: 'Answered',
        meta: { numeric: true },
        cell: (info) => `${info.row.original.answered} of ${info.row.original.recipients}`,
      }),
      column.accessor((row) => row.quantities.join(' / '), {
        id: 'quantities',
        header: 'Quantities (pcs)',
        enableSorting: false,
        cell: (info) => <span className="tabular-nums">{info.row.original.quantities.map(formatCount).join(' / ')}</span>,
      }),
      column.accessor('createdAt', {
        header: 'Sent',
        cell: (info) => <span className="tabular-nums">{formatDate(info.getValue())}</span>,
      }),
    ],
    [],
  );
  return (
    <DataTable
      label="Requests for quotation"
      columns={columns}
      data={rfqs}
      getRowId={(rfq) => rfq.id}
      sorting={sorting}
      onSortingChange={onSortingChange}
      empty={empty}
    />
  );
}
