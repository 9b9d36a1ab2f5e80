import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper, type OnChangeFn, type VisibilityState } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { useUrlColumnFilters } from '../../../components/ui/data-table/use-url-column-filters';
import type { ChoosableColumn } from '../../../components/ui/data-table/column-chooser';
import type { Part } from '../api';
import { categoryLabels, mountLabels } from '../part-form';
import { ratingSummary } from '../ratings';

const column = createColumnHelper<Part>();

// Every cell is one line (no wrapping), so every row has this height and need not be measured.
const PART_ROW_HEIGHT = 36;
const countFormat = new Intl.NumberFormat('en-GB');

/** The columns a person may show or hide, in table order. */
export const partColumns: readonly ChoosableColumn[] = [
  { id: 'internalPn', label: 'Internal PN' },
  { id: 'mpn', label: 'MPN' },
  { id: 'manufacturer', label: 'Maker' },
  { id: 'category', label: 'Category' },
  { id: 'package', label: 'Package' },
  { id: 'ratings', label: 'Ratings' },
  { id: 'mount', label: 'Mount' },
  { id: 'pins', label: 'Pins' },
  { id: 'hsCode', label: 'HS code' },
  { id: 'unitWeightG', label: 'Weight (g)' },
  { id: 'description', label: 'Description' },
];

/** Shown until someone chooses otherwise: the columns a designer scans first. */
export const defaultPartColumnVisibility: VisibilityState = { mount: false, pins: false, unitWeightG: false, description: false };

/**
 * The parts library as one long table: sorting and per-column filters in the address,
 * only the visible rows rendered, so ten thousand parts scroll smoothly.
 */
export function PartsTable({
  parts,
  visibility,
  onVisibilityChange,
  empty,
}: {
  parts: Part[];
  visibility: VisibilityState;
  onVisibilityChange: OnChangeFn<VisibilityState>;
  empty: ReactNode;
}) {
  const [sorting, onSortingChange] = useUrlSorting('sort');
  const [filters, onFiltersChange] = useUrlColumnFilters();

  const columns = useMemo(
    () => [
      column.accessor('internalPn', {
        header: 'Internal PN',
        cell: (info) => (
          <Link to={`/parts/${info.row.original.id}`} className="font-medium whitespace-nowrap text-copper-dark underline-offset-2 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('mpn', { header: 'MPN', cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span> }),
      column.accessor('manufacturer', { header: 'Maker', cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span> }),
      column.accessor((part) => categoryLabels[part.category], {
        id: 'category',
        header: 'Category',
        // The page's own category filter asks the server; a second box would only confuse.
        enableColumnFilter: false,
        cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span>,
      }),
      column.accessor('package', { header: 'Package', cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span> }),
      column.accessor((part) => ratingSummary(part.category, part.ratings), {
        id: 'ratings',
        header: 'Ratings',
        enableSorting: false,
        cell: (info) => <span className="whitespace-nowrap tabular-nums">{info.getValue()}</span>,
      }),
      column.accessor((part) => mountLabels[part.mount], { id: 'mount', header: 'Mount' }),
      column.accessor('pins', { header: 'Pins', meta: { numeric: true } }),
      column.accessor((part) => part.hsCode ?? '', { id: 'hsCode', header: 'HS code', cell: (info) => <span className="tabular-nums">{info.getValue()}</span> }),
      column.accessor((part) => (part.unitWeightG === null ? '' : String(Number(part.unitWeightG))), {
        id: 'unitWeightG',
        header: 'Weight (g)',
        meta: { numeric: true },
        sortingFn: (a, b) => Number(a.original.unitWeightG ?? -1) - Number(b.original.unitWeightG ?? -1),
      }),
      column.accessor('description', {
        header: 'Description',
        cell: (info) => <span className="block max-w-80 truncate text-muted" title={info.getValue()}>{info.getValue()}</span>,
      }),
    ],
    [],
  );

  return (
    <DataTable
      label="Parts"
      columns={columns}
      data={parts}
      getRowId={(part) => part.id}
      sorting={sorting}
      onSortingChange={onSortingChange}
      columnFilters={filters}
      onColumnFiltersChange={onFiltersChange}
      columnVisibility={visibility}
      onColumnVisibilityChange={onVisibilityChange}
      rowHeight={PART_ROW_HEIGHT}
      summary={(shown, total) =>
        shown === total
          ? `${countFormat.format(total)} ${total === 1 ? 'part' : 'parts'}`
          : `${countFormat.format(shown)} of ${countFormat.format(total)} parts match the column filters`
      }
      empty={empty}
    />
  );
}
