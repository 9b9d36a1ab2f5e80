import { canEditColumn, type GridColumn, type ParseContext } from './grid-columns';
import { emptyChange, isNoopPatch, newTempId, type LineChange } from './line-changes';
import type { Line, LinePatch } from './line-types';

/**
 * Text copied from a spreadsheet as rows of cells. Spreadsheets separate cells by tabs and
 * rows by line breaks, and quote a cell that holds a tab, a line break or a quote
 * ("a ""b""" is a "b"). The trailing line break they add is not an extra row.
 */
export function parseTsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let i = 0;
  let quotedCell = false;
  const endCell = () => {
    row.push(cell);
    cell = '';
    quotedCell = false;
  };
  const endRow = () => {
    endCell();
    rows.push(row);
    row = [];
  };
  while (i < text.length) {
    const ch = text[i];
    if (ch === '"' && cell === '' && !quotedCell) {
      // A quoted cell: read to the closing quote, "" being a quote inside.
      let j = i + 1;
      let value = '';
      let closed = false;
      while (j < text.length) {
        if (text[j] === '"') {
          if (text[j + 1] === '"') {
            value += '"';
            j += 2;
            continue;
          }
          closed = true;
          j += 1;
          break;
        }
        value += text[j];
        j += 1;
      }
      const next = text[j];
      if (closed && (j >= text.length || next === '\t' || next === '\n' || next === '\r')) {
        cell = value;
        quotedCell = true;
        i = j;
        continue;
      }
      // Not a well-formed quoted cell (a quote mark at the start of plain text): keep it as typed.
      cell += ch;
      i += 1;
      continue;
    }
    if (ch === '\t') {
      endCell();
      i += 1;
    } else if (ch === '\r' || ch === '\n') {
      endRow();
      i += ch === '\r' && text[i + 1] === '\n' ? 2 : 1;
    } else {
      cell += ch;
      i += 1;
    }
  }
  if (cell !== '' || row.length > 0 || quotedCell) endRow();
  return rows;
}

export type PasteResult = {
  change: LineChange;
  /** One message per cell that could not be read, naming row and column; nothing is saved while any remain. */
  errors: string[];
  /** Cells that fell beyond the last column that can take them. */
  ignored: number;
};

function mergeInto(target: LinePatch, patch: LinePatch): LinePatch {
  const { operatingPoint, ...fields } = patch;
  const next: LinePatch = { ...target, ...fields };
  if (operatingPoint) next.operatingPoint = { ...target.operatingPoint, ...operatingPoint };
  return next;
}

/**
 * A pasted block laid onto the grid from the active cell: its first column lands on the
 * active column and runs right through the columns the role may change (read-only
 * columns are stepped over); rows run down over the existing lines and past the last one
 * as new lines. The result is one change, to be sent as one bulk request.
 */
export function pasteChange(
  cells: readonly (readonly string[])[],
  at: { row: number; col: number },
  lines: readonly Line[],
  columns: readonly GridColumn[],
  ctx: ParseContext,
  rights: { design: boolean; pin: boolean },
): PasteResult {
  const change = emptyChange();
  const errors: string[] = [];
  let ignored = 0;
  const targets = columns.slice(at.col).filter((column) => column.parse && canEditColumn(column, rights));

  cells.forEach((rowCells, i) => {
    const rowIndex = at.row + i;
    let patch: LinePatch = {};
    let filled = false;
    rowCells.forEach((text, c) => {
      const column = targets[c];
      if (!column) {
        if (text.trim() !== '') ignored += 1;
        return;
      }
      if (text.trim() !== '') filled = true;
      const parsed = column.parse!(text, ctx);
      if (!parsed.ok) errors.push(`Row ${rowIndex + 1}, ${column.label}: ${parsed.message}`);
      else patch = mergeInto(patch, parsed.patch);
    });
    const line = lines[rowIndex];
    if (line) {
      if (Object.keys(patch).length > 0 && !isNoopPatch(line, patch)) change.update.push({ id: line.id, patch });
    } else if (filled) {
      change.create.push({ tempId: newTempId(), draft: patch });
    }
  });
  return { change, errors, ignored };
}
