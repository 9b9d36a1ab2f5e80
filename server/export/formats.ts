import { minorUnits } from '../costing';

/**
 * Number formats of the costed BOM workbook, per the costing rules: unit prices to 6
 * decimals, per-unit figures to 4, extended totals to the reporting currency's ISO 4217
 * minor unit. Cells hold the engine's unrounded numbers; only the format rounds.
 */
export const PRICE_FORMAT = '#,##0.000000';
export const PER_UNIT_FORMAT = '#,##0.0000';
export const PERCENT_FORMAT = '0.00##%';
export const RATIO_FORMAT = '0.0%';
export const COUNT_FORMAT = '#,##0';
export const QTY_FORMAT = '#,##0.######';
export const FX_FORMAT = '0.0000######';
export const DATE_FORMAT = 'yyyy-mm-dd';

/** `#,##0.00` for USD, `#,##0` for JPY, `#,##0.000` for KWD; 2 digits for a code we do not know. */
export function moneyFormat(currency: string): string {
  const digits = minorUnits(currency) ?? 2;
  return digits === 0 ? '#,##0' : `#,##0.${'0'.repeat(digits)}`;
}

// Characters XML 1.0 cannot carry at all; a cell holding one would corrupt the file.
// eslint-disable-next-line no-control-regex
const NOT_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g;
/** The most characters a spreadsheet cell holds. */
const CELL_MAX = 32767;

/**
 * Text typed by users (ref designators, notes, names) as a plain text cell. The value stays
 * a string, so exceljs writes it as a text cell and never as a formula, whatever it starts
 * with (`=`, `+`, `-`, `@`, tab, carriage return): nothing is prefixed or changed except
 * characters XML cannot hold, and text beyond a cell's limit.
 */
export function safeText(value: string | null | undefined): string {
  if (value === null || value === undefined) return '';
  const clean = value.replace(NOT_XML, '');
  return clean.length > CELL_MAX ? clean.slice(0, CELL_MAX) : clean;
}
