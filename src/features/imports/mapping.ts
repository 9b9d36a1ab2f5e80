import type { ColumnMapping, ImportField, ImportPreview, PreviewRow } from './api';

/** The mapping step's state: a column (or '' for none) per field, and an optional single supplier. */
export type MappingState = { columns: Record<string, string>; supplierId: string };

/** Starts from the server's suggestion; a suggested column the file does not have is dropped. */
export function initialMapping(preview: Pick<ImportPreview, 'fields' | 'mapping' | 'columns'>, supplierId = ''): MappingState {
  const columns: Record<string, string> = {};
  for (const field of preview.fields) {
    const suggested = preview.mapping[field.name];
    columns[field.name] = suggested && preview.columns.includes(suggested) ? suggested : '';
  }
  return { columns, supplierId };
}

/** The mapping as the API takes it: every field named, null for "not in this file". */
export function mappingForRequest(state: MappingState, fields: readonly ImportField[]): ColumnMapping {
  return Object.fromEntries(fields.map((f) => [f.name, state.columns[f.name] || null]));
}

/** A stable text of the state, to tell whether the rows shown were checked with this mapping. */
export function mappingKey(state: MappingState): string {
  return JSON.stringify([Object.entries(state.columns).sort(([a], [b]) => a.localeCompare(b)), state.supplierId]);
}

/**
 * What still has to be chosen before rows can be read, by the server's own rules:
 * every required field; a part number (ours or the maker's); a supplier column or one
 * supplier for the file. Keyed by the field whose select should show the message.
 */
export function mappingGaps(state: MappingState, fields: readonly ImportField[]): Record<string, string> {
  const gaps: Record<string, string> = {};
  for (const f of fields) if (f.required && !state.columns[f.name]) gaps[f.name] = `choose the column for ${f.label}`;
  const has = (name: string) => fields.some((f) => f.name === name);
  if (has('internalPn') && has('mpn') && !state.columns.internalPn && !state.columns.mpn) {
    gaps.internalPn = 'choose a column for Internal PN or MPN';
  }
  if (has('supplier') && !state.columns.supplier && !state.supplierId) {
    gaps.supplier = 'choose a supplier column or one supplier for the whole file';
  }
  return gaps;
}

/** Columns chosen for more than one field: allowed, but usually a slip worth saying. */
export function columnsUsedTwice(state: MappingState): string[] {
  const seen = new Map<string, number>();
  for (const column of Object.values(state.columns)) if (column) seen.set(column, (seen.get(column) ?? 0) + 1);
  return [...seen].filter(([, n]) => n > 1).map(([column]) => column);
}

/** The server's mapping problems (`mapping.supplier`, `supplierId`) by the field they concern. */
export function mappingProblemsByField(problems: readonly { path: string; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const p of problems) {
    const field = p.path.startsWith('mapping.') ? p.path.slice('mapping.'.length) : p.path;
    out[field] = out[field] ? `${out[field]}; ${p.message}` : p.message;
  }
  return out;
}

/** A preview row's problems by field, for marking the cells. */
export function problemsByField(row: PreviewRow): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const p of row.problems) (out[p.field] ??= []).push(p.message);
  return out;
}

/** The fields to show as preview columns: those with a column in the file, in the import's order. */
export function shownFields(fields: readonly ImportField[], mapping: ColumnMapping): ImportField[] {
  return fields.filter((f) => mapping[f.name]);
}

/** A commit's refusal ("row 5.currency": "…") as lines to list under the button. */
export function commitProblems(details: readonly { path: string; message: string }[], fields: readonly ImportField[]): string[] {
  const label = new Map(fields.map((f) => [f.name, f.label]));
  return details.map((d) => {
    const match = /^row (\d+)\.(.+)$/.exec(d.path);
    if (!match) return d.path ? `${d.path}: ${d.message}` : d.message;
    return `Row ${match[1]}, ${label.get(match[2]) ?? match[2]}: ${d.message}`;
  });
}
