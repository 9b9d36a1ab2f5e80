import Papa from 'papaparse';
import ExcelJS from 'exceljs';
import { errors } from '../http/errors';
import { sniff, type UploadedFile } from '../http/upload';
import { zipUncompressedSize } from './zip-size';

export interface Table {
  columns: string[];
  rows: string[][];
}

export const MAX_IMPORT_ROWS = 100_000;
const MAX_UNCOMPRESSED = 100 * 1024 * 1024;

/** A cell as text; a formula stays its own text (`=…`) and is never evaluated or trusted. */
function cellText(v: ExcelJS.CellValue): string {
  if (v === null || v === undefined) return '';
  if (v instanceof Date) return v.toISOString().slice(0, 10);
  if (typeof v === 'object') {
    if ('formula' in v && v.formula) return `=${v.formula}`;
    if ('sharedFormula' in v && v.sharedFormula) return `=${v.sharedFormula}`;
    if ('richText' in v) return v.richText.map((r) => r.text).join('');
    if ('text' in v) return String(v.text);
    if ('error' in v) return String(v.error);
    return '';
  }
  return String(v);
}

/**
 * Reads an uploaded CSV or XLSX (first sheet) into a header and rows of text. The type is
 * judged from the bytes: a ZIP is read as XLSX, text as CSV, anything else is 415. A file
 * that claims to be a workbook but cannot be read is 422; a ZIP that would inflate beyond
 * 100 MB is refused before it is opened.
 */
export async function readTable(file: UploadedFile): Promise<Table> {
  const kind = sniff(file.buffer);
  let grid: string[][];
  if (kind === 'text') {
    const parsed = Papa.parse<string[]>(file.buffer.toString('utf8').replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy', preview: MAX_IMPORT_ROWS + 2 });
    grid = parsed.data.map((r) => r.map((c) => (c ?? '').trim()));
  } else if (kind === 'zip') {
    const size = zipUncompressedSize(file.buffer);
    if (size === null) throw errors.unreadable('The workbook is damaged or truncated and cannot be read.');
    if (size > MAX_UNCOMPRESSED) throw errors.tooLarge('The workbook would unpack to more than 100 MB; split it into smaller files.');
    const wb = new ExcelJS.Workbook();
    try {
      await wb.xlsx.load(file.buffer as unknown as ArrayBuffer);
    } catch {
      throw errors.unreadable('The workbook is damaged or not an XLSX file and cannot be read.');
    }
    const ws = wb.worksheets[0];
    if (!ws) throw errors.unreadable('The workbook has no sheet.');
    grid = [];
    ws.eachRow({ includeEmpty: false }, (row) => {
      if (grid.length > MAX_IMPORT_ROWS + 1) return;
      const values = row.values as ExcelJS.CellValue[];
      grid.push(values.slice(1).map((v) => cellText(v).trim()));
    });
  } else {
    throw errors.unsupported('Upload a CSV or an XLSX file.');
  }
  grid = grid.filter((r) => r.some((c) => c !== ''));
  if (grid.length < 2) throw errors.validation('The file has a header but no data rows.', [{ path: 'file', message: 'has no data rows' }]);
  if (grid.length - 1 > MAX_IMPORT_ROWS) throw errors.tooLarge(`The file has more than ${MAX_IMPORT_ROWS.toLocaleString('en')} rows; split it.`);
  const width = Math.max(...grid.map((r) => r.length));
  const columns = grid[0].map((c, i) => c || `Column ${i + 1}`);
  for (let i = columns.length; i < width; i++) columns.push(`Column ${i + 1}`);
  return { columns, rows: grid.slice(1).map((r) => columns.map((_, i) => r[i] ?? '')) };
}
