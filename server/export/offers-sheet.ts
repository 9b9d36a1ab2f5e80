import type ExcelJS from 'exceljs';
import { createFxIndex, quoteBoard, type Offer, type Quote } from '../costing';
import type { ExportData } from './load';
import { COUNT_FORMAT, PRICE_FORMAT, moneyFormat } from './formats';
import { addSheet, numberCell, putRow, text, yielder, type RowSpec } from './sheet-rows';

const REASON_WORDS: Record<string, string> = {
  expired: 'expired',
  not_yet_valid: 'not yet valid',
  inactive_supplier: 'supplier inactive',
  lead_time: 'lead time over the profile maximum',
  missing_fx: 'no FX rate to the reporting currency',
};

const num = (s: string | null) => (s === null ? null : Number(s));

/**
 * The Offers sheet: for every part line, every quote for its part as the quote board
 * prices it at the line's required quantity (percentage adders and duty, no per-shipment
 * shares), with the one the cost roll chose marked. Boards are computed once per part and
 * quantity from the data already read, with one FX index for all of them.
 */
export async function writeOffersSheet(wb: ExcelJS.stream.xlsx.WorkbookWriter, d: ExportData): Promise<void> {
  const { cost, data } = d;
  const cur = cost.currency;
  const money = moneyFormat(cur);
  const headers = [
    'Ref designators', 'Part', 'MPN', 'Required qty', 'Supplier', 'Incoterm', 'Lead time (days)', 'Quote currency',
    'Unit price (quote currency)', `Unit price (${cur})`, 'Order qty', 'Excess qty', `Goods value (${cur})`,
    `Landed with % adders and duty (${cur})`, `Landed per piece needed (${cur})`, 'Eligible', 'Why not eligible',
    'Chosen for the line', 'Cheapest eligible',
  ];
  const ws = addSheet(wb, 'Offers', { widths: [18, 16, 20, 12, 18, 9, 10, 9, 14, 14, 12, 11, 14, 16, 14, 9, 26, 10, 10], frozenRows: 1, frozenColumns: 1 });
  putRow(ws, 1, headers.map(text), 'header');

  const fx = createFxIndex(data.input.fxRates, { pivot: data.input.pivot });
  const quotesByPart = new Map<string, Quote[]>();
  for (const q of data.input.quotes) {
    let list = quotesByPart.get(q.partId);
    if (!list) quotesByPart.set(q.partId, (list = []));
    list.push(q);
  }
  const parts = new Map(data.parts.map((p) => [p.id, p]));
  const suppliers = new Map(data.input.suppliers.map((s) => [s.id, s.name ?? '']));
  const boards = new Map<string, ReturnType<typeof quoteBoard>>();

  let row = 1;
  const pause = yielder();
  for (const line of cost.lines) {
    await pause();
    if (!line.partId || line.status === 'dnp' || line.requiredQty === null) continue;
    const part = parts.get(line.partId);
    const quotes = quotesByPart.get(line.partId) ?? [];
    if (!part) continue;
    if (quotes.length === 0) {
      putRow(ws, ++row, [text(line.refDes ?? ''), text(part.internalPn), text(part.mpn), numberCell(line.requiredQty, COUNT_FORMAT), text('no quote for this part')]);
      continue;
    }
    const key = `${line.partId}|${line.requiredQty}`;
    let board = boards.get(key);
    if (!board) {
      board = quoteBoard(
        {
          partId: line.partId, qty: line.requiredQty, date: cost.date, currency: cur, profile: data.input.profile,
          part: { hsCode: part.hsCode }, quotes, suppliers: data.input.suppliers, fxRates: data.input.fxRates, pivot: data.input.pivot,
        },
        fx,
      );
      boards.set(key, board);
    }
    for (const o of board.offers) putRow(ws, ++row, offerRow(line.refDes ?? '', part, line.requiredQty, o, line.quoteId, board.cheapestQuoteId, suppliers, money));
  }
  ws.autoFilter = `A1:S${Math.max(row, 1)}`;
  ws.commit();
}

function offerRow(
  refDes: string,
  part: { internalPn: string; mpn: string },
  required: number,
  o: Offer,
  chosenId: string | null,
  cheapestId: string | null,
  suppliers: Map<string, string>,
  money: string,
): RowSpec {
  return [
    text(refDes),
    text(part.internalPn),
    text(part.mpn),
    numberCell(required, COUNT_FORMAT),
    text(suppliers.get(o.supplierId) ?? ''),
    text(o.incoterm),
    numberCell(o.leadTimeDays, COUNT_FORMAT),
    text(o.unitPriceCurrency),
    numberCell(num(o.unitPrice), PRICE_FORMAT),
    numberCell(num(o.unitPriceConverted), PRICE_FORMAT),
    numberCell(o.orderQty, COUNT_FORMAT),
    numberCell(o.excessQty, COUNT_FORMAT),
    numberCell(num(o.goodsValue), money),
    numberCell(num(o.landed), money),
    numberCell(num(o.landedPerPiece), PRICE_FORMAT),
    text(o.eligible ? 'yes' : 'no'),
    text(o.reasons.map((r) => REASON_WORDS[r] ?? r).join('; ')),
    text(o.quoteId === chosenId ? 'chosen' : ''),
    text(o.quoteId === cheapestId ? 'yes' : ''),
  ];
}
