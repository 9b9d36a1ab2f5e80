import type { Deps } from '../deps';
import { errors } from '../http/errors';
import { camelToSnake, type DbOrTrx } from '../db/knex';
import { quoteBoard, CostingInputError, type FxRate } from '../costing';
import { COSTING_QUOTE_TEXT_SQL, costingQuoteFromText, today } from './repository';
import { RATES_AS_OF_SQL } from '../fx/repository';
import { PROFILE_FIELDS, type ProfileRow } from '../profiles/repository';

const PROFILE_COLUMNS = PROFILE_FIELDS.map((f) => `prof.${camelToSnake(f)} AS "profile:${f}"`).join(', ');

export interface BoardQuery {
  qty: number;
  currency?: string;
  profileId?: string;
  date?: string;
}

/**
 * The quote board for one part: every offer at the quantity needed, in one currency and
 * landed-cost profile (percentage adders and duty only; per-shipment amounts belong to a
 * BOM's cost roll). Reads its data in a fixed number of queries.
 */
export async function offersForPart(deps: Deps, workspaceId: string, partId: string, query: BoardQuery) {
  const date = query.date ?? today();
  const context = await boardContext(deps.db, workspaceId, partId, date, query.profileId);
  if (!context) throw errors.notFound('part');
  const { part, suppliers, fxRates, pivot, quotes, profile } = context;
  if (query.profileId && !profile) throw errors.validation('No such landed-cost profile in this workspace.', [{ path: 'profileId', message: 'refers to a missing profile' }]);
  const currency = query.currency ?? profile?.currency ?? 'USD';
  try {
    const board = quoteBoard({
      partId, qty: query.qty, date, currency, profile: profile ?? {}, part: { hsCode: part.hsCode },
      quotes, suppliers, fxRates, pivot,
    });
    const names = new Map(suppliers.map((s: { id: string; name: string }) => [s.id, s.name]));
    return {
      ...board,
      profileId: profile?.id ?? null,
      profileName: profile?.name ?? null,
      offers: board.offers.map((o) => ({ ...o, supplierName: names.get(o.supplierId) ?? null })),
    };
  } catch (err) {
    if (err instanceof CostingInputError) throw errors.validation(err.message);
    throw err;
  }
}

/**
 * Everything the board reads, in one statement (under load every round trip waits its
 * turn for a connection): the part; the pivot currency, all the suppliers (tens, not
 * thousands) and the FX rates as of `date`; the part's quotes as the cost roll reads them;
 * and the profile asked for, or else the workspace's first. The profile's columns come
 * as columns, not JSON, so its decimals stay exact text; each is named "profile:<field>"
 * (no underscore, so the camelCasing of result rows leaves the name as it is).
 */
async function boardContext(db: DbOrTrx, workspaceId: string, partId: string, date: string, profileId: string | undefined) {
  const { rows } = (await db.raw(
    `SELECT p.id AS "partId", p.hs_code AS "hsCode", coalesce(w.pivot_currency, 'EUR') AS pivot,
            (SELECT coalesce(json_agg(json_build_object('id', s.id::text, 'active', s.active, 'name', s.name)), '[]') FROM suppliers s WHERE s.workspace_id = p.workspace_id) AS suppliers,
            (SELECT coalesce(json_agg(f), '[]') FROM (${RATES_AS_OF_SQL}) f) AS "fxRates",
            ARRAY(SELECT ${COSTING_QUOTE_TEXT_SQL} FROM quotes q WHERE q.workspace_id = p.workspace_id AND q.part_id = p.id ORDER BY q.id) AS "quoteTexts",
            ${PROFILE_COLUMNS}
       FROM parts p JOIN workspaces w ON w.id = p.workspace_id
       LEFT JOIN LATERAL (
         SELECT * FROM landed_cost_profiles l WHERE l.workspace_id = p.workspace_id AND (?::bigint IS NULL OR l.id = ?::bigint) ORDER BY l.id LIMIT 1
       ) prof ON true
      WHERE p.workspace_id = ? AND p.id = ?`,
    [workspaceId, date, profileId ?? null, profileId ?? null, workspaceId, partId],
  )) as { rows: (Record<string, unknown> & { partId: string; hsCode: string | null; pivot: string; suppliers: { id: string; active: boolean; name: string }[]; fxRates: (FxRate & { id: string })[]; quoteTexts: string[] })[] };
  const row = rows[0];
  if (!row) return undefined;
  return {
    part: { id: row.partId, hsCode: row.hsCode },
    pivot: row.pivot,
    suppliers: row.suppliers,
    fxRates: row.fxRates,
    quotes: row.quoteTexts.map(costingQuoteFromText),
    profile: row['profile:id'] == null ? undefined : (Object.fromEntries(PROFILE_FIELDS.map((f) => [f, row[`profile:${f}`]])) as unknown as ProfileRow),
  };
}
