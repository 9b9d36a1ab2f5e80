import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { trimDecimal } from '../../../lib/money';
import type { Profile } from '../api';

const column = createColumnHelper<Profile>();
const pct = (value: string) => `${trimDecimal(value)} %`;

/** Landed-cost profiles by name; the name opens its form. */
export function ProfilesTable({ profiles, selectedId, emptyAction }: { profiles: Profile[]; selectedId: string | null; emptyAction?: ReactNode }) {
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <Link
            to={`?profile=${info.row.original.id}`}
            aria-current={info.row.original.id === selectedId ? 'true' : undefined}
            className="font-medium text-copper-dark underline-offset-2 hover:underline"
          >
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('currency', { header: 'Currency' }),
      column.accessor('dutyBasis', { header: 'Duty basis' }),
      column.accessor('freightPct', { header: 'Freight', meta: { numeric: true }, cell: (info) => pct(info.getValue()) }),
      column.accessor('insurancePct', { header: 'Insurance', meta: { numeric: true }, cell: (info) => pct(info.getValue()) }),
      column.accessor('defaultDutyPct', { header: 'Default duty', meta: { numeric: true }, cell: (info) => pct(info.getValue()) }),
      column.accessor((p) => p.maxLeadTimeDays ?? Number.POSITIVE_INFINITY, {
        id: 'maxLeadTimeDays',
        header: 'Max lead time',
        meta: { numeric: true },
        cell: (info) => (info.row.original.maxLeadTimeDays === null ? <span className="text-muted">No limit</span> : `${info.row.original.maxLeadTimeDays} d`),
      }),
    ],
    [selectedId],
  );
  return (
    <DataTable
      label="Landed-cost profiles"
      columns={columns}
      data={profiles}
      getRowId={(p) => p.id}
      rowClassName={(p) => (p.id === selectedId ? 'bg-copper/5' : undefined)}
      empty={
        <EmptyState title="No landed-cost profiles yet." action={emptyAction}>
          A profile holds the freight, insurance, duty and handling a shipment adds to the price of its parts.
        </EmptyState>
      }
    />
  );
}
