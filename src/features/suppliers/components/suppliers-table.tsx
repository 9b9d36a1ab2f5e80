import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { useUrlColumnFilters } from '../../../components/ui/data-table/use-url-column-filters';
import { EmptyState } from '../../../components/ui/empty-state';
import { Tag } from '../../../components/ui/tag';
import type { Supplier } from '../api';

const column = createColumnHelper<Supplier>();

/** Suppliers by name; an inactive one stays listed, greyed and tagged. */
export function SuppliersTable({ suppliers, emptyAction }: { suppliers: Supplier[]; emptyAction?: ReactNode }) {
  const [sorting, onSortingChange] = useUrlSorting('sort');
  const [filters, onFiltersChange] = useUrlColumnFilters();

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <Link to={`/suppliers/${info.row.original.id}`} className="font-medium text-copper-dark underline-offset-2 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('country', { header: 'Country' }),
      column.accessor('currency', { header: 'Currency' }),
      column.accessor('defaultIncoterm', { header: 'Default Incoterm' }),
      column.accessor((s) => s.contactEmails.join(' '), {
        id: 'contacts',
        header: 'Contacts',
        enableSorting: false,
        cell: (info) => {
          const emails = info.row.original.contactEmails;
          if (emails.length === 0) return <span className="text-muted">—</span>;
          return (
            <span>
              {emails[0]}
              {emails.length > 1 ? <span className="text-muted"> +{emails.length - 1} more</span> : null}
            </span>
          );
        },
      }),
      column.accessor((s) => (s.active ? 'Active' : 'Inactive'), {
        id: 'status',
        header: 'Status',
        cell: (info) => (info.row.original.active ? <Tag tone="ok">Active</Tag> : <Tag tone="muted">Inactive</Tag>),
      }),
    ],
    [],
  );

  return (
    <DataTable
      label="Suppliers"
      columns={columns}
      data={suppliers}
      getRowId={(s) => s.id}
      sorting={sorting}
      onSortingChange={onSortingChange}
      columnFilters={filters}
      onColumnFiltersChange={onFiltersChange}
      rowClassName={(s) => (s.active ? undefined : 'bg-paper/70 text-muted')}
      empty={
        <EmptyState title="No suppliers yet." action={emptyAction}>
          Add the component suppliers and contract manufacturers you buy from, with their currency and usual Incoterm.
        </EmptyState>
      }
    />
  );
}
