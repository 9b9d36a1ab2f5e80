import type { Knex } from 'knex';
import { parseValue } from '../../src/shared/units';

const likeEscape = (s: string) => s.replace(/[%_\\]/g, '\\$&');

/**
 * Free-text part search in the trade's own words: every token must match. A token that
 * reads as a value (`10k`, `2n2`, `22M`, `2kV`) matches any rating equal to it; any token
 * also matches the part number, MPN, maker, package, category or description as text,
 * so `10k 0603` finds 10 kΩ resistors in 0603.
 */
export function applyPartSearch(q: Knex.QueryBuilder, text: string, table = 'parts'): Knex.QueryBuilder {
  const tokens = text.trim().split(/\s+/).filter(Boolean).slice(0, 8);
  for (const token of tokens) {
    const like = `%${likeEscape(token)}%`;
    const value = parseValue(token);
    q.andWhere((w) => {
      w.whereRaw(
        `(${table}.internal_pn ILIKE ? OR ${table}.mpn ILIKE ? OR ${table}.manufacturer ILIKE ? OR ${table}.package ILIKE ? OR ${table}.category ILIKE ? OR ${table}.description ILIKE ?)`,
        [like, like, like, like, like, like],
      );
      if (value.ok && value.value > 0) {
        w.orWhereRaw(
          `EXISTS (SELECT 1 FROM jsonb_each(${table}.ratings) e WHERE jsonb_typeof(e.value) = 'number' AND abs((e.value)::text::float8 - ?) <= ? )`,
          [value.value, Math.abs(value.value) * 1e-9],
        );
      }
    });
  }
  return q;
}
