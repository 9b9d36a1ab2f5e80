import { useMemo } from 'react';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import type { ColumnMapping, ImportField, PreviewRow } from '../api';
import { problemsByField, shownFields } from '../mapping';

const column = createColumnHelper<PreviewRow>();

/**
 * The file's rows as the mapping reads them. A row with problems is tinted and lists
 * them in words; the cell at fault is outlined and carries its message for screen readers.
 */
export function PreviewTable({ rows, fields, mapping }: { rows: PreviewRow[]; fields: ImportField[]; mapping: ColumnMapping }) {
  const columns = useMemo(
    () => [
      column.accessor('row', { header: 'Row', meta: { numeric: true } }),
      // Beside the row number, so the problems are in view however wide the file is.
      column.display({
        id: 'problems',
        header: 'Problems',
        cell: (info) => {
          const problems = info.row.original.problems;
          if (problems.length === 0) return <span className="text-verdigris">Ready</span>;
          const label = new Map(fields.map((f) => [f.name, f.label]));
          return (
            <ul className="flex min-w-56 flex-col gap-0.5 text-brick">
              {problems.map((p, i) => (
                <li key={i}>
                  <span className="font-medium">{label.get(p.field) ?? p.field}</span> {p.message}
                </li>
              ))}
            </ul>
          );
        },
      }),
      ...shownFields(fields, mapping).map((field) =>
        column.accessor((r) => r.values[field.name] ?? '', {
          id: field.name,
          header: field.label,
          enableSorting: false,
          cell: (info) => {
            const messages = problemsByField(info.row.original)[field.name];
            const value = info.getValue();
            if (!messages) return <span className="whitespace-nowrap">{value}</span>;
            return (
              <span className="inline-block rounded border border-brick px-1 whitespace-nowrap text-brick">
                {value || <span className="italic">empty</span>}
                <span className="sr-only"> (problem: {messages.join('; ')})</span>
              </span>
            );
          },
        }),
      ),
    ],
    [fields, mapping],
  );

  return (
    <DataTable
      label="Import preview"
      columns={columns}
      data={rows}
      getRowId={(r) => String(r.row)}
      rowClassName={(r) => (r.problems.length ? 'bg-brick/5' : undefined)}
      maxHeight="45vh"
      empty={<EmptyState title="The file has no rows under its header." />}
    />
  );
}
