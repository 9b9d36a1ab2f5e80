import { dec, Dec, ONE } from './decimal';
import type { CurrencyCode, FxRate, FxRateUsed, FxRoute, IsoDate } from './types';

interface Row {
  date: IsoDate;
  rate: Dec;
  source: FxRate;
}

/** A usable conversion: multiply an amount in `from` by `rate` to get `to`. */
export interface FxFound {
  ok: true;
  from: CurrencyCode;
  to: CurrencyCode;
  rate: Dec;
  route: FxRoute;
  /** The table rows behind the rate, with their dates (none for the same currency). */
  rows: FxRateUsed[];
}

/** No usable rate: the caller leaves the amount out and says so; it is never taken as 1. */
export interface FxMissing {
  ok: false;
  code: 'missing_fx';
  from: CurrencyCode;
  to: CurrencyCode;
  date: IsoDate;
}

export type FxLookup = FxFound | FxMissing;

export interface FxIndex {
  pivot: CurrencyCode;
  /** Rate from → to on date d, per the costing rules; results are cached. */
  lookup(from: CurrencyCode, to: CurrencyCode, date: IsoDate): FxLookup;
}

// A leg as a fraction num/den, so a cross rate through the pivot costs one division
// (ECB[B] / ECB[A]) instead of rounding an inverse first.
interface Leg {
  num: Dec;
  den: Dec;
  row: FxRateUsed;
}

const pairKey = (base: string, quote: string) => `${base}>${quote}`;

function usedRow(row: Row, inverted: boolean): FxRateUsed {
  return { date: row.date, base: row.source.base, quote: row.source.quote, rate: row.source.rate, inverted };
}

/**
 * Builds the rate index once: rows grouped by currency pair and sorted by date, so a lookup
 * is a binary search and 10,000 conversions cost a handful of Map hits. Rows with a
 * rate ≤ 0 are not usable and are skipped. For one pair and date the last row given wins
 * (the database's unique key makes that moot).
 */
export function createFxIndex(rates: FxRate[], options: { pivot?: CurrencyCode } = {}): FxIndex {
  const pivot = (options.pivot ?? 'EUR').toUpperCase();
  const byPair = new Map<string, Row[]>();
  rates.forEach((r, i) => {
    const rate = dec(r.rate, `fxRates.${i}.rate`);
    if (rate.lte(0)) return;
    const key = pairKey(r.base.toUpperCase(), r.quote.toUpperCase());
    let list = byPair.get(key);
    if (!list) byPair.set(key, (list = []));
    list.push({ date: r.date, rate, source: r });
  });
  for (const list of byPair.values()) {
    // Stable sort: equal dates keep input order, and the search below takes the last.
    list.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  }

  function latest(base: string, quote: string, date: IsoDate): Row | undefined {
    const list = byPair.get(pairKey(base, quote));
    if (!list) return undefined;
    let lo = 0;
    let hi = list.length - 1;
    let found = -1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      if (list[mid].date <= date) {
        found = mid;
        lo = mid + 1;
      } else hi = mid - 1;
    }
    return found < 0 ? undefined : list[found];
  }

  // Direct A→B, else the inverse of B→A.
  function leg(from: string, to: string, date: IsoDate): Leg | undefined {
    const direct = latest(from, to, date);
    if (direct) return { num: direct.rate, den: ONE, row: usedRow(direct, false) };
    const inverse = latest(to, from, date);
    if (inverse) return { num: ONE, den: inverse.rate, row: usedRow(inverse, true) };
    return undefined;
  }

  const cache = new Map<string, FxLookup>();

  function compute(from: string, to: string, date: IsoDate): FxLookup {
    if (from === to) return { ok: true, from, to, rate: ONE, route: 'same', rows: [] };
    const one = leg(from, to, date);
    if (one) {
      return {
        ok: true,
        from,
        to,
        rate: one.den.eq(1) ? one.num : one.num.div(one.den),
        route: one.row.inverted ? 'inverse' : 'direct',
        rows: [one.row],
      };
    }
    if (from !== pivot && to !== pivot) {
      const a = leg(from, pivot, date);
      const b = a && leg(pivot, to, date);
      if (a && b) {
        return {
          ok: true,
          from,
          to,
          rate: a.num.times(b.num).div(a.den.times(b.den)),
          route: 'pivot',
          rows: [a.row, b.row],
        };
      }
    }
    return { ok: false, code: 'missing_fx', from, to, date };
  }

  return {
    pivot,
    lookup(fromRaw, toRaw, date) {
      const from = fromRaw.toUpperCase();
      const to = toRaw.toUpperCase();
      const key = `${from}>${to}@${date}`;
      let hit = cache.get(key);
      if (!hit) cache.set(key, (hit = compute(from, to, date)));
      return hit;
    },
  };
}

/** Converts an amount, or reports the missing rate. */
export function convert(
  index: FxIndex,
  amount: Dec,
  from: CurrencyCode,
  to: CurrencyCode,
  date: IsoDate,
): { ok: true; value: Dec; fx: FxFound } | FxMissing {
  const fx = index.lookup(from, to, date);
  if (!fx.ok) return fx;
  return { ok: true, value: amount.times(fx.rate), fx };
}
