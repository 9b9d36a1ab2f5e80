import type { Deps } from '../deps';
import { errors } from '../http/errors';
import { getOrNotFound } from '../db/versioned';
import { scoped } from '../db/scope';
import { quoteBoard, CostingInputError, type Quote } from '../costing';
import { loadQuotes, today } from './repository';
import { ratesAsOf, pivotOf } from '../fx/repository';
import { getProfile, firstProfile, type ProfileRow } from '../profiles/repository';

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
  const part = await getOrNotFound<{ id: string; hsCode: string | null }>(deps.db, 'parts', workspaceId, partId, 'part');
  let profile: ProfileRow | undefined;
  if (query.profileId) {
    profile = await getProfile(deps.db, workspaceId, query.profileId);
    if (!profile) throw errors.validation('No such landed-cost profile in this workspace.', [{ path: 'profileId', message: 'refers to a missing profile' }]);
  } else {
    profile = await firstProfile(deps.db, workspaceId);
  }
  const date = query.date ?? today();
  const currency = query.currency ?? profile?.currency ?? 'USD';
  const quotes = await loadQuotes(deps.db, workspaceId, { partIds: [partId] });
  const supplierIds = [...new Set(quotes.map((q) => q.supplierId))];
  const suppliers = supplierIds.length ? await scoped(deps.db, 'suppliers', workspaceId).whereIn('id', supplierIds).select('id', 'active', 'name') : [];
  const [fxRates, pivot] = await Promise.all([ratesAsOf(deps.db, workspaceId, date), pivotOf(deps.db, workspaceId)]);
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
