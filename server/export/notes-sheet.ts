import type ExcelJS from 'exceljs';
import { CAUTION } from '../derating';
import type { ExportData } from './load';
import type { ValueInsteadOfFormula } from './lines-sheet';
import { addSheet, putRow, text } from './sheet-rows';

const LEFT_OUT_WORDS: Record<string, string> = {
  no_part: 'no part in the library',
  no_quote: 'no eligible quote',
  no_cost: 'a cost line without a cost',
  missing_fx: 'no FX rate to the reporting currency',
  missing_weight: 'the part has no unit weight (freight is shared by weight)',
};

/**
 * The Notes sheet: the safety caution, how to read the workbook, every warning of the
 * cost roll and of each line, the lines left out of the totals and why, DNP lines, and
 * any formula written as a value.
 */
export function writeNotesSheet(wb: ExcelJS.stream.xlsx.WorkbookWriter, d: ExportData, valuesInstead: ValueInsteadOfFormula[]): void {
  const { cost, data } = d;
  const ws = addSheet(wb, 'Notes', { widths: [18, 110], frozenRows: 1 });
  putRow(ws, 1, [text('Topic'), text('Note')], 'header');
  let row = 1;
  const note = (topic: string, body: string) => putRow(ws, ++row, [text(topic), text(body)]);
  const position = new Map(cost.lines.map((l, i) => [l.lineId, i + 1]));
  const byId = new Map(cost.lines.map((l) => [l.lineId, l]));
  const label = (refDes: string | null, lineId: string) => {
    const pos = position.get(lineId) ?? 0;
    return refDes ? `${refDes} (line ${pos})` : `line ${pos}`;
  };

  for (const sentence of CAUTION) note('Safety', sentence);
  note('Reading this file', 'Cells hold full-precision figures; the number formats round them: unit prices to 6 decimals, per-unit figures to 4, totals to the currency\'s ISO 4217 minor unit.');
  note('Reading this file', 'Summary totals are formulas over the Lines sheet. On each line, goods value, the percentage adders, duty and landed cost are formulas of that row\'s own cells; FX rates refer to the table on the Summary sheet.');
  const byWeight = data.input.profile.freightBasis === 'weight';
  note('Reading this file', `Per-shipment freight and fees are shared out by Farthing over the lines whose Incoterm carries them (freight by ${byWeight ? 'weight' : 'goods value'}, fees by goods value) and written as values.`);
  note('Reading this file', 'The Offers sheet prices every quote at the line\'s required quantity with the percentage adders and duty only; per-shipment amounts are shared in the cost roll.');

  for (const w of cost.warnings) note('Cost roll warning', w.detail ? `${w.code}: ${w.detail}` : w.code);
  for (const l of cost.leftOut.lines) {
    note('Left out of totals', `${label(l.refDes, l.lineId)}: ${LEFT_OUT_WORDS[l.reason] ?? l.reason}${l.detail ? ` (${l.detail})` : ''}`);
  }
  for (const id of cost.dnp.lineIds) {
    note('Do not place', `${label(byId.get(id)?.refDes ?? null, id)}: listed, neither bought nor assembled`);
  }
  for (const l of cost.lines) {
    if (l.status === 'left_out') continue;
    for (const w of l.warnings) note('Line warning', `${label(l.refDes, l.lineId)}: ${w.code}${w.detail ? ` (${w.detail})` : ''}`);
  }
  for (const v of valuesInstead) {
    note('Written as values', `${v.refDes ? `${v.refDes} (line ${v.position})` : `line ${v.position}`}: ${v.columns.join(', ')} hold Farthing's figure because the formula would not reproduce it`);
  }
  if (d.stressProblem) note('Stress check', d.stressProblem);
  ws.autoFilter = `A1:B${row}`;
  ws.commit();
}
