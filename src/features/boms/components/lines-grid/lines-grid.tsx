import { useCallback, useEffect, useId, useMemo, useReducer, useRef, useState, type ClipboardEvent, type KeyboardEvent } from 'react';
import { keepPreviousData, useIsMutating, useQuery, useQueryClient } from '@tanstack/react-query';
import { getCoreRowModel, useReactTable, type ColumnDef } from '@tanstack/react-table';
import { useVirtualizer } from '@tanstack/react-virtual';
import { isApiError } from '../../../../lib/api-client';
import { isStaleVersion } from '../../../../lib/stale-version';
import { Button } from '../../../../components/ui/button';
import { ColumnChooser } from '../../../../components/ui/data-table/column-chooser';
import { useStoredColumnVisibility } from '../../../../components/ui/data-table/use-stored-column-visibility';
import { describeError } from '../../../../components/ui/error-state';
import { FormAlert } from '../../../../components/ui/form-alert';
import { costQueryOptions, partIndexKey, partIndexQueryOptions, type Bom, type PartSummary } from '../../api';
import { useSaveLines } from '../../hooks';
import { canEditColumn, gridColumns, optionalColumnIds, type GridColumn, type ParseContext } from '../../lines/grid-columns';
import { gridReducer, initialGridState, navigationCommand } from '../../lines/grid-navigation';
import { emptyChange, inverseChange, isEmptyChange, isNoopPatch, newTempId, type LineChange, type SavedLines } from '../../lines/line-changes';
import type { Line, LineDraft, LinePatch } from '../../lines/line-types';
import { parseTsv, pasteChange } from '../../lines/paste';
import { popUndo, pruneUndo, pushUndo, remapUndo, type UndoStack } from '../../lines/undo-stack';
import type { ChosenQuote } from './cell-display';
import { cellId, LineRow, ROW_HEADER_WIDTH, ROW_HEIGHT, type RowHandlers } from './line-row';

export type LineRights = { design: boolean; pin: boolean };

const EMPTY_PARTS: ReadonlyMap<string, PartSummary> = new Map();

// TanStack Table holds the column set and which columns show; the cells are drawn by LineRow.
const columnDefs: ColumnDef<Line>[] = gridColumns.map((column) => ({ id: column.id, header: column.label, size: column.width }));
const columnsById = new Map(gridColumns.map((column) => [column.id, column]));

// Columns a person may hide; the operating point starts hidden.
const choosable = gridColumns.filter((c) => !['refDes', 'part', 'qtyPerUnit'].includes(c.id)).map((c) => ({ id: c.id, label: c.label }));
const defaultVisibility = Object.fromEntries(optionalColumnIds.map((id) => [id, false]));

const units: Partial<Record<string, string>> = { voltageV: 'V', currentA: 'A', powerW: 'W', ambientC: '°C', attritionPct: '%' };

type Message = { tone: 'error' | 'info'; text: string };

function failureText(error: unknown): string {
  if (isStaleVersion(error)) {
    return 'Someone else changed these lines while you were editing, so the grid was reloaded with their version. Make your change again.';
  }
  if (isApiError(error) && error.status === 400 && error.details.length) {
    return `Not saved: ${error.message} ${error.details.slice(0, 3).map((d) => `${d.path} ${d.message}`).join('; ')}. The grid was reloaded.`;
  }
  return `Not saved: ${describeError(error)} The grid was reloaded.`;
}

function describeChange(change: LineChange): string {
  const parts = [];
  if (change.update.length) parts.push(`${change.update.length} line${change.update.length === 1 ? '' : 's'} changed`);
  if (change.create.length) parts.push(`${change.create.length} added`);
  if (change.delete.length) parts.push(`${change.delete.length} removed`);
  return parts.join(', ');
}

