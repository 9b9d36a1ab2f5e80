import { rfqAnswerBody, type RfqAnswerBody } from '../../shared/schemas/rfqs';
import type { incoterms } from '../../shared/schemas/trade';
import type { FieldProblem } from '../../lib/api-client';
import { parseQuantity } from './quantities';
import type { RfqReply } from './reply-api';

export type Incoterm = (typeof incoterms)[number];

/** A price-break row as typed; a row whose price is left empty is not sent. */
export type BreakRow = { minQty: string; unitPrice: string };

/** One requested part's answer as the supplier types it (text, so nothing is lost while typing). */
export type ReplyItemForm = {
  itemId: string;
  declined: boolean;
  currency: string;
  incoterm: Incoterm;
  moq: string;
  orderMultiple: string;
  leadTimeDays: string;
  validUntil: string;
  priceBreaks: BreakRow[];
  note: string;
};

export type ReplyForm = { items: ReplyItemForm[] };

/** The date today as the server counts it (UTC), YYYY-MM-DD. */
export const todayIso = () => new Date().toISOString().slice(0, 10);

/**
 * A fresh form: the supplier's own currency and Incoterm as the buyer keeps them, and one
 * price-break row per requested quantity, so the common answer is only prices.
 */
export function initialReplyForm(view: Pick<RfqReply, 'items' | 'quantities' | 'defaultCurrency' | 'defaultIncoterm'>): ReplyForm {
  return {
    items: view.items.map((item) => ({
      itemId: item.itemId,
      declined: false,
      currency: view.defaultCurrency,
      incoterm: view.defaultIncoterm,
      moq: '',
      orderMultiple: '1',
      leadTimeDays: '',
      validUntil: '',
      priceBreaks: view.quantities.map((qty) => ({ minQty: String(qty), unitPrice: '' })),
      note: '',
    })),
  };
}

/** A part counts as answered once it is declined or has a price. */
export function isAnswered(item: ReplyItemForm): boolean {
  return item.declined || item.priceBreaks.some((row) => row.unitPrice.trim() !== '');
}

/**
 * Where each sent entry came from: `items[k]` of the body is form item `item`, and its
 * `priceBreaks[j]` is form row `rows[j]`. Server problems name body positions; this puts
 * them back on the fields the supplier typed in.
 */
export type BodyMap = { item: number; rows: number[] }[];

type Built = { body: { items: Record<string, unknown>[] }; map: BodyMap; problems: FieldProblem[] };

function count(text: string, path: string, problems: FieldProblem[], opts: { zero?: boolean } = {}): number {
  const trimmed = text.trim();
  if (!trimmed) {
    problems.push({ path, message: 'is required' });
    return Number.NaN;
  }
  if (opts.zero && /^0+$/.test(trimmed)) return 0;
  const value = parseQuantity(trimmed);
  if (value === null) {
    problems.push({ path, message: opts.zero ? 'must be a whole number of days' : 'must be a whole number of pieces' });
    return Number.NaN;
  }
  return value;
}

/** Turns the typed form into the answer body, noting what could not be read. */
function build(form: ReplyForm, today: string): Built {
  const items: Record<string, unknown>[] = [];
  const map: BodyMap = [];
  const problems: FieldProblem[] = [];
  form.items.forEach((item, i) => {
    if (!isAnswered(item)) return;
    if (item.declined) {
      items.push({ itemId: item.itemId, declined: true });
      map.push({ item: i, rows: [] });
      return;
    }
    const at = (field: string) => `items.${i}.${field}`;
    const rows: number[] = [];
    const priceBreaks = item.priceBreaks.flatMap((row, r) => {
      if (!row.unitPrice.trim()) return [];
      rows.push(r);
      return [{ minQty: count(row.minQty, at(`priceBreaks.${r}.minQty`), problems), unitPrice: row.unitPrice.trim() }];
    });
    const validUntil = item.validUntil.trim();
    if (!validUntil) problems.push({ path: at('validUntil'), message: 'is required' });
    else if (/^\d{4}-\d{2}-\d{2}$/.test(validUntil) && validUntil < today) problems.push({ path: at('validUntil'), message: 'must be today or later' });
    items.push({
      itemId: item.itemId,
      declined: false,
      currency: item.currency.trim().toUpperCase(),
      incoterm: item.incoterm,
      moq: count(item.moq, at('moq'), problems),
      orderMultiple: count(item.orderMultiple, at('orderMultiple'), problems),
      leadTimeDays: count(item.leadTimeDays, at('leadTimeDays'), problems, { zero: true }),
      validUntil,
      priceBreaks,
      ...(item.note.trim() ? { note: item.note.trim() } : {}),
    });
    map.push({ item: i, rows });
  });
  return { body: { items }, map, problems };
}

/**
 * Where a problem the server (or the shared schema) reports for the body belongs in the
 * form: "items.1.priceBreaks.0.unitPrice" → the field of that form item and row. The
 * server's checks after its schema name an item by its id instead of its position (an
 * offer valid until a past date, "must be today or later"; a part not in the request), so
 * those are looked up by id.
 */
export function formPath(path: string, map: BodyMap, form: ReplyForm, message = ''): string | null {
  const [head, key, ...rest] = path.split('.');
  if (head !== 'items' || key === undefined) return null;
  const byId = form.items.findIndex((item) => item.itemId === key);
  if (byId >= 0 && (rest.length === 0 || (rest[0] === 'validUntil' && /today/.test(message)))) {
    return ['items', byId, ...rest].join('.');
  }
  const entry = /^\d+$/.test(key) ? map[Number(key)] : undefined;
  if (!entry) return null;
  if (rest[0] === 'priceBreaks' && rest[1] !== undefined && /^\d+$/.test(rest[1])) {
    const row = entry.rows[Number(rest[1])];
    return row === undefined ? `items.${entry.item}.priceBreaks` : ['items', entry.item, 'priceBreaks', row, ...rest.slice(2)].join('.');
  }
  return ['items', entry.item, ...rest].join('.');
}

export type CheckedReply =
  | { ok: true; body: RfqAnswerBody; map: BodyMap }
  | { ok: false; problems: FieldProblem[]; map: BodyMap; message: string | null };

/**
 * Checks the form with the shared answer schema (the one the server validates with) and
 * answers the body to send, or each problem on its form field. Parts neither priced nor
 * declined are left out: the supplier may answer some parts now and the rest later.
 */
export function checkReply(form: ReplyForm, today = todayIso()): CheckedReply {
  const { body, map, problems } = build(form, today);
  if (body.items.length === 0) {
    return { ok: false, problems: [], map, message: 'Enter prices for at least one part, or decline the parts you do not supply.' };
  }
  const parsed = rfqAnswerBody.safeParse(body);
  const all = [...problems];
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const where = formPath(issue.path.join('.'), map, form, issue.message) ?? issue.path.join('.');
      // Our own reading comes first: "is required" says more than "expected number".
      if (!all.some((p) => p.path === where)) all.push({ path: where, message: issue.message });
    }
  }
  if (all.length || !parsed.success) return { ok: false, problems: all, map, message: null };
  return { ok: true, body: parsed.data, map };
}
