import { useEffect, useRef, useState, type ReactNode } from 'react';
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type Column,
  type ColumnDef,
  type ColumnFiltersState,
  type FilterFn,
  type OnChangeFn,
  type RowData,
  type SortDirection,
  type SortingState,
  type VisibilityState,
} from '@tanstack/react-table';
import { useVirtualizer } from '@tanstack/react-virtual';

// TanStack Table v8 (useReactTable / getCoreRowModel), chosen on purpose: see DEVELOPERS.md.
declare module '@tanstack/react-table' {
  // An augmentation must repeat the library's type parameters, used or not.
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface ColumnMeta<TData extends RowData, TValue> {
    /** A number column: tabular figures, right-aligned. */
    numeric?: boolean;
    /** Header text for screen readers only (an actions column still needs a name). */
    hiddenHeader?: boolean;
    /** The column's name in words, for its filter box and the column chooser (default: the header text). */
    label?: string;
  }
}

/** The column's name in words: `meta.label`, else a plain-text header, else its id. */
export function columnLabel<T>(column: Column<T, unknown>): string {
  const header = column.columnDef.header;
  return column.columnDef.meta?.label ?? (typeof header === 'string' ? header : column.id);
}

/** Per-column text filter: the cell's value as text contains the typed words, any case. */
const containsText: FilterFn<unknown> = (row, columnId, filterValue) => {
  const wanted = String(filterValue ?? '').trim().toLowerCase();
  if (!wanted) return true;
  const value = row.getValue(columnId);
  return String(value ?? '').toLowerCase().includes(wanted);
};

// One object for the life of the app: a new one per render would make TanStack Table
// rebuild every column and row model, which costs a frame per scroll at 10,000 rows.
const defaultColumn = { filterFn: containsText };

export type DataTableProps<T> = {
  /** The table's accessible name ("Members", "API tokens"). */
  label: string;
  // Columns mix value types; `any` here is TanStack's own advice for a column array.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  data: T[];
  getRowId: (row: T) => string;
  /** Shown instead of the table when there are no rows. */
  empty: ReactNode;
  /** Controlled sorting, e.g. from `useUrlSorting`; without it the table sorts on its own. */
  sorting?: SortingState;
  onSortingChange?: OnChangeFn<SortingState>;
  /** Above this many rows only the visible rows are rendered. */
  virtualizeAbove?: number;
  /** Height of the scrolling body when virtualised. */
  maxHeight?: string;
  /**
   * Controlled per-column text filters (e.g. from `useUrlColumnFilters`); with them the
   * table shows a filter box under each filterable header.
   */
  columnFilters?: ColumnFiltersState;
  onColumnFiltersChange?: OnChangeFn<ColumnFiltersState>;
  /** Controlled shown/hidden columns (e.g. from `useStoredColumnVisibility`). */
  columnVisibility?: VisibilityState;
  onColumnVisibilityChange?: OnChangeFn<VisibilityState>;
  /** Extra classes for a row, e.g. to grey an expired quote. */
  rowClassName?: (row: T) => string | undefined;
  /**
   * A fixed row height in pixels for a long table of one-line rows. Rows are then not
   * measured one by one, which keeps scrolling through ten thousand rows smooth.
   */
  rowHeight?: number;
  /** A line above the table saying how many rows show, e.g. "2,500 of 10,000 parts". */
  summary?: (shown: number, total: number) => ReactNode;
};

/**
 * A filter box that keeps its own text while typing and hands it on once typing pauses,
 * so ten thousand rows are filtered once per pause rather than once per key.
 */
function FilterInput({ label, value, onChange }: { label: string; value: string; onChange: (value: string) => void }) {
  const [text, setText] = useState(value);
  const latest = useRef(onChange);
  useEffect(() => {
    latest.current = onChange;
  });
  useEffect(() => {
    if (text === value) return;
    const timer = window.setTimeout(() => latest.current(text), 250);
    return () => window.clearTimeout(timer);
  }, [text, value]);
  return (
    <label className="block">
      <span className="sr-only">Filter {label}</span>
      <input
        type="search"
        value={text}
        onChange={(event) => setText(event.target.value)}
        placeholder="Filter"
        className="h-7 w-full min-w-16 rounded border border-rule bg-surface px-2 text-xs font-normal tracking-normal text-ink normal-case placeholder:text-muted/60 hover:border-muted"
      />
    </label>
  );
}

// A first guess for unseen rows; rendered rows are measured, so a taller row is fine.
const ROW_HEIGHT = 40;

function SortMark({ direction }: { direction: false | SortDirection }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 8 12" className="size-2.5 shrink-0">
      <path d="M4 1 7 5H1z" fill="currentColor" opacity={direction === 'asc' ? 1 : 0.25} />
      <path d="M4 11 1 7h6z" fill="currentColor" opacity={direction === 'desc' ? 1 : 0.25} />
    </svg>
  );
}

/**
 * The one headless table of the app: columns come from each area, this shell renders
 * them densely with sortable headers, and renders only the visible rows of a long list.
 */
