import type { Writable } from 'node:stream';
import ExcelJS from 'exceljs';
import type { ExportData } from './load';
import { summarySheet, SUMMARY_SHEET } from './summary-sheet';
import { writeLinesSheet } from './lines-sheet';
import { writeOffersSheet } from './offers-sheet';
import { writeStressSheet } from './stress-sheet';
import { writeNotesSheet } from './notes-sheet';
import { addSheet, putRow } from './sheet-rows';

/**
 * Streams the costed BOM workbook (Summary, Lines, Offers, Stress, Notes) to `out` with
 * exceljs's streaming writer: rows are committed as they are written, so a BOM of many
 * thousand lines never sits in memory as a workbook. Resolves when `out` has finished.
 */
export async function writeCostedBom(out: Writable, d: ExportData, now = new Date()): Promise<void> {
  // A reader who goes away never lets `out` finish: stop waiting for it then.
  let onClose = () => {};
  const closed = new Promise<never>((_, reject) => {
    onClose = () => {
      if (!out.writableFinished) reject(new Error('the output closed before the workbook was written'));
    };
    out.once('close', onClose);
    if (out.destroyed) onClose();
  });
  closed.catch(() => undefined);
  try {
    const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: out, useStyles: true, useSharedStrings: true });
    wb.creator = 'Farthing';
    wb.lastModifiedBy = 'Farthing';
    wb.title = `${d.bom.name} rev ${d.bom.revision} costed BOM`;
    wb.subject = `Landed cost at ${d.cost.qty} units, ${d.cost.currency}, costed on ${d.cost.date}`;
    wb.created = now;
    wb.modified = now;

    const summary = summarySheet(d, d.cost.lines.length + 1);
    const ws = addSheet(wb, SUMMARY_SHEET, { widths: [46, 24, 16, 26], frozenRows: 1 });
    summary.rows.forEach((r, i) => putRow(ws, i + 1, r.cells, r.style ?? 'plain'));
    ws.commit();

    const valuesInstead = await writeLinesSheet(wb, d, summary.refs);
    await writeOffersSheet(wb, d);
    writeStressSheet(wb, d);
    writeNotesSheet(wb, d, valuesInstead);
    await Promise.race([wb.commit(), closed]);
  } finally {
    out.off('close', onClose);
  }
}
