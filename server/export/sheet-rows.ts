import type ExcelJS from 'exceljs';
import type { CellContent } from './line-cells';
import { safeText } from './formats';

/** One cell to write: its content and, for numbers, the number format. */
export interface CellSpec {
  value: CellContent;
  numFmt?: string;
}

export type RowSpec = (CellSpec | undefined)[];

// Paper and ink of Farthing's palette: a calm header band.
const HEADER_FILL: ExcelJS.Fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFF7F4EE' } };
const HEADER_BORDER: Partial<ExcelJS.Borders> = { bottom: { style: 'thin', color: { argb: 'FFE3DED4' } } };

export interface SheetOptions {
  widths: number[];
  /** Rows kept in view while scrolling (the header). */
  frozenRows: number;
  frozenColumns?: number;
}

/** A streamed worksheet with a frozen header and column widths, ready for rows. */
export function addSheet(wb: ExcelJS.stream.xlsx.WorkbookWriter, name: string, options: SheetOptions): ExcelJS.Worksheet {
  const ws = wb.addWorksheet(name, {
    views: [{ state: 'frozen', ySplit: options.frozenRows, xSplit: options.frozenColumns ?? 0 }],
  });
  ws.columns = options.widths.map((width) => ({ width }));
  return ws;
}

/** Writes one row and commits it, so a large sheet never sits in memory. */
export function putRow(ws: ExcelJS.Worksheet, rowNumber: number, cells: RowSpec, style: 'header' | 'bold' | 'plain' = 'plain'): void {
  const row = ws.getRow(rowNumber);
  cells.forEach((spec, i) => {
    if (!spec || spec.value === null || spec.value === undefined || spec.value === '') return;
    const cell = row.getCell(i + 1);
    // A string stays a string: exceljs writes it as a text cell, never as a formula.
    cell.value = typeof spec.value === 'string' ? safeText(spec.value) : (spec.value as ExcelJS.CellValue);
    const shared = styleFor(style, spec.numFmt);
    if (shared) cell.style = shared;
  });
  row.commit();
}

const styles = new Map<string, Partial<ExcelJS.Style>>();

// One frozen style object per look: exceljs recognises a style object it has seen and
// skips re-indexing it, which is most of the cost of a 200,000-cell sheet.
function styleFor(kind: 'header' | 'bold' | 'plain', numFmt: string | undefined): Partial<ExcelJS.Style> | undefined {
  if (kind === 'plain' && !numFmt) return undefined;
  const key = `${kind}|${numFmt ?? ''}`;
  let s = styles.get(key);
  if (!s) {
    s = {};
    if (numFmt) s.numFmt = numFmt;
    if (kind !== 'plain') s.font = { bold: true };
    if (kind === 'header') {
      s.fill = HEADER_FILL;
      s.border = HEADER_BORDER;
      s.alignment = { wrapText: true, vertical: 'top' };
    }
    styles.set(key, s);
  }
  return s;
}

export const text = (value: string): CellSpec => ({ value });
export const numberCell = (value: number | null, numFmt: string): CellSpec => ({ value, numFmt });
export const formulaCell = (formula: string, numFmt: string): CellSpec => ({ value: { formula }, numFmt });

/**
 * Lets the zip writer compress and send what has been written every `every` rows, so a
 * large sheet streams out instead of piling up as XML in memory first.
 */
export function yielder(every = 250): () => Promise<void> | undefined {
  let n = 0;
  return () => (++n % every === 0 ? new Promise<void>((resolve) => setImmediate(resolve)) : undefined);
}
