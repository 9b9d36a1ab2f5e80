import Decimal from 'decimal.js';
import { compareDecimal, formatDecimal, formatMoney } from '../../lib/money';
import type { BomState } from '../../shared/schemas/boms';

/**
 * How the BOM screens show the engine's numbers. The API sends decimal strings (money to
 * 6 decimals, per-unit figures to 10); these helpers only round for display, half-up,
 * and never turn money into binary floats.
 */

/** Per-unit figures (landed cost per unit, target, gap) to 4 decimals, as the costing rules ask. */
export const PER_UNIT_PLACES = 4;

export function formatPerUnit(value: string | null | undefined): string {
  if (value === null || value === undefined || value === '') return '—';
  return formatDecimal(value, PER_UNIT_PLACES);
}

/** Extended totals in their currency's minor unit (2 for GBP, USD, EUR, CNY). */
export function formatTotal(value: string | null | undefined, currency: string): string {
  if (value === null || value === undefined || value === '') return '—';
  return formatMoney(value, currency);
}

/** A whole count with thousands grouped (order quantities, build quantities). */
export function formatCount(value: number | null | undefined): string {
  if (value === null || value === undefined) return '—';
  return formatDecimal(value, 0);
}

const D = Decimal.clone({ precision: 40 });

/** a − b of two decimal strings, exactly (the BOM list's gap to target); null when either is not a number. */
export function subtractDecimal(a: string, b: string): string | null {
  try {
    return new D(a).minus(new D(b)).toFixed();
  } catch {
    return null;
  }
}

export type Gap = { side: 'over' | 'under' | 'on'; amount: string };

/**
 * A signed gap (computed minus allowed or target: positive costs too much) as words and
 * an unsigned amount, so the screen never relies on a minus sign or a colour alone.
 * Exactly zero at display precision reads "on".
 */
export function describeGap(gap: string | null | undefined, places = PER_UNIT_PLACES): Gap | null {
  if (gap === null || gap === undefined || gap === '') return null;
  const shown = formatDecimal(gap, places);
  if (!/[1-9]/.test(shown)) return { side: 'on', amount: formatDecimal('0', places) };
  return { side: compareDecimal(gap, '0') > 0 ? 'over' : 'under', amount: shown.replace(/^[−-]/, '') };
}

/** "0.0123 over target", "0.0040 under target", "on target". */
export function gapText(gap: Gap | null, what: string, currency?: string): string {
  if (!gap) return `no ${what} set`;
  if (gap.side === 'on') return `on ${what}`;
  return `${gap.amount}${currency ? ` ${currency}` : ''} ${gap.side} ${what}`;
}

export const bomStateLabels: Record<BomState, string> = {
  draft: 'Draft',
  in_review: 'In review',
  released: 'Released',
};

/** The engine's warning codes in words (cost-roll lines and the roll itself). */
const warningWords: Record<string, string> = {
  no_part: 'No part chosen',
  no_quote: 'No eligible quote',
  no_cost: 'No cost given',
  missing_fx: 'No FX rate',
  missing_weight: 'No unit weight',
  missing_pins: 'No pin count',
  pinned_not_cheapest: 'Pinned, not cheapest',
  pinned_expired: 'Pinned quote expired',
  pinned_not_yet_valid: 'Pinned quote not yet valid',
  pinned_inactive_supplier: 'Pinned supplier inactive',
  pinned_lead_time: 'Pinned quote too slow',
  pinned_not_found: 'Pinned quote not found',
  shipments_zero: 'Profile has zero shipments',
  freight_unallocated: 'Freight not shared out',
  fees_unallocated: 'Fees not shared out',
  freight_weight_zero: 'No weight to share freight by',
  lines_left_out: 'Lines left out of the totals',
};

/** A warning code in words; an unknown code is shown with its underscores as spaces. */
export function warningText(code: string): string {
  return warningWords[code] ?? code.replace(/_/g, ' ');
}

/** Why a line is left out of the totals, as a sentence ending. */
export function leftOutText(reason: string): string {
  return warningText(reason);
}

export const totalLabels: Record<string, string> = {
  goods: 'Goods',
  excessValue: 'Excess bought',
  origin: 'Origin handling',
  freight: 'Freight',
  insurance: 'Insurance',
  duty: 'Duty',
  fees: 'Fees',
  destination: 'Destination handling',
  assembly: 'Assembly',
  costLinesPerUnit: 'Cost lines per unit',
  oneTimePerUnit: 'One-time costs per unit',
  landedTotal: 'Landed total',
  landedPerUnit: 'Landed cost per unit',
};

/** Totals keys that are per finished unit (4 decimals); the rest are whole-build amounts. */
export const perUnitTotals = new Set(['costLinesPerUnit', 'oneTimePerUnit', 'landedPerUnit', 'assemblyPerUnit', 'landedPerUnitExclOneTime']);

export const rungLabels: Record<string, string> = {
  shelf_price: 'Shelf price (incl. VAT)',
  net_of_vat: 'Net of VAT',
  retailer_buying_price: "Retailer's buying price",
  importer_net: "Importer's net after margin",
  allowed_landed: 'Allowed landed cost',
};
