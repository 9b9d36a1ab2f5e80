import type ExcelJS from 'exceljs';
import { CAUTION_TEXT } from '../derating';
import type { ExportData } from './load';
import { RATIO_FORMAT } from './formats';
import { addSheet, numberCell, putRow, text } from './sheet-rows';

/** Our names for the stress statuses (product brief), never colour alone. */
export const STRESS_WORDS: Record<string, string> = {
  clear: 'Clear',
  close: 'Close',
  beyond_policy: 'Beyond policy',
  over_rating: 'Over rating',
  needs_data: 'Needs data',
};

const CHECK_WORDS: Record<string, string> = {
  'capacitor.voltage': 'Capacitor voltage',
  'resistor.voltage': 'Resistor voltage',
  'resistor.power': 'Resistor power',
  'transistor.current': 'Transistor current',
  'transistor.voltage': 'Transistor voltage',
  'transistor.power': 'Transistor power',
  'transistor.junctionTemp': 'Transistor junction temperature',
  'diode.reverseVoltage': 'Diode reverse voltage',
  'diode.current': 'Diode current',
  'led.current': 'LED current',
};

const MEASURE_FORMAT = '#,##0.######';

/**
 * The Stress sheet: the safety caution first, then one row per check of every rated line
 * with applied, rated, ratio, the policy's limit and the status. A BOM without rated lines
 * (or a workspace without a stress policy) gets one row saying so.
 */
export function writeStressSheet(wb: ExcelJS.stream.xlsx.WorkbookWriter, d: ExportData): void {
  const headers = ['Ref designators', 'Part', 'MPN', 'Category', 'Line status', 'Check', 'Unit', 'Applied', 'Rated', 'Ratio', 'Limit', 'Check status', 'Missing data', 'Waiver', 'How it was worked out'];
  const ws = addSheet(wb, 'Stress', { widths: [18, 16, 20, 11, 13, 28, 6, 11, 11, 8, 8, 13, 22, 30, 50], frozenRows: 2, frozenColumns: 1 });
  putRow(ws, 1, [text(CAUTION_TEXT)], 'bold');
  putRow(ws, 2, headers.map(text), 'header');
  let row = 2;
  const lines = d.stress?.lines ?? [];
  if (!d.stress || lines.length === 0) {
    const why = d.stressProblem ?? 'No line of this BOM has a stress check (no resistor, capacitor, transistor, diode or LED lines).';
    putRow(ws, ++row, [text(why)]);
  }
  for (const l of lines) {
    for (const c of l.checks) {
      putRow(ws, ++row, [
        text(l.refDes ?? ''),
        text(l.internalPn ?? ''),
        text(l.mpn ?? ''),
        text(l.category),
        text(STRESS_WORDS[l.status] ?? l.status),
        text(CHECK_WORDS[c.check] ?? c.check),
        text(c.unit),
        numberCell(c.applied, MEASURE_FORMAT),
        numberCell(c.rated, MEASURE_FORMAT),
        numberCell(c.ratio, RATIO_FORMAT),
        numberCell(c.limit, RATIO_FORMAT),
        text(STRESS_WORDS[c.status] ?? c.status),
        text(c.missing.join(', ')),
        text(l.waiver ? `${l.waiver.reason} (${l.waiver.waivedBy ?? 'unknown'}, ${l.waiver.createdAt.slice(0, 10)})` : ''),
        text(c.formula),
      ]);
    }
  }
  ws.autoFilter = `A2:O${Math.max(row, 2)}`;
  ws.commit();
}
