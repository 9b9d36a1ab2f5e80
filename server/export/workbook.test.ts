import { describe, expect, it } from 'vitest';
import { PassThrough } from 'node:stream';
import ExcelJS from 'exceljs';
import { costRoll } from '../costing';
import { bigBomInput } from '../costing/test-big-bom';
import { writeCostedBom } from './workbook';
import type { ExportData } from './load';

/** Export data around the engine's large test BOM, without a database (names are placeholders). */
function exportData(lineCount: number): ExportData {
  const input = bigBomInput(lineCount);
  const result = costRoll(input);
  return {
    bom: { id: '1', name: 'Desk ioniser', revision: 2, state: 'in_review', amortisationQty: null },
    cost: { ...result, bomId: '1', profileId: '1', profileName: 'Sea freight', lines: result.lines.map((l) => ({ ...l, internalPn: `P-${l.partId}`, mpn: 'MPN', supplierName: 'Demo supplier' })), bySupplier: [] },
    data: {
      lines: input.lines.map((l) => ({ id: l.id, qtyPerUnit: l.qtyPerUnit, unitCost: null, oneTimeCost: null, currency: null, note: '', unresolved: null })),
      parts: input.parts.map((p) => ({ ...p, internalPn: `P-${p.id}`, mpn: 'MPN', manufacturer: 'Demo', description: '', ratings: {} })),
      profile: null,
      input,
    },
    stress: null,
    stressProblem: 'This workspace has no stress policy.',
  } as unknown as ExportData;
}

describe('writing the workbook to a stream', () => {
  it('writes a workbook exceljs reads back, with every formula of the lines kept', async () => {
    const out = new PassThrough();
    const chunks: Buffer[] = [];
    out.on('data', (c: Buffer) => chunks.push(c));
    await writeCostedBom(out, exportData(40));
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(Buffer.concat(chunks) as unknown as ArrayBuffer);
    expect(wb.getWorksheet('Lines')!.rowCount).toBe(41);
    expect(String(wb.getWorksheet('Stress')!.getCell('A3').value)).toBe('This workspace has no stress policy.');
    const notes: string[] = [];
    wb.getWorksheet('Notes')!.eachRow((r) => notes.push(String(r.getCell(1).value)));
    expect(notes).not.toContain('Written as values');
  });

  it('gives up instead of waiting forever when the reader has gone away', async () => {
    const out = new PassThrough();
    out.on('data', () => out.destroy());
    await expect(writeCostedBom(out, exportData(400))).rejects.toThrow(/closed before the workbook was written/);
  });
});
