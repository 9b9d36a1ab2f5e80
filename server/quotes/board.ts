import type { Deps } from '../deps';
import { errors } from '../http/errors';
import { getOrNotFound } from '../db/versioned';
import { scoped } from '../db/scope';
import { quoteBoard, CostingInputError, type Quote } from '../costing';
import { loadQuotes, today } from './repository';
import { ratesAsOf, pivotOf } from '../fx/repository';
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
  // Every read side by side: under load each sequential round trip waits its turn.
  const [part, profile, quotes, suppliers, fxRates, pivot] = await Promise.all([
    getOrNotFound<{ id: string; hsCode: string | null }>(deps.db, 'parts', workspaceId, partId, 'part'),
    query.profileId ? getProfile(deps.db, workspaceId, query.profileId) : firstProfile(deps.db, workspaceId),
    loadQuotes(deps.db, workspaceId, { partIds: [partId] }),
    // All the workspace's suppliers (tens, not thousands): no wait for the quotes first.
    scoped(deps.db, 'suppliers', workspaceId).select('id', 'active', 'name') as Promise<{ id: string; active: boolean; name: string }[]>,
    ratesAsOf(deps.db, workspaceId, date),
    pivotOf(deps.db, workspaceId),
  ]);
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
