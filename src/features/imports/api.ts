import { uploadFile, type UploadProgress } from '../../lib/upload';

/** A field of the import and whether a column must be chosen for it. */
export type ImportField = { name: string; label: string; required: boolean };

export type RowProblem = { field: string; message: string };
export type PreviewRow = { row: number; values: Record<string, string>; problems: RowProblem[] };

/** field name → the file's column for it, or null when the file has none. */
export type ColumnMapping = Record<string, string | null>;

/** What POST /api/quotes/import answers before committing (and, with `imported`, after). */
export type ImportPreview = {
  columns: string[];
  fields: ImportField[];
  mapping: ColumnMapping;
  mappingProblems: { path: string; message: string }[];
  totalRows: number;
  validRows: number;
  problemRows: number;
  /** Quotes the valid rows make once rows of the same part, supplier and terms are grouped. */
  quotes: number;
  /** The first rows only (the server sends up to 500). */
  rows: PreviewRow[];
  imported?: number;
};

export const QUOTE_TEMPLATE_URL = '/api/quotes/import/template.csv';

/** The upload limit of a quote file on the server, said beside the file box. */
export const QUOTE_IMPORT_MAX_MB = 10;

export type ImportRequest = {
  file: File;
  mapping?: ColumnMapping;
  /** One supplier for the whole file, instead of a supplier column. */
  supplierId?: string;
  commit?: boolean;
  onProgress?: (progress: UploadProgress) => void;
};

/** Sends the file (again: the server keeps nothing between a preview and a commit). */
export function postQuoteImport({ file, mapping, supplierId, commit, onProgress }: ImportRequest): Promise<ImportPreview> {
  return uploadFile<ImportPreview>('/api/quotes/import', file, {
    fields: { mapping: mapping ? JSON.stringify(mapping) : undefined, supplierId: supplierId || undefined },
    query: { commit: commit ? 'true' : undefined },
    onProgress,
  });
}
