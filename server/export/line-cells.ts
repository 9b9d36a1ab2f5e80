import { Dec, dec, INCOTERM_ADDERS, type PreparedProfile } from '../costing';
import type { AdderName, CostRollLine, DutyBasis, FxRateUsed, Incoterm } from '../costing';

/**
 * One row of the Lines sheet as cells: values where the engine allocated or chose a number
 * (prices, quantities, per-shipment shares, assembly), formulas of the row's own cells where
 * the costing rule is arithmetic (goods = order qty × unit price, each percentage adder,
 * duty on the customs value, landed cost). Every formula is first evaluated here in exact
 * decimal on the same inputs and compared with the engine's figure; a formula that would
 * not reproduce it is written as the engine's value instead and named, so the sheet never
 * disagrees with the API.
 */

export type ColumnFormat = 'text' | 'count' | 'qty' | 'price' | 'fx' | 'percent' | 'money' | 'perUnit';

export interface LineColumn {
  key: LineKey;
  header: string;
  width: number;
  format: ColumnFormat;
}

export const LINE_KEYS = [
  'position', 'refDes', 'kind', 'internalPn', 'mpn', 'maker', 'category', 'qtyPerUnit', 'requiredQty', 'orderQty',
  'excessQty', 'supplier', 'incoterm', 'currency', 'unitPrice', 'fxRate', 'unitPriceReporting', 'goods', 'excessValue',
  'originPct', 'origin', 'freightPct', 'freightShare', 'freight', 'insurancePct', 'insurance', 'customsValue', 'dutyPct',
  'duty', 'fees', 'destinationPct', 'destination', 'assembly', 'costPerUnit', 'oneTimeCost', 'landed', 'landedPerUnit',
  'status', 'warnings', 'note',
] as const;
export type LineKey = (typeof LINE_KEYS)[number];

/** The Lines sheet's columns in order; `cur` is the reporting currency. */
export function lineColumns(cur: string): LineColumn[] {
  const c = (key: LineKey, header: string, width: number, format: ColumnFormat): LineColumn => ({ key, header, width, format });
  return [
    c('position', '#', 6, 'count'),
    c('refDes', 'Ref designators', 18, 'text'),
    c('kind', 'Kind', 10, 'text'),
    c('internalPn', 'Part', 16, 'text'),
    c('mpn', 'MPN', 20, 'text'),
    c('maker', 'Maker', 16, 'text'),
    c('category', 'Category', 12, 'text'),
    c('qtyPerUnit', 'Qty per unit', 11, 'qty'),
    c('requiredQty', 'Required qty', 12, 'count'),
    c('orderQty', 'Order qty', 12, 'count'),
    c('excessQty', 'Excess qty', 11, 'count'),
    c('supplier', 'Supplier', 18, 'text'),
    c('incoterm', 'Incoterm', 9, 'text'),
    c('currency', 'Quote currency', 9, 'text'),
    c('unitPrice', 'Unit price (quote currency)', 14, 'price'),
    c('fxRate', `FX rate to ${cur}`, 13, 'fx'),
    c('unitPriceReporting', `Unit price (${cur})`, 14, 'price'),
    c('goods', `Goods value (${cur})`, 14, 'money'),
    c('excessValue', `Excess value (${cur})`, 13, 'money'),
    c('originPct', 'Origin %', 9, 'percent'),
    c('origin', `Origin (${cur})`, 12, 'money'),
    c('freightPct', 'Freight %', 9, 'percent'),
    c('freightShare', `Freight per-shipment share (${cur})`, 14, 'money'),
    c('freight', `Freight (${cur})`, 12, 'money'),
    c('insurancePct', 'Insurance % (of 110 %)', 11, 'percent'),
    c('insurance', `Insurance (${cur})`, 12, 'money'),
    c('customsValue', `Customs value (${cur})`, 14, 'money'),
    c('dutyPct', 'Duty %', 8, 'percent'),
    c('duty', `Duty (${cur})`, 12, 'money'),
    c('fees', `Fees per-shipment share (${cur})`, 14, 'money'),
    c('destinationPct', 'Destination %', 9, 'percent'),
    c('destination', `Destination (${cur})`, 12, 'money'),
    c('assembly', `Assembly (${cur})`, 12, 'money'),
    c('costPerUnit', `Cost per unit, cost lines (${cur})`, 14, 'perUnit'),
    c('oneTimeCost', `One-time cost (${cur})`, 13, 'money'),
    c('landed', `Landed cost (${cur})`, 14, 'money'),
    c('landedPerUnit', `Landed per unit (${cur})`, 13, 'perUnit'),
    c('status', 'Status', 10, 'text'),
    c('warnings', 'Warnings', 40, 'text'),
    c('note', 'Note', 30, 'text'),
  ];
}

