import { priceBreaks as priceBreaksSchema } from '../../shared/schemas/quotes';

/** A price-break row as typed in the editor. */
export type PriceBreakRow = { minQty: string; unitPrice: string };

export type PriceBreakProblem = { index: number; field: 'minQty' | 'unitPrice' | null; message: string };

/** Quantities as people type them: "5,000", "5 000" and "5_000" are 5000. */
export function readQty(text: string): number | null {
  const compact = text.trim().replace(/[,\s_]/g, '');
  return /^\d{1,13}$/.test(compact) ? Number(compact) : null;
}

/**
 * Checks the price-break rows as the editor shows them, with the shared rule: at least
 * one break, whole minimum quantities from 1, strictly ascending, positive prices with
 * at most 6 decimals. Answers the breaks ready to send, or each problem by row and field.
 */
export function checkPriceBreaks(
  rows: readonly PriceBreakRow[],
): { ok: true; value: { minQty: number; unitPrice: string }[] } | { ok: false; problems: PriceBreakProblem[] } {
  const problems: PriceBreakProblem[] = [];
  const typed = rows.map((row, index) => {
    const minQty = readQty(row.minQty);
    if (minQty === null) problems.push({ index, field: 'minQty', message: row.minQty.trim() ? 'must be a whole number of pieces' : 'is required' });
    const unitPrice = row.unitPrice.trim();
    if (!unitPrice) problems.push({ index, field: 'unitPrice', message: 'is required' });
    return { minQty: minQty ?? 0, unitPrice };
  });
  const checked = priceBreaksSchema.safeParse(typed);
  if (!checked.success) {
    for (const issue of checked.error.issues) {
      const [index, field] = issue.path;
      if (typeof index !== 'number') {
        problems.push({ index: -1, field: null, message: issue.message });
        continue;
      }
      const name = field === 'minQty' || field === 'unitPrice' ? field : null;
      // Keep the first, plainest message per field ("is required" beats a format rule).
      if (!problems.some((p) => p.index === index && p.field === name)) problems.push({ index, field: name, message: issue.message });
    }
  }
  if (problems.length) return { ok: false, problems };
  return { ok: true, value: checked.success ? checked.data : [] };
}

/**
 * The quantity a new tier most likely starts at: ten times the last one (5,000 → 50,000),
 * the step suppliers commonly quote in (common practice). Empty when there is no last one.
 */
export function suggestNextMinQty(rows: readonly PriceBreakRow[]): string {
  for (let i = rows.length - 1; i >= 0; i -= 1) {
    const qty = readQty(rows[i].minQty);
    if (qty !== null) return String(qty * 10);
  }
  return rows.length === 0 ? '1' : '';
}

/** Rows in ascending minimum quantity, unreadable ones last: tidies an editor after typing out of order. */
export function sortPriceBreakRows(rows: readonly PriceBreakRow[]): PriceBreakRow[] {
  return [...rows].sort((a, b) => (readQty(a.minQty) ?? Number.POSITIVE_INFINITY) - (readQty(b.minQty) ?? Number.POSITIVE_INFINITY));
}
