import Papa from 'papaparse';
import { fxRateBody, type FxRateBody } from '../../src/shared/schemas/fx';

export interface FeedProblem {
  row: number;
  message: string;
}

/**
 * A daily reference-rate feed quoted against EUR, as CSV, in either of two shapes:
 * long — `date,currency,rate` (one rate per row), or wide — `Date,USD,JPY,…` (one day per
 * row, "N/A" for a missing rate, as the euro reference-rate files are laid out). Every row
 * becomes (date, EUR, currency, rate): 1 EUR = rate currency.
 */
export function parseEurFeed(text: string): { rates: FxRateBody[]; problems: FeedProblem[] } {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy' });
  const rows = parsed.data.map((r) => r.map((c) => (c ?? '').trim()));
  const problems: FeedProblem[] = [];
  const rates: FxRateBody[] = [];
  if (rows.length < 2) return { rates, problems: [{ row: 1, message: 'the file has no data rows' }] };
  const header = rows[0].map((h) => h.toLowerCase());
  const add = (row: number, date: string, ccy: string, rate: string) => {
    const r = fxRateBody.safeParse({ date, base: 'EUR', quote: ccy, rate });
    if (r.success) rates.push(r.data);
    else problems.push({ row, message: r.error.issues.map((i) => `${i.path.join('.') || 'row'} ${i.message}`).join('; ') });
  };
  const iDate = header.indexOf('date');
  const iCcy = header.indexOf('currency');
  const iRate = header.indexOf('rate');
  if (iDate >= 0 && iCcy >= 0 && iRate >= 0) {
    rows.slice(1).forEach((r, k) => add(k + 2, r[iDate] ?? '', r[iCcy] ?? '', r[iRate] ?? ''));
  } else if (iDate === 0 && header.slice(1).some((h) => /^[a-z]{3}$/.test(h))) {
    const codes = rows[0].slice(1);
    rows.slice(1).forEach((r, k) => {
      codes.forEach((code, j) => {
        const v = r[j + 1] ?? '';
        if (!code || v === '' || /^n\/?a$/i.test(v)) return;
        add(k + 2, r[0], code.toUpperCase(), v);
      });
    });
  } else {
    problems.push({ row: 1, message: 'the header must be "date,currency,rate" or "Date,USD,JPY,…"' });
  }
  if (rows.length > 100_001) problems.unshift({ row: 1, message: 'the file has more than 100,000 rows' });
  return { rates, problems };
}
