import { memo, type RefObject } from 'react';
import type { PartSummary } from '../../api';
import type { GridColumn } from '../../lines/grid-columns';
import type { Line } from '../../lines/line-types';
import { CellDisplay, type ChosenQuote } from './cell-display';
import { SelectEditor, TextEditor, type CommitMove } from './cell-editors';
import { PartPicker } from './part-picker';
import { QuotePicker } from './quote-picker';

export const ROW_HEIGHT = 36;
export const ROW_HEADER_WIDTH = 48;

/** What a row asks of the grid; stable functions, so rows that did not change are not drawn again. */
export type RowHandlers = {
  onCellMouseDown: (row: number, col: number) => void;
  onCellDoubleClick: (row: number, col: number) => void;
  onCommitText: (row: number, col: number, text: string, then: CommitMove) => boolean;
  onPickPart: (row: number, part: PartSummary | null, then: CommitMove) => void;
  onCancel: () => void;
  isEditable: (line: Line, column: GridColumn) => boolean;
};

type Props = {
  line: Line;
  index: number;
  top: number;
  columns: readonly GridColumn[];
  /** The active column when this row holds the active cell, else -1. */
  activeCol: number;
  editing: boolean;
  seed: string | null;
  editError: string | null;
  gridId: string;
  parts: ReadonlyMap<string, PartSummary>;
  chosen: ChosenQuote | undefined;
  handlers: RowHandlers;
  flushRef: RefObject<(() => void) | null>;
};

export function cellId(gridId: string, row: number, col: number) {
  return `${gridId}-r${row}-c${col}`;
}

/** One line of the grid, positioned by the virtualiser; only its cells are focusable. */
export const LineRow = memo(function LineRow({
  line,
  index,
  top,
  columns,
  activeCol,
  editing,
  seed,
  editError,
  gridId,
  parts,
  chosen,
  handlers,
  flushRef,
}: Props) {
  const unresolved = !line.partId && Boolean(line.unresolved);
  const errorId = `${gridId}-error`;
  return (
    <div
      role="row"
      aria-rowindex={index + 2}
      className={[
        'absolute left-0 flex border-b border-rule/70',
        unresolved ? 'bg-ochre/10' : 'bg-surface',
        line.dnp ? 'text-muted' : 'text-ink',
      ].join(' ')}
      style={{ top: 0, transform: `translateY(${top}px)`, height: ROW_HEIGHT }}
    >
      <div
        role="rowheader"
        className="sticky left-0 z-[1] flex shrink-0 items-center justify-end border-r border-rule bg-paper px-2 text-xs text-muted tabular-nums"
        style={{ width: ROW_HEADER_WIDTH }}
      >
        {index + 1}
      </div>
      {columns.map((column, col) => {
        const active = col === activeCol;
        const editable = handlers.isEditable(line, column);
        const label = `${column.label}, row ${index + 1}`;
        let content;
        if (active && editing && editable) {
          const common = {
            label,
            errorId: editError ? errorId : undefined,
            invalid: Boolean(editError),
            onCommit: (text: string, then: CommitMove) => handlers.onCommitText(index, col, text, then),
            onCancel: handlers.onCancel,
            flushRef,
          };
          const initial = column.text(line, { parts });
          if (column.editor === 'part') {
            content = (
              <PartPicker
                label={label}
                initial={line.partId ? (parts.get(line.partId)?.internalPn ?? '') : (line.unresolved ?? '')}
                seed={seed}
                onPick={(part, then) => handlers.onPickPart(index, part, then)}
                onCancel={handlers.onCancel}
              />
            );
          } else if (column.editor === 'select') {
            content = <SelectEditor {...common} initial={line.kind} options={column.options ?? []} />;
          } else if (column.editor === 'quote' && line.partId) {
            content = <QuotePicker {...common} initial={line.pinnedQuoteId ?? ''} partId={line.partId} />;
          } else {
            content = <TextEditor {...common} initial={initial} seed={seed} numeric={column.numeric} />;
          }
        } else {
          content = <CellDisplay column={column} line={line} parts={parts} chosen={chosen} />;
        }
        const display = !(active && editing && editable);
        return (
          <div
            key={column.id}
            id={cellId(gridId, index, col)}
            role="gridcell"
            aria-colindex={col + 2}
            aria-readonly={editable ? undefined : true}
            tabIndex={active ? 0 : -1}
            data-active={active || undefined}
            // A cell shown (not edited) lays out its content itself: one element fewer per
            // cell, some 400 fewer for each screenful of rows the grid draws.
            className={[
              'relative shrink-0 overflow-hidden border-r border-rule/50 text-sm outline-none',
              display ? `flex min-w-0 items-center px-2 whitespace-nowrap ${column.numeric ? 'justify-end tabular-nums' : ''}` : '',
              active && !editing ? 'z-[2] ring-2 ring-slate-info ring-inset' : '',
              column.numeric ? 'text-right' : '',
            ].join(' ')}
            style={{ width: column.width }}
            onMouseDown={() => handlers.onCellMouseDown(index, col)}
            onDoubleClick={() => handlers.onCellDoubleClick(index, col)}
          >
            {content}
          </div>
        );
      })}
    </div>
  );
});