/** Spreadsheet column letters: 1 → A, 27 → AA. */
export function columnLetter(n: number): string {
  let s = '';
  for (let x = n; x > 0; x = Math.floor((x - 1) / 26)) s = String.fromCharCode(65 + ((x - 1) % 26)) + s;
  return s;
}

export const LINE_LETTER: Readonly<Record<LineKey, string>> = Object.fromEntries(
  LINE_KEYS.map((k, i) => [k, columnLetter(i + 1)]),
) as Record<LineKey, string>;

export type CellContent = string | number | Date | null | { formula: string };

/** Where the formulas find the build quantity, the amortisation quantity and each FX rate. */
export interface SheetRefs {
  buildQty: { ref: string; value: Dec };
  amortisationQty: { ref: string; value: Dec };
  /** The Summary cell that holds an FX row used by the cost roll. */
  fxRate(row: FxRateUsed): { ref: string; rate: Dec } | undefined;
}

export interface LineInput {
  line: CostRollLine;
  /** The row number in the Lines sheet. */
  row: number;
  position: number;
  internalPn: string | null;
  mpn: string | null;
  maker: string | null;
  /** The part's category (the engine names none for DNP lines), else the engine's. */
  category: string | null;
  supplierName: string | null;
  /** The line as stored: a cost line's unit cost in its own currency, the user's note. */
  qtyPerUnit: string;
  unitCost: string | null;
  oneTimeCost: string | null;
  costCurrency: string | null;
  note: string;
}

export interface LineRowModel {
  cells: Partial<Record<LineKey, CellContent>>;
  /** Columns written as the engine's value because the formula would not reproduce it. */
  valuesInsteadOfFormulas: LineKey[];
}

/** Money in results has 6 decimals: a formula is right when it is within one unit of the 6th. */
const MONEY_TOLERANCE = new Dec('0.000001');
/**
 * The landed cost adds three figures the engine hands over rounded to 6 decimals (the
 * freight with its share, the fees share, assembly): each may be off by half a unit.
 */
const LANDED_TOLERANCE = new Dec('0.000003');
/**
 * The customs value adds up to four of the line's figures. The freight among them is the
 * engine's figure rounded to 6 decimals (its per-shipment share is taken from it), the
 * insurance is figured on that freight, and the engine rounds the customs value itself: so
 * the sum may be off by half a unit for each term and half a unit more.
 */
const HALF_UNIT = new Dec('0.0000005');
const customsTolerance = (terms: number) => HALF_UNIT.times(terms + 1);
/** Converted unit prices have 10 decimals. */
const PRICE_TOLERANCE = new Dec('0.000000001');
const INSURED_SHARE = '1.1';
const ZERO = new Dec(0);

const STATUS_WORDS: Record<CostRollLine['status'], string> = { costed: 'costed', dnp: 'DNP', left_out: 'left out' };

/** The terms of the customs value by Incoterm and duty basis (costing rules, customs value table). */
function customsTerms(incoterm: Incoterm, basis: DutyBasis): LineKey[] | null {
  switch (incoterm) {
    case 'EXW':
      return basis === 'CIF' ? ['goods', 'origin', 'freight', 'insurance'] : ['goods', 'origin'];
    case 'FCA':
    case 'FAS':
    case 'FOB':
      return basis === 'CIF' ? ['goods', 'freight', 'insurance'] : ['goods'];
    case 'CFR':
    case 'CPT':
      return basis === 'CIF' ? ['goods', 'insurance'] : ['goods'];
    case 'CIF':
    case 'CIP':
    case 'DAP':
    case 'DPU':
      return ['goods'];
    case 'DDP':
      return null;
  }
}

/** The FX rate of a line as a formula over the Summary's rate cells, and its exact value. */
function fxFormula(rows: FxRateUsed[], refs: SheetRefs): { formula: string; value: Dec } | null {
  if (rows.length === 0) return null;
  const nums: string[] = [];
  const dens: string[] = [];
  let value = new Dec(1);
  for (const r of rows) {
    const cell = refs.fxRate(r);
    if (!cell) return null;
    if (r.inverted) {
      dens.push(cell.ref);
      value = value.div(cell.rate);
    } else {
      nums.push(cell.ref);
      value = value.times(cell.rate);
    }
  }
  const num = nums.length ? nums.join('*') : '1';
  const formula = dens.length === 0 ? num : `${num}/${dens.length > 1 ? `(${dens.join('*')})` : dens[0]}`;
  return { formula, value };
}

