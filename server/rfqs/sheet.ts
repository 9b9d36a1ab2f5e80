import ExcelJS from 'exceljs';
import { errors } from '../http/errors';
import type { UploadedFile } from '../http/upload';
import { readTable } from '../imports/read-table';
import { rfqAnswerBody, type RfqAnswerBody } from '../../src/shared/schemas/rfqs';
import type { SupplierItem } from './service';

const BREAKS = 4;
const header = ['Item', 'Internal PN', 'MPN', 'Description', 'Currency', 'Incoterm', 'MOQ', 'Order multiple', 'Lead time (days)', 'Valid until (YYYY-MM-DD)',
  ...Array.from({ length: BREAKS }, (_, i) => [`Qty ${i + 1}`, `Unit price ${i + 1}`]).flat(), 'Decline (yes/no)'];

/** The answer sheet a supplier may download, fill and upload instead of the form. */
export async function answerSheet(view: { title: string; quantities: number[]; defaultCurrency: string; defaultIncoterm: string; items: SupplierItem[] }): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Farthing';
  const ws = wb.addWorksheet('Quotation', { views: [{ state: 'frozen', ySplit: 1 }] });
  ws.addRow(header).font = { bold: true };
  for (const item of view.items) {
    const breaks = Array.from({ length: BREAKS }, (_, i) => [view.quantities[i] ?? null, null]).flat();
    // Text cells are set as plain strings: part text never becomes a formula.
    ws.addRow([item.itemId, item.internalPn, item.mpn, item.description, view.defaultCurrency, view.defaultIncoterm, null, null, null, null, ...breaks, 'no']);
  }
  ws.columns.forEach((c, i) => (c.width = i === 3 ? 36 : 14));
  ws.autoFilter = { from: 'A1', to: { row: 1, column: header.length } };
  return Buffer.from(await wb.xlsx.writeBuffer());
}

const yes = (s: string) => /^(y|yes|true|1|x|decline|declined)$/i.test(s.trim());
const int = (s: string) => (/^\d+$/.test(s.replace(/[,\s_]/g, '')) ? Number(s.replace(/[,\s_]/g, '')) : NaN);

/** Reads a filled sheet back into the same answer the form sends; each problem names its row. */
export async function readAnswerSheet(file: UploadedFile): Promise<RfqAnswerBody> {
  const table = await readTable(file);
  const col = (name: string) => table.columns.findIndex((c) => c.toLowerCase().startsWith(name.toLowerCase()));
  const at = { item: col('Item'), ccy: col('Currency'), inc: col('Incoterm'), moq: col('MOQ'), mult: col('Order multiple'), lead: col('Lead time'), until: col('Valid until'), decline: col('Decline') };
  if (Object.values(at).some((i) => i < 0)) throw errors.validation('This is not the answer sheet of this request: download it again.', [{ path: 'file', message: 'unexpected columns' }]);
  const items: unknown[] = [];
  const rows: number[] = [];
  table.rows.forEach((r, k) => {
    const itemId = r[at.item];
    if (!itemId) return;
    const breaks = Array.from({ length: BREAKS }, (_, i) => ({ q: r[col(`Qty ${i + 1}`)] ?? '', p: r[col(`Unit price ${i + 1}`)] ?? '' }))
      .filter((b) => b.p !== '')
      .map((b) => ({ minQty: int(b.q), unitPrice: b.p }));
    const declined = yes(r[at.decline] ?? '');
    if (!declined && !breaks.length) return; // left empty: not answered
    rows.push(k + 2);
    items.push(declined ? { itemId, declined: true } : {
      itemId, declined: false, currency: r[at.ccy], incoterm: (r[at.inc] ?? '').toUpperCase(), moq: int(r[at.moq] || '1'), orderMultiple: int(r[at.mult] || '1'),
      leadTimeDays: int(r[at.lead]), validUntil: r[at.until], priceBreaks: breaks,
    });
  });
  const parsed = rfqAnswerBody.safeParse({ items });
  if (!parsed.success) {
    throw errors.validation('The sheet has problems; nothing was saved.', parsed.error.issues.map((i) => {
      const [, index, ...rest] = i.path;
      return { path: typeof index === 'number' ? `row ${rows[index]}${rest.length ? '.' + rest.join('.') : ''}` : 'file', message: i.message };
    }));
  }
  return parsed.data;
}