export function DataTable<T>({
  label,
  columns,
  data,
  getRowId,
  empty,
  sorting: sortingProp,
  onSortingChange,
  virtualizeAbove = 100,
  maxHeight = '70vh',
  columnFilters,
  onColumnFiltersChange,
  columnVisibility,
  onColumnVisibilityChange,
  rowClassName,
  rowHeight,
  summary,
}: DataTableProps<T>) {
  const [ownSorting, setOwnSorting] = useState<SortingState>([]);
  const sorting = sortingProp ?? ownSorting;
  const filterable = columnFilters !== undefined && onColumnFiltersChange !== undefined;

  const table = useReactTable({
    data,
    columns,
    getRowId: (row) => getRowId(row),
    state: {
      sorting,
      ...(filterable ? { columnFilters } : {}),
      ...(columnVisibility ? { columnVisibility } : {}),
    },
    onSortingChange: onSortingChange ?? setOwnSorting,
    onColumnFiltersChange,
    onColumnVisibilityChange,
    defaultColumn: defaultColumn as Partial<ColumnDef<T, unknown>>,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    ...(filterable ? { getFilteredRowModel: getFilteredRowModel() } : {}),
  });

  const rows = table.getRowModel().rows;
  const virtualize = rows.length > virtualizeAbove;
  const scrollRef = useRef<HTMLDivElement>(null);
  const virtualizer = useVirtualizer({
    count: rows.length,
    getScrollElement: () => scrollRef.current,
    estimateSize: () => rowHeight ?? ROW_HEIGHT,
    overscan: 12,
    enabled: virtualize,
  });

  if (data.length === 0) return <>{empty}</>;

  const virtualRows = virtualize ? virtualizer.getVirtualItems() : null;
  const visible = virtualRows ? virtualRows.map((item) => ({ row: rows[item.index], index: item.index })) : rows.map((row, index) => ({ row, index }));
  const paddingTop = virtualRows && virtualRows.length > 0 ? virtualRows[0].start : 0;
  const paddingBottom =
    virtualRows && virtualRows.length > 0 ? virtualizer.getTotalSize() - virtualRows[virtualRows.length - 1].end : 0;
  const columnCount = table.getVisibleLeafColumns().length;
  const headerRows = filterable ? 2 : 1;

  const tableView = (
    <div
      ref={scrollRef}
      className="overflow-auto rounded-lg border border-rule bg-surface"
      style={virtualize ? { maxHeight } : undefined}
    >
      <table aria-label={label} aria-rowcount={virtualize ? rows.length + headerRows : undefined} className="w-full border-collapse text-sm">
        <thead className="sticky top-0 z-10 bg-surface">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} aria-rowindex={virtualize ? 1 : undefined}>
              {group.headers.map((header) => {
                const meta = header.column.columnDef.meta;
                const sortable = header.column.getCanSort();
                const direction = header.column.getIsSorted();
                const content = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sortable ? (direction === 'asc' ? 'ascending' : direction === 'desc' ? 'descending' : 'none') : undefined}
                    className={[
                      'border-b border-rule px-3 py-2 text-xs font-semibold tracking-wide text-muted uppercase',
                      meta?.numeric ? 'text-right' : 'text-left',
                    ].join(' ')}
                  >
                    {meta?.hiddenHeader ? (
                      <span className="sr-only">{content}</span>
                    ) : sortable ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className={`inline-flex items-center gap-1 uppercase hover:text-ink ${meta?.numeric ? 'flex-row-reverse' : ''}`}
                      >
                        {content}
                        <SortMark direction={direction} />
                      </button>
                    ) : (
                      content
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
          {filterable ? (
            <tr aria-rowindex={virtualize ? 2 : undefined}>
              {table.getVisibleLeafColumns().map((column) => (
                <td key={column.id} className="border-b border-rule px-2 pb-2">
                  {column.getCanFilter() && !column.columnDef.meta?.hiddenHeader ? (
                    <FilterInput
                      label={columnLabel(column)}
                      value={String(column.getFilterValue() ?? '')}
                      onChange={(text) => column.setFilterValue(text || undefined)}
                    />
                  ) : null}
                </td>
              ))}
            </tr>
          ) : null}
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={columnCount} className="px-3 py-6 text-center text-muted">
                No rows match these filters.
              </td>
            </tr>
          ) : null}
          {paddingTop > 0 ? (
            <tr aria-hidden="true">
              <td colSpan={columnCount} style={{ height: paddingTop, padding: 0 }} />
            </tr>
          ) : null}
          {visible.map(({ row, index }) => (
            <tr
              key={row.id}
              data-index={index}
              ref={virtualize && !rowHeight ? virtualizer.measureElement : undefined}
              style={rowHeight ? { height: rowHeight } : undefined}
              aria-rowindex={virtualize ? index + headerRows + 1 : undefined}
              className={`border-b border-rule/70 last:border-b-0 hover:bg-paper/60 ${rowClassName?.(row.original) ?? ''}`}
            >
              {row.getVisibleCells().map((cell) => (
                <td
                  key={cell.id}
                  className={`px-3 py-1.5 align-middle ${cell.column.columnDef.meta?.numeric ? 'num' : ''}`}
                >
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {paddingBottom > 0 ? (
            <tr aria-hidden="true">
              <td colSpan={columnCount} style={{ height: paddingBottom, padding: 0 }} />
            </tr>
          ) : null}
        </tbody>
      </table>
    </div>
  );

  if (!summary) return tableView;
  return (
    <div className="flex flex-col gap-2">
      <p role="status" className="text-sm text-muted tabular-nums">
        {summary(rows.length, data.length)}
      </p>
      {tableView}
    </div>
  );
}
