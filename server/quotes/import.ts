import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import { errors } from '../http/errors';
import type { UploadedFile } from '../http/upload';
import { scoped } from '../db/scope';
import { audit } from '../audit/repository';
import { readTable } from '../imports/read-table';
import { suggestMapping, checkMapping, mapRow, type ImportField } from '../imports/mapping';
import { currency as currencySchema, incoterm as incotermSchema } from '../../src/shared/schemas/trade';
import { unitPrice as unitPriceSchema, isoDate } from '../../src/shared/schemas/decimal';
import { priceBreaks as priceBreaksSchema } from '../../src/shared/schemas/quotes';

export const quoteImportFields: ImportField[] = [
  { name: 'internalPn', label: 'Internal PN', required: false, synonyms: ['pn', 'part', 'partno', 'ourpn', 'internal part number'] },
  { name: 'mpn', label: 'MPN', required: false, synonyms: ['manufacturer pn', 'mfr pn', 'mfrpn', 'part number', 'manufacturer part number'] },
  { name: 'supplier', label: 'Supplier', required: false, synonyms: ['vendor', 'supplier name'] },
  { name: 'currency', label: 'Currency', required: false, synonyms: ['ccy', 'cur'] },
  { name: 'incoterm', label: 'Incoterm', required: false, synonyms: ['incoterms', 'terms', 'delivery terms'] },
  { name: 'moq', label: 'MOQ', required: false, synonyms: ['min order', 'minimum order', 'minimum order quantity'] },
  { name: 'orderMultiple', label: 'Order multiple', required: false, synonyms: ['multiple', 'spq', 'reel', 'pack qty', 'reel qty'] },
  { name: 'leadTimeDays', label: 'Lead time (days)', required: false, synonyms: ['lead time', 'leadtime', 'lt', 'lead time days'] },
  { name: 'validFrom', label: 'Valid from', required: false, synonyms: ['from', 'start'] },
  { name: 'validUntil', label: 'Valid until', required: false, synonyms: ['valid to', 'expiry', 'expires', 'until'] },
  { name: 'minQty', label: 'Break quantity', required: true, synonyms: ['min qty', 'qty', 'quantity', 'break', 'break qty', 'from qty'] },
  { name: 'unitPrice', label: 'Unit price', required: true, synonyms: ['price', 'unit cost', 'price each'] },
  { name: 'note', label: 'Note', required: false, synonyms: ['notes', 'remark', 'comment'] },
];

export const quoteTemplateCsv =
  'internal_pn,mpn,supplier,currency,incoterm,moq,order_multiple,lead_time_days,valid_from,valid_until,min_qty,unit_price,note\n' +
  'TB-R-10K-0603,,Your supplier name,CNY,FOB,5000,5000,21,2026-12-01,2027-02-28,5000,0.0021,one row per price break\n' +
  'TB-R-10K-0603,,Your supplier name,CNY,FOB,5000,5000,21,2026-12-01,2027-02-28,50000,0.0016,\n';

interface RowProblem {
  field: string;
  message: string;
}
interface PreviewRow {
  row: number;
  values: Record<string, string>;
  problems: RowProblem[];
}
interface QuoteDraft {
  partId: string;
  supplierId: string;
  currency: string;
  incoterm: string;
  moq: number;
  orderMultiple: number;
  leadTimeDays: number | null;
  validFrom: string | null;
  validUntil: string | null;
  note: string;
  breaks: { minQty: number; unitPrice: string; row: number }[];
}

const intOf = (s: string) => (/^\d{1,12}$/.test(s.replace(/[,\s_]/g, '')) ? Number(s.replace(/[,\s_]/g, '')) : NaN);
const looksLikeFormula = (s: string) => /^[=+@]/.test(s) || (/^-/.test(s) && !/^-?\d/.test(s));

/**
 * Quote import: one row per price break; rows with the same part, supplier and terms form
 * one quote. The preview lists every row's problems; commit writes all quotes in one
 * transaction, or nothing when any row has a problem.
 */
