import type { DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';
import type { CostRollInput, BomLine, Part, LandedCostProfile } from '../costing';
import { loadQuotes } from '../quotes/repository';
import { ratesAsOf, pivotOf } from '../fx/repository';
import { getProfile } from '../profiles/repository';
import type { BomRow, LineRow } from './repository';
import { linesOf } from './repository';

/**
 * Runs reads side by side on a pool; inside a transaction (one connection) one after the
 * other, since a connection takes one query at a time.
 */
async function inParallel<T extends readonly (() => Promise<unknown>)[]>(db: DbOrTrx, fns: T): Promise<{ [K in keyof T]: Awaited<ReturnType<T[K]>> }> {
  if ((db as { isTransaction?: boolean }).isTransaction) {
    const out: unknown[] = [];
    for (const fn of fns) out.push(await fn());
    return out as { [K in keyof T]: Awaited<ReturnType<T[K]>> };
  }
  return Promise.all(fns.map((fn) => fn())) as Promise<{ [K in keyof T]: Awaited<ReturnType<T[K]>> }>;
}

export interface CostingData {
  bom: BomRow;
  lines: LineRow[];
  parts: (Part & { internalPn: string; mpn: string; manufacturer: string; description: string; ratings: Record<string, unknown> })[];
  profile: (LandedCostProfile & { id: string; name: string }) | null;
  input: Omit<CostRollInput, 'bom'>;
}

/**
 * Everything a cost roll of one BOM reads, in a fixed number of queries whatever the
 * number of lines: the lines, their parts, the parts' quotes with breaks, the suppliers,
 * the profile, the FX rows as of the costing date and the pivot currency.
 */
export async function loadCostingData(db: DbOrTrx, workspaceId: string, bom: BomRow, date: string): Promise<CostingData> {
  const lines = await linesOf(db, workspaceId, bom.id);
  const partIds = [...new Set(lines.map((l) => l.partId).filter((x): x is string => Boolean(x)))];
  const [parts, quotes, profile, fxRates, pivot] = await inParallel(db, [
    () => partIds.length
      ? (scoped(db, 'parts', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [partIds]).select('id', 'internalPn', 'mpn', 'manufacturer', 'description', 'category', 'mount', 'pins', 'hsCode', 'unitWeightG', 'ratings') as Promise<CostingData['parts']>)
      : Promise.resolve([] as CostingData['parts']),
    () => partIds.length ? loadQuotes(db, workspaceId, { partIds }) : Promise.resolve([]),
    () => bom.profileId ? getProfile(db, workspaceId, bom.profileId) : Promise.resolve(undefined),
    () => ratesAsOf(db, workspaceId, date),
    () => pivotOf(db, workspaceId),
  ] as const);
  const supplierIds = [...new Set(quotes.map((q) => q.supplierId))];
  const suppliers = supplierIds.length
    ? ((await scoped(db, 'suppliers', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [supplierIds]).select('id', 'active', 'name')) as { id: string; active: boolean; name: string }[])
    : [];
  const engineLines: BomLine[] = lines.map((l) => ({
    id: l.id, refDes: l.refDes || null, kind: l.kind as BomLine['kind'], partId: l.partId, qtyPerUnit: l.qtyPerUnit,
    attritionPct: l.attritionPct, pinnedQuoteId: l.pinnedQuoteId, dnp: l.dnp, unitCost: l.unitCost, oneTimeCost: l.oneTimeCost, currency: l.currency,
  }));
  return {
    bom,
    lines,
    parts,
    profile: profile ?? null,
    input: {
      profile: profile ?? {},
      lines: engineLines,
      parts,
      quotes: quotes.map((q) => ({ ...q, createdAt: new Date(q.createdAt).toISOString() })) as unknown as CostRollInput['quotes'],
      suppliers,
      fxRates,
      pivot,
    },
  };
}