/**
 * The Lines grid: every field of every line edited in place, spreadsheet style. Keys move
 * the active cell, Enter or typing edits, a pasted block becomes one bulk save, Ctrl+Z
 * takes back the last saved change. Only the rows in view are drawn, so two thousand
 * lines scroll as smoothly as twenty.
 */
export function LinesGrid({
  bom,
  lines,
  rights,
  onImport,
}: {
  bom: Bom;
  lines: Line[];
  rights: LineRights;
  onImport?: () => void;
}) {
  const gridId = useId().replace(/:/g, '');
  const queryClient = useQueryClient();
  const parts = useQuery(partIndexQueryOptions()).data ?? EMPTY_PARTS;
  const cost = useQuery({ ...costQueryOptions(bom.id, { qty: bom.plannedQty }), placeholderData: keepPreviousData });
  const chosen = useMemo(() => {
    const map = new Map<string, ChosenQuote>();
    for (const line of cost.data?.lines ?? []) map.set(line.lineId, { quoteId: line.quoteId, supplierName: line.supplierName });
    return map;
  }, [cost.data]);

  const [visibility, setVisibility] = useStoredColumnVisibility('farthing.bom-lines.columns', defaultVisibility);
  const table = useReactTable({
    data: lines,
    columns: columnDefs,
    getRowId: (line) => line.id,
    state: { columnVisibility: visibility },
    onColumnVisibilityChange: setVisibility,
    getCoreRowModel: getCoreRowModel(),
  });
  const visibleIds = table.getVisibleLeafColumns().map((c) => c.id).join(',');
  const columns = useMemo(() => visibleIds.split(',').map((id) => columnsById.get(id as GridColumn['id'])!).filter(Boolean), [visibleIds]);
  const rows = table.getRowModel().rows;
  const totalWidth = ROW_HEADER_WIDTH + columns.reduce((sum, c) => sum + c.width, 0);

  const [nav, dispatch] = useReducer(gridReducer, undefined, () => initialGridState(lines.length, columns.length));
  useEffect(() => dispatch({ type: 'resize', rowCount: lines.length, colCount: columns.length }), [lines.length, columns.length]);

  const [undo, setUndo] = useState<UndoStack>([]);
  const [message, setMessage] = useState<Message | null>(null);
  const [editError, setEditError] = useState<string | null>(null);
  const undoChanges = useRef(new WeakSet<LineChange>());
  const labels = useRef(new WeakMap<LineChange, string>());
  const flushRef = useRef<(() => void) | null>(null);
  const scrollRef = useRef<HTMLDivElement>(null);
  // Whether the grid should hold the keyboard focus: true after a key or click in it,
  // false once focus has gone to something else on the page.
  const wantFocus = useRef(false);
  const pendingFocus = useRef<{ id: string; col: number; edit: boolean } | null>(null);

  const saving = useIsMutating({ predicate: (m) => m.options.scope?.id === `bom-lines:${bom.id}` });

  const save = useSaveLines(bom.id, {
    onSaved: (change: LineChange, saved: SavedLines, before: Map<string, Line>, resolve: (id: string) => string) => {
      if (undoChanges.current.has(change)) {
        const ids = new Map<string, string>();
        change.create.forEach((c, i) => {
          if (c.restores && saved.created[i]) ids.set(c.restores, saved.created[i].id);
        });
        setUndo((stack) => remapUndo(stack, ids));
        return;
      }
      const inverse = inverseChange(change, before, saved, resolve);
      if (!isEmptyChange(inverse)) setUndo((stack) => pushUndo(stack, { label: labels.current.get(change) ?? describeChange(change), change: inverse }));
    },
    onFailed: (_change, error) => setMessage({ tone: 'error', text: failureText(error) }),
  });

  const virtualizer = useVirtualizer({
    count: rows.length,
    getScrollElement: () => scrollRef.current,
    estimateSize: () => ROW_HEIGHT,
    overscan: 6,
  });

  const ctx: ParseContext = useMemo(() => ({ parts }), [parts]);

  /** Sends one change; `label` is what Undo will say it takes back. */
  const send = useCallback(
    (change: LineChange, label: string) => {
      if (isEmptyChange(change)) return;
      labels.current.set(change, label);
      setMessage(null);
      save.mutate(change);
    },
    [save],
  );

  const isEditable = useCallback(
    (line: Line, column: GridColumn) => canEditColumn(column, rights) && (column.id !== 'pinnedQuote' || Boolean(line.partId)),
    [rights],
  );

  const patchLine = useCallback(
    (row: number, patch: LinePatch, label: string) => {
      const line = lines[row];
      if (!line || isNoopPatch(line, patch)) return;
      send({ ...emptyChange(), update: [{ id: line.id, patch }] }, `${label} on row ${row + 1}`);
    },
    [lines, send],
  );

  // Everything the stable row handlers need, read when an event happens.
  const latest = useRef({ nav, lines, columns, ctx, patchLine, isEditable });
  useEffect(() => {
    latest.current = { nav, lines, columns, ctx, patchLine, isEditable };
  });

  const readOnlyReason = !rights.design && !rights.pin
    ? bom.state === 'released'
      ? 'This revision is released and read-only.'
      : 'Your role can read these lines; designers and the owner edit them.'
    : !rights.design
      ? 'Your role may only pin a quote on a line.'
      : null;

  const handlers: RowHandlers = useMemo(
    () => ({
      onCellMouseDown: (row, col) => {
        wantFocus.current = true;
        const { nav: current } = latest.current;
        if (current.editing && (current.row !== row || current.col !== col)) flushRef.current?.();
        if (!current.editing || current.row !== row || current.col !== col) dispatch({ type: 'moveTo', row, col });
      },
      onCellDoubleClick: (row, col) => {
        const { lines: all, columns: cols, isEditable: editable, patchLine: patch } = latest.current;
        const line = all[row];
        const column = cols[col];
        if (!line || !column || !editable(line, column)) return;
        if (column.editor === 'toggle') patch(row, { dnp: !line.dnp }, column.label);
        else dispatch({ type: 'edit', seed: null });
      },
      onCommitText: (row, col, text, then) => {
        const { lines: all, columns: cols, ctx: context, patchLine: patch } = latest.current;
        const line = all[row];
        const column = cols[col];
        if (!line || !column) return true;
        let result: { ok: true; patch: LinePatch } | { ok: false; message: string };
        if (column.id === 'pinnedQuote') result = { ok: true, patch: { pinnedQuoteId: text || null } };
        else if (column.parse) result = column.parse(text, context);
        else result = { ok: true, patch: {} };
        if (!result.ok) {
          if (then === 'stay') {
            // Left the cell with text that cannot be read: the line keeps its value.
            setEditError(null);
            setMessage({ tone: 'error', text: `Not saved: ${result.message}.` });
            dispatch({ type: 'cancel' });
            return true;
          }
          setEditError(result.message);
          return false;
        }
        setEditError(null);
        if (Object.keys(result.patch).length) patch(row, result.patch, column.label);
        dispatch({ type: 'commit', then });
        return true;
      },
      onPickPart: (row, part, then) => {
        const { lines: all, patchLine: patch } = latest.current;
        const line = all[row];
        if (!line) return;
        if (part) {
          // A part found by search may be newer than the loaded library: name it at once.
          queryClient.setQueryData<Map<string, PartSummary>>(partIndexKey, (map) => (map && !map.has(part.id) ? new Map(map).set(part.id, part) : map));
          if (part.id !== line.partId) patch(row, { partId: part.id, pinnedQuoteId: null }, 'Part');
        } else if (line.partId) {
          patch(row, { partId: null, pinnedQuoteId: null }, 'Part');
        }
        setEditError(null);
        dispatch({ type: 'commit', then });
      },
      onCancel: () => {
        setEditError(null);
        dispatch({ type: 'cancel' });
      },
      isEditable: (line, column) => latest.current.isEditable(line, column),
    }),
    [queryClient],
  );

  // Keep the active cell in view and focused while the grid has the keyboard.
  useEffect(() => {
    if (nav.editing || !wantFocus.current || rows.length === 0) return;
    virtualizer.scrollToIndex(nav.row, { align: 'auto' });
    // The row may only be drawn a frame or two after the scroll: try for a few frames.
    let tries = 0;
    let frame = 0;
    const attempt = () => {
      const cell = document.getElementById(cellId(gridId, nav.row, nav.col));
      if (cell) {
        if (document.activeElement !== cell) cell.focus();
      } else if (tries++ < 10) {
        frame = requestAnimationFrame(attempt);
      }
    };
    frame = requestAnimationFrame(attempt);
    return () => cancelAnimationFrame(frame);
  }, [nav.row, nav.col, nav.editing, rows.length, gridId, virtualizer]);

  // A line just added gets the active cell (and an editor) once it shows.
  useEffect(() => {
    const want = pendingFocus.current;
    if (!want) return;
    const index = lines.findIndex((line) => line.id === want.id);
    if (index < 0) return;
    pendingFocus.current = null;
    dispatch({ type: 'moveTo', row: index, col: want.col });
    if (want.edit) dispatch({ type: 'edit', seed: null });
  }, [lines]);

  const addLine = (draft: LineDraft, focusColumn: GridColumn['id'], label: string) => {
    const tempId = newTempId();
    const col = Math.max(0, columns.findIndex((c) => c.id === focusColumn));
    wantFocus.current = true;
    pendingFocus.current = { id: tempId, col, edit: focusColumn !== 'kind' };
    send({ ...emptyChange(), create: [{ tempId, draft }] }, label);
  };

  const deleteActive = () => {
    const line = lines[nav.row];
    if (!line) return;
    send({ ...emptyChange(), delete: [line.id] }, `Delete row ${nav.row + 1}`);
  };

  const doUndo = () => {
    const popped = popUndo(undo);
    if (!popped) return;
    const known = new Set(lines.map((line) => line.id));
    const still = pruneUndo([popped.entry], known);
    setUndo(popped.rest);
    if (still.length === 0) {
      setMessage({ tone: 'info', text: `Nothing to undo for “${popped.entry.label}”: that line is no longer here.` });
      return;
    }
    undoChanges.current.add(popped.entry.change);
    setMessage({ tone: 'info', text: `Undone: ${popped.entry.label}.` });
    save.mutate(popped.entry.change);
  };

  const activeLine = lines[nav.row];
  const activeColumn = columns[nav.col];

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (nav.editing || event.defaultPrevented) return;
    // Keys typed into the toolbar or the column chooser are theirs.
    if (!(event.target as HTMLElement).closest('[role="grid"]')) return;
    wantFocus.current = true;
    const editable = Boolean(activeLine && activeColumn && isEditable(activeLine, activeColumn));
    const command = navigationCommand(event, nav, {
      pageRows: Math.max(1, Math.floor((scrollRef.current?.clientHeight ?? 360) / ROW_HEIGHT) - 2),
      toggles: activeColumn?.editor === 'toggle' && editable,
    });
    if (!command) return;
    if (command.type === 'copy') return; // the copy event below fills the clipboard
    event.preventDefault();
    switch (command.type) {
      case 'undo':
        doUndo();
        return;
      case 'toggle':
        if (activeLine && editable) patchLine(nav.row, { dnp: !activeLine.dnp }, 'DNP');
        return;
      case 'clear':
        if (activeLine && activeColumn && editable) {
          if (activeColumn.editor === 'toggle') patchLine(nav.row, { dnp: false }, 'DNP');
          else handlers.onCommitText(nav.row, nav.col, '', 'stay');
        }
        return;
      case 'edit':
        if (!activeLine || !activeColumn) return;
        if (!editable) {
          setMessage({
            tone: 'info',
            text:
              activeColumn.id === 'pinnedQuote' && rights.pin && !activeLine.partId
                ? 'Pick a part for this line before pinning a quote.'
                : (readOnlyReason ?? `${activeColumn.label} is worked out, not typed.`),
          });
          return;
        }
        setEditError(null);
        dispatch({ type: 'edit', seed: activeColumn.editor === 'text' || activeColumn.editor === 'part' ? command.seed : null });
        return;
      default:
        dispatch(command);
    }
  };

  const onCopy = (event: ClipboardEvent<HTMLDivElement>) => {
    if (nav.editing || !activeLine || !activeColumn) return;
    event.preventDefault();
    event.clipboardData.setData('text/plain', activeColumn.text(activeLine, ctx));
  };

  const onPaste = (event: ClipboardEvent<HTMLDivElement>) => {
    if (nav.editing) return;
    const text = event.clipboardData.getData('text/plain');
    if (!text) return;
    event.preventDefault();
    if (!rights.design) {
      setMessage({ tone: 'info', text: readOnlyReason ?? 'Pasting is for designers and the owner.' });
      return;
    }
    const cells = parseTsv(text);
    const result = pasteChange(cells, { row: nav.row, col: nav.col }, lines, columns, ctx, rights);
    if (result.errors.length) {
      const more = result.errors.length > 4 ? ` and ${result.errors.length - 4} more` : '';
      setMessage({ tone: 'error', text: `Nothing was pasted. ${result.errors.slice(0, 4).join('. ')}${more}.` });
      return;
    }
    if (isEmptyChange(result.change)) {
      setMessage({ tone: 'info', text: 'The pasted cells match the lines already; nothing to change.' });
      return;
    }
    const summary = describeChange(result.change);
    send(result.change, `Paste (${summary})`);
    setMessage({ tone: 'info', text: `Pasted: ${summary}.${result.ignored ? ` ${result.ignored} cell(s) past the last column were left out.` : ''}` });
  };

  const items = virtualizer.getVirtualItems();
  const activeRendered = items.some((item) => item.index === nav.row);

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-2">
        {rights.design ? (
          <>
            <Button size="sm" onClick={() => addLine({ kind: 'part', qtyPerUnit: '1' }, 'refDes', 'Add line')}>
              Add line
            </Button>
            <Button size="sm" variant="secondary" onClick={() => addLine({ kind: 'labour', qtyPerUnit: '1' }, 'kind', 'Add cost line')}>
              Add cost line
            </Button>
            <Button size="sm" variant="secondary" disabled={!activeLine} onClick={deleteActive}>
              Delete line
            </Button>
            {onImport ? (
              <Button size="sm" variant="secondary" onClick={onImport}>
                Import lines
              </Button>
            ) : null}
          </>
        ) : null}
        {rights.design || rights.pin ? (
          <Button size="sm" variant="secondary" disabled={undo.length === 0} onClick={doUndo} title={undo.length ? `Undo: ${undo[undo.length - 1].label}` : 'Nothing to undo'}>
            Undo
          </Button>
        ) : null}
        <div className="ml-auto flex items-center gap-3">
          <span role="status" className="text-xs text-muted">
            {saving > 0 ? `Saving ${saving} change${saving === 1 ? '' : 's'}…` : `${lines.length} line${lines.length === 1 ? '' : 's'}`}
          </span>
          <ColumnChooser columns={choosable} visibility={visibility} onChange={setVisibility} />
        </div>
      </div>

      {readOnlyReason && bom.state !== 'released' ? <p className="text-sm text-muted">{readOnlyReason}</p> : null}
      {message ? (
        <div className="flex items-start gap-2">
          <div className="flex-1">
            <FormAlert tone={message.tone}>{message.text}</FormAlert>
          </div>
          <Button size="sm" variant="quiet" onClick={() => setMessage(null)} aria-label="Dismiss message">
            ×
          </Button>
        </div>
      ) : null}

      <div
        ref={scrollRef}
        className="max-h-[65vh] overflow-auto rounded-lg border border-rule bg-surface"
        onKeyDown={onKeyDown}
        onCopy={onCopy}
        onPaste={onPaste}
        onBlur={(event) => {
          const next = event.relatedTarget as Node | null;
          if (next && !event.currentTarget.contains(next)) wantFocus.current = false;
        }}
      >
        <div
          role="grid"
          aria-label="Lines"
          aria-rowcount={rows.length + 1}
          aria-colcount={columns.length + 1}
          aria-readonly={!rights.design && !rights.pin ? true : undefined}
          // With the active row out of view (or no rows to paste into yet), the grid itself takes Tab.
          tabIndex={activeRendered ? -1 : 0}
          onFocus={(event) => {
            if (event.target !== event.currentTarget || rows.length === 0) return;
            wantFocus.current = true;
            virtualizer.scrollToIndex(nav.row, { align: 'auto' });
            // Drawn a frame after the scroll; the effect above takes over once it is.
            requestAnimationFrame(() => requestAnimationFrame(() => document.getElementById(cellId(gridId, nav.row, nav.col))?.focus()));
          }}
          style={{ width: totalWidth }}
          className="text-sm outline-none"
        >
          <div role="rowgroup" className="sticky top-0 z-10">
            <div role="row" aria-rowindex={1} className="flex border-b border-rule bg-surface">
              <div role="columnheader" className="sticky left-0 z-[1] shrink-0 bg-surface px-2 py-2 text-right text-xs font-semibold text-muted" style={{ width: ROW_HEADER_WIDTH }}>
                <span className="sr-only">Row</span>#
              </div>
              {columns.map((column, col) => (
                <div
                  key={column.id}
                  role="columnheader"
                  aria-colindex={col + 2}
                  className={`shrink-0 truncate px-2 py-2 text-xs font-semibold tracking-wide text-muted uppercase ${column.numeric ? 'text-right' : ''}`}
                  style={{ width: column.width }}
                >
                  {column.label.replace(/ %$/, '')}
                  {units[column.id] ? <span className="ml-1 font-normal normal-case">({units[column.id]})</span> : null}
                </div>
              ))}
            </div>
          </div>
          <div role="rowgroup" className="relative" style={{ height: virtualizer.getTotalSize() }}>
            {items.map((item) => {
              const line = rows[item.index]?.original;
              if (!line) return null;
              const active = item.index === nav.row;
              return (
                <LineRow
                  key={line.id}
                  line={line}
                  index={item.index}
                  top={item.start}
                  columns={columns}
                  activeCol={active ? nav.col : -1}
                  editing={active && nav.editing}
                  seed={active ? nav.seed : null}
                  editError={active ? editError : null}
                  gridId={gridId}
                  parts={parts}
                  chosen={chosen.get(line.id)}
                  handlers={handlers}
                  flushRef={flushRef}
                />
              );
            })}
          </div>
        </div>
        {rows.length === 0 ? (
          <p className="px-4 py-8 text-center text-sm text-muted">
            No lines yet.{rights.design ? ' Add a line, add a cost line, paste from a spreadsheet or import a file.' : ''}
          </p>
        ) : null}
      </div>
      <p id={`${gridId}-error`} role={editError ? 'alert' : undefined} className={editError ? 'text-sm font-medium text-brick' : 'sr-only'}>
        {editError ?? ''}
      </p>
      <p className="text-xs text-muted">
        Arrow keys move; Enter or typing edits; Enter saves and moves down, Tab moves right, Esc cancels. Paste a block copied from a spreadsheet at the active cell. Ctrl+Z undoes the last saved change.
      </p>
    </div>
  );
}
