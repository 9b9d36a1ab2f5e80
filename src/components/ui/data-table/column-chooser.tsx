import { useState } from 'react';
import type { OnChangeFn, VisibilityState } from '@tanstack/react-table';

export type ChoosableColumn = { id: string; label: string };

/**
 * Shows or hides a table's columns (the DataTable's `columnVisibility`). A disclosure
 * (<details>) rather than a menu: each column is a plain labelled checkbox. The boxes
 * exist only while it is open, so their labels never stand beside a form's fields.
 */
export function ColumnChooser({
  columns,
  visibility,
  onChange,
}: {
  columns: readonly ChoosableColumn[];
  visibility: VisibilityState;
  onChange: OnChangeFn<VisibilityState>;
}) {
  const [open, setOpen] = useState(false);
  const isShown = (id: string) => visibility[id] !== false;
  const shown = columns.filter((column) => isShown(column.id)).length;
  return (
    <details className="relative" open={open} onToggle={(event) => setOpen(event.currentTarget.open)}>
      <summary className="inline-flex h-9 cursor-pointer list-none items-center gap-2 rounded-md border border-rule bg-surface px-3 text-sm font-medium hover:border-muted">
        Columns
        <span className="text-xs font-normal text-muted tabular-nums">
          {shown}/{columns.length}
        </span>
      </summary>
      {open ? (
        <fieldset className="absolute right-0 z-20 mt-1 flex w-60 flex-col gap-1.5 rounded-md border border-rule bg-surface p-3 shadow-lg">
          <legend className="sr-only">Columns to show</legend>
          {columns.map((column) => (
            <label key={column.id} className="flex items-center gap-2 text-sm">
              <input
                type="checkbox"
                className="size-4 accent-copper"
                checked={isShown(column.id)}
                // The last shown column stays: an empty table helps no one.
                disabled={isShown(column.id) && shown === 1}
                onChange={(event) => {
                  const checked = event.target.checked;
                  onChange((current) => ({ ...current, [column.id]: checked }));
                }}
              />
              {column.label}
            </label>
          ))}
        </fieldset>
      ) : null}
    </details>
  );
}