const num = (d: Dec | null): number | null => (d === null ? null : d.toNumber());

export function lineRow(input: LineInput, profile: PreparedProfile, refs: SheetRefs): LineRowModel {
  const { line, row } = input;
  const at = (k: LineKey) => `${LINE_LETTER[k]}${row}`;
  const cells: LineRowModel['cells'] = {};
  const valuesInsteadOfFormulas: LineKey[] = [];

  const engineValue = (key: LineKey, engine: Dec): Dec => {
    cells[key] = engine.toNumber();
    valuesInsteadOfFormulas.push(key);
    return engine;
  };
  /** Writes `formula` when its exact value matches the engine's figure, else the engine's figure. */
  const formulaCell = (key: LineKey, formula: string, mirror: Dec, engine: Dec, tolerance = MONEY_TOLERANCE): Dec => {
    if (mirror.minus(engine).abs().gt(tolerance)) return engineValue(key, engine);
    cells[key] = { formula };
    return mirror;
  };

  const warningText = line.warnings.map((w) => (w.detail ? `${w.code} (${w.detail})` : w.code)).join('; ');
  Object.assign(cells, {
    position: input.position,
    refDes: line.refDes ?? '',
    kind: line.kind,
    internalPn: input.internalPn ?? '',
    mpn: input.mpn ?? '',
    maker: input.maker ?? '',
    category: input.category ?? line.category,
    qtyPerUnit: Number(input.qtyPerUnit),
    requiredQty: line.requiredQty,
    orderQty: line.orderQty,
    excessQty: line.excessQty,
    supplier: input.supplierName ?? '',
    incoterm: line.incoterm ?? '',
    currency: line.unitPriceCurrency ?? '',
    unitPrice: line.unitPrice === null ? null : Number(line.unitPrice),
    status: STATUS_WORDS[line.status],
    warnings: warningText,
    note: input.note,
  } satisfies Partial<Record<LineKey, CellContent>>);

  const N = refs.buildQty;
  if (line.status !== 'costed') {
    // Left out or DNP: listed with zero cost, the reason in the warnings column.
    for (const k of ['goods', 'origin', 'freight', 'insurance', 'duty', 'fees', 'destination', 'assembly', 'landed', 'landedPerUnit'] as const) {
      cells[k] = 0;
    }
    return { cells, valuesInsteadOfFormulas };
  }

  // The rate to the reporting currency: 1, a formula over the Summary's FX table, or (for
  // a row missing from that table, which the roll's list of rates rules out) unknown.
  const price = line.kind === 'part' ? (line.unitPrice === null ? null : dec(line.unitPrice)) : input.unitCost === null ? null : dec(input.unitCost);
  const fx = fxFormula(line.fxRates, refs);
  let rate: Dec | null = null;
  if (fx) {
    cells.fxRate = { formula: fx.formula };
    rate = fx.value;
  } else if (line.fxRates.length === 0) {
    cells.fxRate = 1;
    rate = new Dec(1);
  }

  if (line.kind !== 'part') {
    cells.currency = (input.costCurrency ?? '').toUpperCase();
    cells.unitPrice = num(price);
    if (rate) cells.unitPriceReporting = { formula: `${at('unitPrice')}*${at('fxRate')}` };
    const engineCost = dec(line.costPerUnit ?? '0');
    const costPerUnit = rate
      ? formulaCell('costPerUnit', `${at('qtyPerUnit')}*${at('unitPriceReporting')}`, dec(input.qtyPerUnit).times(price ?? ZERO).times(rate), engineCost)
      : engineValue('costPerUnit', engineCost);
    // The one-time amount converted at full precision, as the engine does (its output has 6 decimals).
    const engineOneTime = dec(line.oneTimeCost ?? '0');
    const exactOneTime = input.oneTimeCost === null || !rate ? ZERO : dec(input.oneTimeCost).times(rate);
    const oneTime = exactOneTime.minus(engineOneTime).abs().lte(MONEY_TOLERANCE) ? exactOneTime : engineOneTime;
    cells.oneTimeCost = oneTime.toNumber();
    const landed = formulaCell(
      'landed',
      `${at('costPerUnit')}*${N.ref}+${at('oneTimeCost')}*${N.ref}/${refs.amortisationQty.ref}`,
      costPerUnit.times(N.value).plus(oneTime.times(N.value).div(refs.amortisationQty.value)),
      dec(line.landed),
      LANDED_TOLERANCE,
    );
    formulaCell('landedPerUnit', `${at('landed')}/${N.ref}`, landed.div(N.value), dec(line.landedPerUnit), LANDED_TOLERANCE);
    return { cells, valuesInsteadOfFormulas };
  }

  const incoterm = line.incoterm!;
  const needs = (a: AdderName) => INCOTERM_ADDERS[incoterm][a];
  const converted = dec(line.unitPriceConverted!);
  let upr: Dec;
  if (price !== null && rate && price.times(rate).minus(converted).abs().lte(PRICE_TOLERANCE)) {
    cells.unitPriceReporting = { formula: `${at('unitPrice')}*${at('fxRate')}` };
    upr = price.times(rate);
  } else {
    cells.fxRate = price && !price.isZero() ? converted.div(price).toNumber() : null;
    upr = engineValue('unitPriceReporting', converted);
  }

  const G = formulaCell('goods', `${at('orderQty')}*${at('unitPriceReporting')}`, upr.times(line.orderQty!), dec(line.goodsValue));
  formulaCell('excessValue', `${at('excessQty')}*${at('unitPriceReporting')}`, upr.times(line.excessQty!), dec(line.excessValue));

  const pct = (a: 'origin' | 'freight' | 'insurance' | 'destination', key: LineKey): Dec => {
    const p = needs(a) ? profile.pct[a] : ZERO;
    cells[key] = p.toNumber();
    return p;
  };
  const originPct = pct('origin', 'originPct');
  const O = formulaCell('origin', `${at('originPct')}*${at('goods')}`, originPct.times(G), dec(line.origin));

  const freightPct = pct('freight', 'freightPct');
  // The per-shipment share is what the engine's freight holds beyond the percentage.
  const rawShare = needs('freight') ? dec(line.freight).minus(freightPct.times(G)) : ZERO;
  const share = rawShare.abs().lte(MONEY_TOLERANCE) ? ZERO : rawShare;
  cells.freightShare = share.toNumber();
  const F = formulaCell('freight', `${at('freightPct')}*${at('goods')}+${at('freightShare')}`, freightPct.times(G).plus(share), dec(line.freight));

  const insurancePct = pct('insurance', 'insurancePct');
  const I = formulaCell(
    'insurance',
    `${at('insurancePct')}*${INSURED_SHARE}*(${at('goods')}+${at('origin')}+${at('freight')})`,
    insurancePct.times(INSURED_SHARE).times(G.plus(O).plus(F)),
    dec(line.insurance),
  );

  const terms = customsTerms(incoterm, profile.dutyBasis);
  const parts: Record<string, Dec> = { goods: G, origin: O, freight: F, insurance: I };
  let CV = ZERO;
  let cvTolerance = ZERO;
  if (terms && line.customsValue !== null) {
    cvTolerance = customsTolerance(terms.length);
    CV = formulaCell('customsValue', terms.map(at).join('+'), terms.reduce((s, k) => s.plus(parts[k]), ZERO), dec(line.customsValue), cvTolerance);
  } else if (line.customsValue !== null) {
    CV = engineValue('customsValue', dec(line.customsValue));
  }
  const dutyPct = needs('duty') && line.customsValue !== null ? dec(line.dutyPct ?? '0').div(100) : ZERO;
  cells.dutyPct = dutyPct.toNumber();
  // The duty carries the customs value's leeway at its rate.
  const D = formulaCell('duty', `${at('dutyPct')}*${at('customsValue')}`, dutyPct.times(CV), dec(line.duty), MONEY_TOLERANCE.plus(dutyPct.times(cvTolerance)));

  const fees = dec(line.fees);
  cells.fees = fees.toNumber();
  const destinationPct = pct('destination', 'destinationPct');
  const dest = formulaCell('destination', `${at('destinationPct')}*${at('goods')}`, destinationPct.times(G), dec(line.destination));
  const assembly = dec(line.assembly);
  cells.assembly = assembly.toNumber();

  const landedKeys: LineKey[] = ['goods', 'origin', 'freight', 'insurance', 'duty', 'fees', 'destination', 'assembly'];
  const landed = formulaCell(
    'landed',
    landedKeys.map(at).join('+'),
    [G, O, F, I, D, fees, dest, assembly].reduce((s, x) => s.plus(x), ZERO),
    dec(line.landed),
    LANDED_TOLERANCE,
  );
  formulaCell('landedPerUnit', `${at('landed')}/${N.ref}`, landed.div(N.value), dec(line.landedPerUnit), LANDED_TOLERANCE);
  return { cells, valuesInsteadOfFormulas };
}
