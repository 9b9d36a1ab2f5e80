export interface ImportField {
  name: string;
  label: string;
  required: boolean;
  /** Header spellings recognised when suggesting a mapping (compared without case, spaces or punctuation). */
  synonyms: string[];
}

export type Mapping = Record<string, string | null>;

const norm = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, '');

/** Suggests a column for each field from the header, by name and common spellings. */
export function suggestMapping(fields: ImportField[], columns: string[]): Mapping {
  const taken = new Set<string>();
  const out: Mapping = {};
  for (const f of fields) {
    const wanted = [norm(f.name), norm(f.label), ...f.synonyms.map(norm)];
    const col = columns.find((c) => !taken.has(c) && wanted.includes(norm(c))) ?? null;
    if (col) taken.add(col);
    out[f.name] = col;
  }
  return out;
}

/** Checks a mapping sent by the client against the fields and the file's columns. */
export function checkMapping(fields: ImportField[], columns: string[], mapping: unknown): { mapping: Mapping; problems: { path: string; message: string }[] } {
  const problems: { path: string; message: string }[] = [];
  const m: Mapping = {};
  const given = (mapping && typeof mapping === 'object' ? mapping : {}) as Record<string, unknown>;
  for (const key of Object.keys(given)) {
    if (!fields.some((f) => f.name === key)) problems.push({ path: `mapping.${key}`, message: 'is not a field of this import' });
  }
  for (const f of fields) {
    const col = given[f.name];
    if (col === undefined || col === null || col === '') m[f.name] = null;
    else if (typeof col === 'string' && columns.includes(col)) m[f.name] = col;
    else problems.push({ path: `mapping.${f.name}`, message: 'names no column of the file' });
  }
  return { mapping: m, problems };
}

/** A row's values under the field names of a mapping. */
export function mapRow(columns: string[], row: string[], mapping: Mapping): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [field, col] of Object.entries(mapping)) {
    if (col) out[field] = row[columns.indexOf(col)] ?? '';
  }
  return out;
}
