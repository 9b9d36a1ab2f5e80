import { Dec, dec, decOr, HUNDRED, ZERO } from './decimal';
import type { DutyRate } from './types';

/** HS codes are written with and without dots ("8541.41" / "854141"); compare digits only. */
export function normaliseHsCode(code: string): string {
  return code.replace(/[^0-9A-Za-z]/g, '').toUpperCase();
}

export interface DutyMatch {
  /** The duty rate as a fraction (3.7 % → 0.037). */
  rate: Dec;
  ratePct: Dec;
  /** The prefix that matched, or null when the default rate applied. */
  hsPrefix: string | null;
}

export interface DutyTable {
  match(hsCode: string | null | undefined): DutyMatch;
}

/**
 * Duty rate lookup: the longest `hsPrefix` that starts the part's HS code wins; no match
 * (or no HS code) takes `defaultDutyPct`. Prefixes go into a Map, so a lookup is at most
 * one Map hit per digit of the code, whatever the table's size; results are cached per code,
 * so every part with one HS code shares one match object.
 */
export function createDutyTable(dutyRates: DutyRate[] | null | undefined, defaultDutyPct: string | null | undefined): DutyTable {
  const byPrefix = new Map<string, { pct: Dec; prefix: string }>();
  (dutyRates ?? []).forEach((r, i) => {
    const prefix = normaliseHsCode(r.hsPrefix);
    if (prefix === '') return;
    byPrefix.set(prefix, { pct: dec(r.ratePct, `dutyRates.${i}.ratePct`), prefix: r.hsPrefix });
  });
  const defaultPct = decOr(defaultDutyPct, ZERO, 'defaultDutyPct');
  const cache = new Map<string, DutyMatch>();

  return {
    match(hsCode) {
      const raw = hsCode ?? '';
      let hit = cache.get(raw);
      if (hit) return hit;
      const code = normaliseHsCode(raw);
      hit = { rate: defaultPct.div(HUNDRED), ratePct: defaultPct, hsPrefix: null };
      for (let len = code.length; len > 0; len--) {
        const row = byPrefix.get(code.slice(0, len));
        if (row) {
          hit = { rate: row.pct.div(HUNDRED), ratePct: row.pct, hsPrefix: row.prefix };
          break;
        }
      }
      cache.set(raw, hit);
      return hit;
    },
  };
}
