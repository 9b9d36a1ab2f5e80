import { Dec, type FxRateUsed } from '../costing';
import type { ExportData } from './load';
import { DATE_FORMAT, COUNT_FORMAT, FX_FORMAT, PER_UNIT_FORMAT, moneyFormat } from './formats';
import { LINE_LETTER, type LineKey, type SheetRefs } from './line-cells';
import { formulaCell, numberCell, text, type RowSpec } from './sheet-rows';

export const SUMMARY_SHEET = 'Summary';
export const LINES_SHEET = 'Lines';

export interface SummaryRow {
  cells: RowSpec;
  style?: 'header' | 'bold';
}

export interface SummaryLayout {
  rows: SummaryRow[];
  refs: SheetRefs;
}

const STATE_WORDS: Record<string, string> = { draft: 'Draft', in_review: 'In review', released: 'Released' };

/** A date string as a spreadsheet date (UTC midnight, so the serial number is exact). */
export const dateCell = (iso: string) => ({ value: new Date(`${iso}T00:00:00Z`), numFmt: DATE_FORMAT });

const fxKey = (r: Pick<FxRateUsed, 'date' | 'base' | 'quote'>) => `${r.date}|${r.base}|${r.quote}`;

/**
 * The Summary sheet: what was costed and how (BOM, revision, state, quantity, date,
 * currency, profile), the totals as formulas over the Lines sheet's columns, landed cost
 * per unit = total / the build quantity cell, the gap to target, and the FX rows used.
 * The build quantity, amortisation quantity and FX rate cells are what the Lines formulas
 * refer to, so a reader can change one and watch the sheet follow.
 */
export function summarySheet(d: ExportData, linesLastRow: number): SummaryLayout {
  const { bom, cost } = d;
  const cur = cost.currency;
  const money = moneyFormat(cur);
  const rows: SummaryRow[] = [];
  const add = (cells: RowSpec, style?: SummaryRow['style']) => {
    rows.push({ cells, style });
    return rows.length;
  };
  const abs = (col: string, row: number) => `${SUMMARY_SHEET}!$${col}$${row}`;
  // An empty Lines sheet still gets a valid range.
  const last = Math.max(2, linesLastRow);
  const sum = (k: LineKey) => `SUM(${LINES_SHEET}!$${LINE_LETTER[k]}$2:$${LINE_LETTER[k]}$${last})`;

  add([text('Item'), text('Value'), text(`Per unit (${cur})`)], 'header');
  add([text('BOM'), text(bom.name)]);
  add([text('Revision'), numberCell(bom.revision, COUNT_FORMAT)]);
  add([text('State'), text(STATE_WORDS[bom.state] ?? bom.state)]);
  const qtyRow = add([text('Build quantity'), numberCell(cost.qty, COUNT_FORMAT)]);
  const amortisation = bom.amortisationQty;
  const amortRow = add([
    text('One-time costs amortised over (units)'),
    amortisation === null ? formulaCell(`B${qtyRow}`, COUNT_FORMAT) : numberCell(amortisation, COUNT_FORMAT),
  ]);
  add([text('Costing date'), dateCell(cost.date)]);
  add([text('Reporting currency'), text(cur)]);
  add([text('Landed-cost profile'), text(cost.profileName ?? 'none (no adders)')]);
  add([text('Lines'), numberCell(cost.lines.length, COUNT_FORMAT)]);
  add([text('Lines left out of the totals'), numberCell(cost.leftOut.count, COUNT_FORMAT)]);
  if (d.stress) {
    const s = d.stress.summary;
    add([
      text(`Stress check (${d.stress.policyName})`),
      text(`${s.clear} clear, ${s.close} close, ${s.beyondPolicy} beyond policy, ${s.overRating} over rating, ${s.needsData} need data`),
    ]);
  }
  add([]);

  add([text(`Totals (${cur})`), text('This build'), text('Per unit')], 'bold');
  const perUnit = (row: number) => formulaCell(`B${row}/$B$${qtyRow}`, PER_UNIT_FORMAT);
  const total = (label: string, formula: string, style?: SummaryRow['style']) => {
    const row = rows.length + 1;
    add([text(label), formulaCell(formula, money), perUnit(row)], style);
    return row;
  };
  total('Goods', sum('goods'));
  total('Origin', sum('origin'));
  total('Freight', sum('freight'));
  total('Insurance', sum('insurance'));
  total('Duty', sum('duty'));
  total('Fees', sum('fees'));
  total('Destination', sum('destination'));
  total('Assembly', sum('assembly'));
  total('Cost lines (per-unit costs × build quantity)', `${sum('costPerUnit')}*$B$${qtyRow}`);
  total('One-time costs, share of this build', `${sum('oneTimeCost')}*$B$${qtyRow}/$B$${amortRow}`);
  const landedRow = total('Landed cost', sum('landed'), 'bold');
  const target = cost.totals.targetUnitCost;
  const targetRow = add([text('Target unit cost'), undefined, target === null ? text('not set') : numberCell(Number(target), PER_UNIT_FORMAT)]);
  add([
    text('Gap to target (per unit − target; positive is over)'),
    undefined,
    target === null ? undefined : formulaCell(`C${landedRow}-C${targetRow}`, PER_UNIT_FORMAT),
  ]);
  add([text('Excess value (bought beyond need; inside goods)'), formulaCell(sum('excessValue'), money), perUnit(rows.length + 1)]);
  add([text('One-time costs, whole amount'), formulaCell(sum('oneTimeCost'), money)]);
  add([]);

  add([text('FX rates used'), text('Base'), text('Quote'), text('Rate (1 base = rate quote)')], 'bold');
  const fx = new Map<string, { ref: string; rate: Dec }>();
  for (const r of cost.fxRates) {
    const row = add([dateCell(r.date), text(r.base), text(r.quote), numberCell(Number(r.rate), FX_FORMAT)]);
    fx.set(fxKey(r), { ref: abs('D', row), rate: new Dec(r.rate) });
  }
  if (cost.fxRates.length === 0) add([text('none: every amount is in the reporting currency')]);

  return {
    rows,
    refs: {
      buildQty: { ref: abs('B', qtyRow), value: new Dec(cost.qty) },
      amortisationQty: { ref: abs('B', amortRow), value: new Dec(amortisation ?? cost.qty) },
      fxRate: (r) => fx.get(fxKey(r)),
    },
  };
}
