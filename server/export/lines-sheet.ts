import type ExcelJS from 'exceljs';
import { prepareProfile } from '../costing';
import type { ExportData } from './load';
import { COUNT_FORMAT, FX_FORMAT, PERCENT_FORMAT, PER_UNIT_FORMAT, PRICE_FORMAT, QTY_FORMAT, moneyFormat } from './formats';
import { lineColumns, lineRow, LINE_LETTER, type ColumnFormat, type LineKey, type SheetRefs } from './line-cells';
import { addSheet, putRow, text, yielder } from './sheet-rows';
import { LINES_SHEET } from './summary-sheet';

/** A line whose formulas had to be written as values, for the Notes sheet. */
export interface ValueInsteadOfFormula {
  refDes: string;
  position: number;
  columns: LineKey[];
}

/**
 * The Lines sheet: one row per BOM line (part lines, cost lines, DNP and left-out lines),
 * header frozen, autofilter over the whole table. Rows are built and committed one at a
 * time. Returns the lines whose formulas could not reproduce the engine.
 */
export async function writeLinesSheet(wb: ExcelJS.stream.xlsx.WorkbookWriter, d: ExportData, refs: SheetRefs): Promise<ValueInsteadOfFormula[]> {
  const { cost, data } = d;
  const columns = lineColumns(cost.currency);
  const formats: Record<ColumnFormat, string | undefined> = {
    text: undefined, count: COUNT_FORMAT, qty: QTY_FORMAT, price: PRICE_FORMAT, fx: FX_FORMAT,
    percent: PERCENT_FORMAT, money: moneyFormat(cost.currency), perUnit: PER_UNIT_FORMAT,
  };
  const ws = addSheet(wb, LINES_SHEET, { widths: columns.map((c) => c.width), frozenRows: 1, frozenColumns: 2 });
  const lastRow = cost.lines.length + 1;
  ws.autoFilter = `A1:${LINE_LETTER[columns[columns.length - 1].key]}${lastRow}`;
  putRow(ws, 1, columns.map((c) => text(c.header)), 'header');

  const profile = prepareProfile(data.input.profile);
  const stored = new Map(data.lines.map((l) => [l.id, l]));
  const parts = new Map(data.parts.map((p) => [p.id, p]));
  const written: ValueInsteadOfFormula[] = [];
  const pause = yielder();
  for (const [i, line] of cost.lines.entries()) {
    await pause();
    const row = i + 2;
    const src = stored.get(line.lineId);
    const part = line.partId ? parts.get(line.partId) : undefined;
    const model = lineRow(
      {
        line,
        row,
        position: i + 1,
        internalPn: line.internalPn ?? src?.unresolved ?? null,
        mpn: line.mpn,
        maker: part?.manufacturer ?? null,
        category: part?.category ?? null,
        supplierName: line.supplierName,
        qtyPerUnit: src?.qtyPerUnit ?? '1',
        unitCost: src?.unitCost ?? null,
        oneTimeCost: src?.oneTimeCost ?? null,
        costCurrency: src?.currency ?? cost.currency,
        note: src?.note ?? '',
      },
      profile,
      refs,
    );
    putRow(ws, row, columns.map((c) => {
      const value = model.cells[c.key];
      return value === undefined ? undefined : { value, numFmt: typeof value === 'string' ? undefined : formats[c.format] };
    }));
    if (model.valuesInsteadOfFormulas.length) {
      written.push({ refDes: line.refDes ?? '', position: i + 1, columns: model.valuesInsteadOfFormulas });
    }
  }
  ws.commit();
  return written;
}
