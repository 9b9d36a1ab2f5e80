import type { Deps } from '../deps';
import { errors } from '../http/errors';
import type { DbOrTrx } from '../db/knex';
import { quoteBoard, CostingInputError, type FxRate, type Quote } from '../costing';
import { loadQuotes, today } from './repository';
import { RATES_AS_OF_SQL } from '../fx/repository';
import { getProfile, firstProfile } from '../profiles/repository';

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
  // Three reads side by side: under load each round trip waits its turn.
  const [context, profile, quotes] = await Promise.all([
    boardContext(deps.db, workspaceId, partId, date),
    query.profileId ? getProfile(deps.db, workspaceId, query.profileId) : firstProfile(deps.db, workspaceId),
    loadQuotes(deps.db, workspaceId, { partIds: [partId] }),
  ]);
  if (!context) throw errors.notFound('part');
  const { part, suppliers, fxRates, pivot } = context;
  if (query.profileId && !profile) throw errors.validation('No such landed-cost profile in this workspace.', [{ path: 'profileId', message: 'refers to a missing profile' }]);
  const currency = query.currency ?? profile?.currency ?? 'USD';
  try {
    const board = quoteBoard({
      partId, qty: query.qty, date, currency, profile: profile ?? {}, part: { hsCode: part.hsCode },
      quotes: quotes as unknown as Quote[], suppliers, fxRates, pivot,
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
 * The part, with what every offer on it needs from its workspace, in one statement: the
 * pivot currency, all the suppliers (tens, not thousands) and the FX rates as of `date`.
 */
async function boardContext(db: DbOrTrx, workspaceId: string, partId: string, date: string) {
  const { rows } = (await db.raw(
    `SELECT p.id, p.hs_code AS "hsCode", coalesce(w.pivot_currency, 'EUR') AS pivot,
            (SELECT coalesce(json_agg(json_build_object('id', s.id::text, 'active', s.active, 'name', s.name)), '[]') FROM suppliers s WHERE s.workspace_id = p.workspace_id) AS suppliers,
            (SELECT coalesce(json_agg(f), '[]') FROM (${RATES_AS_OF_SQL}) f) AS "fxRates"
       FROM parts p JOIN workspaces w ON w.id = p.workspace_id
      WHERE p.workspace_id = ? AND p.id = ?`,
    [workspaceId, date, workspaceId, partId],
  )) as { rows: { id: string; hsCode: string | null; pivot: string; suppliers: { id: string; active: boolean; name: string }[]; fxRates: (FxRate & { id: string })[] }[] };
  const row = rows[0];
  return row && { part: { id: row.id, hsCode: row.hsCode }, pivot: row.pivot, suppliers: row.suppliers, fxRates: row.fxRates };
}