export async function importQuotes(deps: Deps, auth: Auth, file: UploadedFile, fields: Record<string, string>, commit: boolean) {
  const table = await readTable(file);
  let mapping = suggestMapping(quoteImportFields, table.columns);
  if (fields.mapping) {
    let parsed: unknown;
    try {
      parsed = JSON.parse(fields.mapping);
    } catch {
      throw errors.validation('The column mapping is not valid JSON.', [{ path: 'mapping', message: 'malformed JSON' }]);
    }
    const checked = checkMapping(quoteImportFields, table.columns, parsed);
    if (checked.problems.length) throw errors.validation('The column mapping does not fit this file.', checked.problems);
    mapping = checked.mapping;
  }
  const fixedSupplierId = fields.supplierId && /^\d+$/.test(fields.supplierId) ? fields.supplierId : null;
  const missing: { path: string; message: string }[] = [];
  for (const f of quoteImportFields) if (f.required && !mapping[f.name]) missing.push({ path: `mapping.${f.name}`, message: `choose the column for ${f.label}` });
  if (!mapping.internalPn && !mapping.mpn) missing.push({ path: 'mapping.internalPn', message: 'choose a column for Internal PN or MPN' });
  if (!mapping.supplier && !fixedSupplierId) missing.push({ path: 'mapping.supplier', message: 'choose a supplier column or one supplier for the whole file' });

  // Reference data in a fixed number of queries, whatever the file's length.
  const [parts, suppliers] = await Promise.all([
    scoped(deps.db, 'parts', auth.workspaceId).select('id', 'internalPn', 'mpn') as Promise<{ id: string; internalPn: string; mpn: string }[]>,
    scoped(deps.db, 'suppliers', auth.workspaceId).select('id', 'name', 'currency', 'defaultIncoterm') as Promise<{ id: string; name: string; currency: string; defaultIncoterm: string }[]>,
  ]);
  const byPn = new Map(parts.map((p) => [p.internalPn.toLowerCase(), p.id]));
  const byMpn = new Map(parts.filter((p) => p.mpn).map((p) => [p.mpn.toLowerCase(), p.id]));
  const supplierByName = new Map(suppliers.map((s) => [s.name.toLowerCase(), s]));
  const fixedSupplier = fixedSupplierId ? suppliers.find((s) => s.id === fixedSupplierId) : undefined;
  if (fixedSupplierId && !fixedSupplier) missing.push({ path: 'supplierId', message: 'refers to a missing supplier' });

  const preview: PreviewRow[] = [];
  const drafts = new Map<string, QuoteDraft>();
  if (!missing.length) {
    table.rows.forEach((cells, i) => {
      const row = i + 2;
      const v = mapRow(table.columns, cells, mapping);
      const problems: RowProblem[] = [];
      const bad = (field: string, message: string) => problems.push({ field, message });
      for (const [field, value] of Object.entries(v)) {
        if (field !== 'note' && value && looksLikeFormula(value)) bad(field, 'looks like a spreadsheet formula; enter the value itself');
      }
      const partId = (v.internalPn && byPn.get(v.internalPn.toLowerCase())) || (v.mpn && byMpn.get(v.mpn.toLowerCase())) || null;
      if (!partId) bad(v.internalPn ? 'internalPn' : 'mpn', `no part ${v.internalPn || v.mpn || '(empty)'} in the library`);
      const supplier = fixedSupplier ?? (v.supplier ? supplierByName.get(v.supplier.toLowerCase()) : undefined);
      if (!supplier) bad('supplier', `no supplier named ${v.supplier || '(empty)'}`);
      const ccy = currencySchema.safeParse(v.currency || supplier?.currency || '');
      if (!ccy.success) bad('currency', ccy.error.issues[0].message);
      const inc = incotermSchema.safeParse((v.incoterm || supplier?.defaultIncoterm || '').toUpperCase());
      if (!inc.success) bad('incoterm', 'must be an Incoterms 2020 rule such as FOB');
      const num = (field: string, fallback: number | null, min: number) => {
        const raw = v[field];
        if (!raw) return fallback;
        const n = intOf(raw);
        if (!Number.isFinite(n) || n < min) {
          bad(field, `must be a whole number of at least ${min}`);
          return fallback;
        }
        return n;
      };
      const moq = num('moq', 1, 1);
      const mult = num('orderMultiple', 1, 1);
      const lead = num('leadTimeDays', null, 0);
      const minQty = num('minQty', null, 1);
      if (minQty === null && !problems.some((p) => p.field === 'minQty')) bad('minQty', 'is required');
      const price = unitPriceSchema.safeParse(v.unitPrice ?? '');
      if (!price.success) bad('unitPrice', v.unitPrice ? price.error.issues[0].message : 'is required');
      const date = (field: string) => {
        if (!v[field]) return null;
        const d = isoDate.safeParse(v[field]);
        if (!d.success) bad(field, 'must be a date YYYY-MM-DD');
        return d.success ? d.data : null;
      };
      const from = date('validFrom');
      const until = date('validUntil');
      if (from && until && from > until) bad('validUntil', 'must not be before valid from');
      if (!problems.length && partId && supplier && ccy.success && inc.success && price.success && minQty !== null) {
        const key = [partId, supplier.id, ccy.data, inc.data, moq, mult, lead, from, until].join('|');
        const d = drafts.get(key) ?? {
          partId, supplierId: supplier.id, currency: ccy.data, incoterm: inc.data, moq: moq ?? 1, orderMultiple: mult ?? 1,
          leadTimeDays: lead, validFrom: from, validUntil: until, note: v.note ?? '', breaks: [],
        };
        d.breaks.push({ minQty, unitPrice: price.data, row });
        drafts.set(key, d);
      }
      preview.push({ row, values: v, problems });
    });
    // A quote's breaks must ascend without repeats once grouped.
    for (const d of drafts.values()) {
      d.breaks.sort((a, b) => a.minQty - b.minQty);
      const check = priceBreaksSchema.safeParse(d.breaks.map(({ minQty, unitPrice }) => ({ minQty, unitPrice })));
      if (!check.success) {
        for (const issue of check.error.issues) {
          const b = d.breaks[Number(issue.path[0])];
          if (b) preview[b.row - 2].problems.push({ field: 'minQty', message: `${issue.message} (the same break appears twice for this quote)` });
        }
      }
    }
  }
  const problemRows = preview.filter((r) => r.problems.length).length;
  const result = {
    columns: table.columns,
    fields: quoteImportFields.map(({ name, label, required }) => ({ name, label, required })),
    mapping,
    mappingProblems: missing,
    totalRows: table.rows.length,
    validRows: preview.length - problemRows,
    problemRows,
    quotes: drafts.size,
    rows: preview.slice(0, 500),
  };
  if (!commit) return result;
  if (missing.length) throw errors.validation('Choose the columns first.', missing);
  if (problemRows) {
    throw errors.validation(
      `${problemRows} row(s) have problems; nothing was imported.`,
      preview.filter((r) => r.problems.length).slice(0, 100).flatMap((r) => r.problems.map((p) => ({ path: `row ${r.row}.${p.field}`, message: p.message }))),
    );
  }
  await deps.db.transaction(async (trx) => {
    const list = [...drafts.values()];
    for (let i = 0; i < list.length; i += 500) {
      const chunk = list.slice(i, i + 500);
      const ids = (await trx('quotes')
        .insert(chunk.map(({ breaks: _b, ...q }) => ({ ...q, workspaceId: auth.workspaceId, source: 'import' })))
        .returning('id')) as { id: string }[];
      const rows = chunk.flatMap((q, k) => q.breaks.map((b) => ({ workspaceId: auth.workspaceId, quoteId: ids[k].id, minQty: b.minQty, unitPrice: b.unitPrice })));
      for (let j = 0; j < rows.length; j += 2000) await trx('price_breaks').insert(rows.slice(j, j + 2000));
    }
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'import', entity: 'quote', changes: { quotes: list.length, rows: preview.length } });
  });
  return { ...result, imported: drafts.size };
}
