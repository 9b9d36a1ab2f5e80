import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import { errors } from '../http/errors';
import type { UploadedFile } from '../http/upload';
import { scoped } from '../db/scope';
import { audit } from '../audit/repository';
import { readTable } from '../imports/read-table';
import { suggestMapping, checkMapping, mapRow, type ImportField } from '../imports/mapping';
import { lineKind } from '../../src/shared/schemas/boms';
import { decimalString } from '../../src/shared/schemas/decimal';
import { countRefDes } from '../../src/shared/ref-des';
import { editableBom, lineColumns } from './repository';

export const bomImportFields: ImportField[] = [
  { name: 'refDes', label: 'Reference designators', required: false, synonyms: ['ref', 'refdes', 'designator', 'designators', 'reference', 'references'] },
  { name: 'qtyPerUnit', label: 'Quantity per unit', required: true, synonyms: ['qty', 'quantity', 'qty per unit', 'count'] },
  { name: 'internalPn', label: 'Internal PN', required: false, synonyms: ['pn', 'part', 'our pn', 'part no'] },
  { name: 'mpn', label: 'MPN', required: false, synonyms: ['manufacturer pn', 'mfr pn', 'part number', 'manufacturer part number'] },
  { name: 'description', label: 'Description', required: false, synonyms: ['desc', 'value', 'comment'] },
  { name: 'kind', label: 'Line kind', required: false, synonyms: ['type', 'line type'] },
  { name: 'dnp', label: 'DNP', required: false, synonyms: ['do not place', 'dnf', 'not fitted'] },
  { name: 'note', label: 'Note', required: false, synonyms: ['notes', 'remark'] },
];

const qty = decimalString({ scale: 6, min: 'positive', maxIntDigits: 8 });
const yes = (s: string) => /^(1|y|yes|true|x|dnp)$/i.test(s.trim());

/**
 * BOM import: rows matched to library parts by MPN or internal PN (unmatched rows become
 * unresolved lines to resolve in the grid). Preview first; commit writes every row in one
 * transaction, or none when any row has a problem.
 */
export async function importBom(deps: Deps, auth: Auth, bomId: string, file: UploadedFile, fields: Record<string, string>, commit: boolean) {
  await editableBom(deps.db, auth.workspaceId, bomId);
  const table = await readTable(file);
  let mapping = suggestMapping(bomImportFields, table.columns);
  if (fields.mapping) {
    let parsed: unknown;
    try {
      parsed = JSON.parse(fields.mapping);
    } catch {
      throw errors.validation('The column mapping is not valid JSON.', [{ path: 'mapping', message: 'malformed JSON' }]);
    }
    const checked = checkMapping(bomImportFields, table.columns, parsed);
    if (checked.problems.length) throw errors.validation('The column mapping does not fit this file.', checked.problems);
    mapping = checked.mapping;
  }
  const mappingProblems: { path: string; message: string }[] = [];
  if (!mapping.qtyPerUnit) mappingProblems.push({ path: 'mapping.qtyPerUnit', message: 'choose the column for Quantity per unit' });
  if (!mapping.internalPn && !mapping.mpn && !mapping.description) mappingProblems.push({ path: 'mapping.mpn', message: 'choose a column for MPN, Internal PN or Description' });

  const parts = (await scoped(deps.db, 'parts', auth.workspaceId).select('id', 'internalPn', 'mpn')) as { id: string; internalPn: string; mpn: string }[];
  const byPn = new Map(parts.map((p) => [p.internalPn.toLowerCase(), p.id]));
  const byMpn = new Map(parts.filter((p) => p.mpn).map((p) => [p.mpn.toLowerCase(), p.id]));

  const rows = mappingProblems.length
    ? []
    : table.rows.map((cells, i) => {
        const v = mapRow(table.columns, cells, mapping);
        const problems: { field: string; message: string }[] = [];
        const q = qty.safeParse((v.qtyPerUnit ?? '').replace(/,/g, ''));
        if (!q.success) problems.push({ field: 'qtyPerUnit', message: v.qtyPerUnit ? 'must be a positive number' : 'is required' });
        const kind = lineKind.safeParse((v.kind || 'part').toLowerCase());
        if (!kind.success) problems.push({ field: 'kind', message: 'must be part, labour, packaging, test, tooling or other' });
        const partId = (v.mpn && byMpn.get(v.mpn.toLowerCase())) || (v.internalPn && byPn.get(v.internalPn.toLowerCase())) || null;
        const refDes = v.refDes ?? '';
        const refCount = countRefDes(refDes);
        if (refCount.error) problems.push({ field: 'refDes', message: refCount.error });
        const warnings: string[] = [];
        if (q.success && refCount.count > 0 && refCount.count !== Number(q.data)) warnings.push(`${refCount.count} designators but quantity ${q.data}`);
        const unresolved = kind.success && kind.data === 'part' && !partId ? (v.mpn || v.internalPn || v.description || '(no identifier)').slice(0, 200) : null;
        return {
          row: i + 2,
          values: v,
          problems,
          warnings,
          matched: partId ? (v.mpn && byMpn.get(v.mpn.toLowerCase()) ? 'mpn' : 'internalPn') : null,
          line: {
            kind: kind.success ? kind.data : 'part', refDes, partId, qtyPerUnit: q.success ? q.data : '1', dnp: yes(v.dnp ?? ''),
            note: (v.note || (kind.success && kind.data !== 'part' ? v.description : '') || '').slice(0, 1000), unresolved,
          },
        };
      });
  const problemRows = rows.filter((r) => r.problems.length).length;
  const summary = {
    columns: table.columns,
    fields: bomImportFields.map(({ name, label, required }) => ({ name, label, required })),
    mapping,
    mappingProblems,
    totalRows: table.rows.length,
    problemRows,
    matchedRows: rows.filter((r) => r.matched).length,
    unresolvedRows: rows.filter((r) => r.line.unresolved).length,
    rows: rows.slice(0, 500).map(({ line: _l, ...r }) => r),
  };
  if (!commit) return summary;
  if (mappingProblems.length) throw errors.validation('Choose the columns first.', mappingProblems);
  if (problemRows) {
    throw errors.validation(
      `${problemRows} row(s) have problems; nothing was imported.`,
      rows.filter((r) => r.problems.length).slice(0, 100).flatMap((r) => r.problems.map((p) => ({ path: `row ${r.row}.${p.field}`, message: p.message }))),
    );
  }
  await deps.db.transaction(async (trx) => {
    await editableBom(trx, auth.workspaceId, bomId, true);
    const maxPos = await scoped(trx, 'bom_lines', auth.workspaceId).andWhere({ bomId }).max('position as m').first();
    let pos = Number(maxPos?.m ?? -1) + 1;
    const all = rows.map((r) => ({ ...lineColumns(r.line), position: pos++, workspaceId: auth.workspaceId, bomId }));
    for (let i = 0; i < all.length; i += 1000) await trx('bom_lines').insert(all.slice(i, i + 1000));
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'import', entity: 'line', entityId: bomId, changes: { rows: all.length } });
  });
  return { ...summary, imported: rows.length };
}
