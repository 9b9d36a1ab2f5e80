import type { DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';
import type { QuoteOut } from '../../src/shared/schemas/quotes';
import type { Quote as CostingQuote } from '../costing';

export interface QuoteRow extends Omit<QuoteOut, 'expired' | 'createdAt' | 'priceBreaks'> {
  createdAt: Date;
  priceBreaks: { minQty: number; unitPrice: string }[];
}

export const today = () => new Date().toISOString().slice(0, 10);

export function quoteView(q: QuoteRow, on = today()): QuoteOut {
  return {
    id: q.id, partId: q.partId, supplierId: q.supplierId, supplierName: q.supplierName, currency: q.currency,
    incoterm: q.incoterm, moq: Number(q.moq), orderMultiple: Number(q.orderMultiple), leadTimeDays: q.leadTimeDays,
    validFrom: q.validFrom, validUntil: q.validUntil, priceBreaks: q.priceBreaks, source: q.source, note: q.note,
    expired: q.validUntil !== null && q.validUntil < on, createdAt: new Date(q.createdAt).toISOString(), version: q.version,
  };
}

/**
 * A quote's breaks from the text its row carries ("minQty price minQty price …", ascending).
 * Scanned with indexOf rather than split: a 10,000-line cost roll reads 200,000 breaks. A
 * quantity without a price gets an empty price, which the engine rejects by name.
 */
export function parseBreaksText(text: string | null): { minQty: number; unitPrice: string }[] {
  const breaks: { minQty: number; unitPrice: string }[] = [];
  if (!text) return breaks;
  const n = text.length;
  let start = 0;
  for (;;) {
    const gap = text.indexOf(' ', start);
    if (gap < 0) {
      breaks.push({ minQty: Number(text.slice(start)), unitPrice: '' });
      return breaks;
    }
    const next = text.indexOf(' ', gap + 1);
    const end = next < 0 ? n : next;
    breaks.push({ minQty: Number(text.slice(start, gap)), unitPrice: text.slice(gap + 1, end) });
    if (next < 0) return breaks;
    start = end + 1;
  }
}

/**
 * Quotes with their price breaks in one query, whatever the number of quotes: each row
 * carries its breaks (kept from price_breaks by a trigger), so a quote never arrives
 * without the breaks it was saved with.
 */
export async function loadQuotes(
  db: DbOrTrx,
  workspaceId: string,
  filter: { partIds?: string[]; supplierId?: string; ids?: string[] } = {},
): Promise<QuoteRow[]> {
  const q = scoped(db, 'quotes', workspaceId)
    .join('suppliers', function () {
      this.on('suppliers.id', 'quotes.supplierId').andOn('suppliers.workspaceId', 'quotes.workspaceId');
    })
    .select('quotes.*', 'suppliers.name as supplierName')
    .orderBy('quotes.id');
  if (filter.partIds) q.whereIn('quotes.partId', filter.partIds);
  if (filter.supplierId) q.andWhere('quotes.supplierId', filter.supplierId);
  if (filter.ids) q.whereIn('quotes.id', filter.ids);
  const quotes = (await q) as (Omit<QuoteRow, 'priceBreaks'> & { breaksText: string | null })[];
  return quotes.map(({ breaksText, ...x }) => ({ ...x, moq: Number(x.moq), orderMultiple: Number(x.orderMultiple), priceBreaks: parseBreaksText(breaksText) }));
}

export async function writeBreaks(db: DbOrTrx, workspaceId: string, quoteId: string, breaks: { minQty: number; unitPrice: string }[]) {
  await db('price_breaks').where({ workspaceId, quoteId }).delete();
  if (breaks.length) await db('price_breaks').insert(breaks.map((b) => ({ workspaceId, quoteId, minQty: b.minQty, unitPrice: b.unitPrice })));
}

/**
 * The quotes of some parts as the costing engine takes them, for a cost roll of a large
 * BOM: only the fields it uses, the part ids as one array (given, or a BOM's), the breaks
 * as the one "minQty price minQty price …" text each quote row carries (no row per break,
 * no aggregation at read time), and createdAt already as ISO text.
 *
 * Each quote arrives as one text field, its values joined by "|" (none of them can hold
 * one: ids, codes, whole numbers, ISO dates, the breaks text), with a missing value as an
 * empty string. Twelve fields a row made 480,000 field reads for a 10,000-line BOM; one
 * field and a split in Node halves the time of the read.
 */
export async function quotesForCosting(
  db: DbOrTrx,
  workspaceId: string,
  parts: string[] | { bomId: string; share?: { index: number; of: number } },
): Promise<CostingQuote[]> {
  if (Array.isArray(parts) && !parts.length) return [];
  // A BOM's parts as an array built inside the query (the planner then treats it like an
  // array parameter; an IN (subquery) here was planned as a nested loop of 40,000².)
  // `share` reads the quotes of one share of the parts (part id modulo `of`), unsorted:
  // the caller reads the shares side by side and puts them in order itself.
  const share = Array.isArray(parts) ? undefined : parts.share;
  const ids = Array.isArray(parts)
    ? '?::bigint[]'
    : `ARRAY(SELECT part_id FROM bom_lines WHERE workspace_id = ? AND bom_id = ? AND part_id IS NOT NULL${share ? ' AND part_id % ? = ?' : ''})`;
  const idParams = Array.isArray(parts) ? [parts] : [workspaceId, parts.bomId, ...(share ? [share.of, share.index] : [])];
  const { rows } = (await db.raw(
    `SELECT ${COSTING_QUOTE_TEXT_SQL} AS r FROM quotes q WHERE q.workspace_id = ? AND q.part_id = ANY(${ids})${share ? '' : ' ORDER BY q.id'}`,
    [workspaceId, ...idParams],
  )) as { rows: { r: string }[] };
  return rows.map(({ r }) => costingQuoteFromText(r));
}

/** One quote as the text `COSTING_QUOTE_TEXT_SQL` makes of it (`q` is the quotes row). */
export const COSTING_QUOTE_TEXT_SQL = `concat_ws('|', q.id, q.part_id, q.supplier_id, q.currency, q.incoterm, q.moq, q.order_multiple,
  coalesce(q.lead_time_days::text, ''), coalesce(q.valid_from::text, ''), coalesce(q.valid_until::text, ''),
  to_char(q.created_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'), coalesce(q.breaks_text, ''))`;

/** Quotes in id order (ids are whole numbers as text). */
export function byQuoteId(a: { id: string }, b: { id: string }): number {
  return a.id.length - b.id.length || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
}

export function costingQuoteFromText(r: string): CostingQuote {
  const f = new Array<string>(11);
  let start = 0;
  for (let k = 0; k < 11; k++) {
    const end = r.indexOf('|', start);
    if (end < 0) throw new Error(`a quote row did not split into its 12 fields: ${r.slice(0, 80)}`);
    f[k] = r.slice(start, end);
    start = end + 1;
  }
  if (r.indexOf('|', start) >= 0) throw new Error(`a quote row did not split into its 12 fields: ${r.slice(0, 80)}`);
  const [id, partId, supplierId, currency, incoterm, moq, orderMultiple, leadTimeDays, validFrom, validUntil, createdAt] = f;
  return {
    id, partId, supplierId, currency, incoterm: incoterm as CostingQuote['incoterm'], moq: Number(moq), orderMultiple: Number(orderMultiple),
    leadTimeDays: leadTimeDays === '' ? null : Number(leadTimeDays), validFrom: validFrom || null, validUntil: validUntil || null,
    createdAt, priceBreaks: parseBreaksText(r.slice(start) || null),
  };
}
