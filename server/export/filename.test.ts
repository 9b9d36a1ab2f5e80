import { describe, expect, it } from 'vitest';
import { exportFilename } from './filename';
import { moneyFormat, safeText } from './formats';

describe('export file name', () => {
  it('is "<bom name> rev <n> costed BOM.xlsx" with unsafe characters taken out', () => {
    expect(exportFilename('Arc lighter', 3)).toBe('Arc lighter rev 3 costed BOM.xlsx');
    expect(exportFilename('Arc lighter: "Spark" 2/3', 1)).toBe('Arc lighter Spark 2 3 rev 1 costed BOM.xlsx');
    expect(exportFilename('..\\..\\etc\\passwd', 1)).toBe('etc passwd rev 1 costed BOM.xlsx');
    expect(exportFilename('Lampe\r\nà pince', 2)).toBe('Lampe à pince rev 2 costed BOM.xlsx');
    expect(exportFilename('???', 1)).toBe('BOM rev 1 costed BOM.xlsx');
    expect(exportFilename('x'.repeat(500), 1)).toHaveLength(120 + ' rev 1 costed BOM.xlsx'.length);
  });
});

describe('cell text and formats', () => {
  it('keeps text that looks like a formula exactly, dropping only what XML cannot hold', () => {
    for (const s of ['=HYPERLINK("x")', '+1', '-R1', '@SUM(A1)', '\tTAB', '\rCR']) expect(safeText(s)).toBe(s);
    expect(safeText('a\u0000b\u0007c')).toBe('abc');
    expect(safeText('y'.repeat(40000))).toHaveLength(32767);
  });

  it('rounds totals to the ISO 4217 minor unit of the currency [ISO-DATA]', () => {
    expect(moneyFormat('USD')).toBe('#,##0.00');
    expect(moneyFormat('JPY')).toBe('#,##0');
    expect(moneyFormat('KWD')).toBe('#,##0.000');
    expect(moneyFormat('CLF')).toBe('#,##0.0000');
  });
});
