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
    if (!spec || spec.value === null || spec.value === undefined) return;
    const cell = row.getCell(i + 1);
    // A string stays a string: exceljs writes it as a text cell, never as a formula.
    cell.value = typeof spec.value === 'string' ? safeText(spec.value) : (spec.value as ExcelJS.CellValue);
    if (spec.numFmt) cell.numFmt = spec.numFmt;
    if (style !== 'plain') cell.font = { bold: true };
    if (style === 'header') {
      cell.fill = HEADER_FILL;
      cell.border = HEADER_BORDER;
      cell.alignment = { wrapText: true, vertical: 'top' };
    }
  });
  row.commit();
}

export const text = (value: string): CellSpec => ({ value });
export const numberCell = (value: number | null, numFmt: string): CellSpec => ({ value, numFmt });
export const formulaCell = (formula: string, numFmt: string): CellSpec => ({ value: { formula }, numFmt });
