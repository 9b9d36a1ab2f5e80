import { camelColumns, type DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';
import type { CostRollInput, BomLine, Part, LandedCostProfile } from '../costing';
import { byQuoteId, quotesForCosting } from '../quotes/repository';
import { ratesAsOf, pivotOf } from '../fx/repository';
import { getProfile } from '../profiles/repository';
import type { BomRow, LineRow } from './repository';

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

/** What the cost roll and the costed workbook read of a line. */
const COSTING_LINE_COLUMNS = ['id', 'kind', 'refDes', 'partId', 'qtyPerUnit', 'attritionPct', 'pinnedQuoteId', 'dnp', 'note', 'unitCost', 'oneTimeCost', 'currency', 'unresolved'] as const;
export type CostingLine = Pick<LineRow, (typeof COSTING_LINE_COLUMNS)[number]>;

export interface CostingData {
  bom: BomRow;
  lines: CostingLine[];
  parts: (Part & { internalPn: string; mpn: string; manufacturer: string })[];
  profile: (LandedCostProfile & { id: string; name: string }) | null;
  input: Omit<CostRollInput, 'bom'>;
}

/**
 * Everything a cost roll of one BOM reads, in a fixed number of queries whatever the
 * number of lines: the lines, their parts, the parts' quotes with breaks, the suppliers,
 * the profile, the FX rows as of the costing date and the pivot currency.
 */
export async function loadCostingData(db: DbOrTrx, workspaceId: string, bom: BomRow, date: string): Promise<CostingData> {
  // The parts and quotes are found from the BOM inside their own queries, so every read
  // runs side by side with the lines instead of after them.
  const bomParts = 'ARRAY(SELECT part_id FROM bom_lines WHERE workspace_id = ? AND bom_id = ? AND part_id IS NOT NULL)';
  const [lines, parts, quotesA, quotesB, suppliers, profile, fxRates, pivot] = await inParallel(db, [
    // Only the columns read: a 10,000-line BOM's timestamps alone took longer to parse than the rest.
    () => scoped(db, 'bom_lines', workspaceId).andWhere({ bomId: bom.id }).orderBy([{ column: 'position' }, { column: 'id' }]).select(camelColumns(db, COSTING_LINE_COLUMNS)) as unknown as Promise<CostingLine[]>,
    () => scoped(db, 'parts', workspaceId)
      .andWhereRaw(`id = ANY(${bomParts})`, [workspaceId, bom.id])
      .select(camelColumns(db, ['id', 'internalPn', 'mpn', 'manufacturer', 'category', 'mount', 'pins', 'hsCode', 'unitWeightG'])) as Promise<CostingData['parts']>,
    // The quotes, the largest read by far, in two halves side by side: PostgreSQL makes one
    // half while Node reads the other (a 10,000-line BOM's 40,000 quotes: 250 → 180 ms).
    () => quotesForCosting(db, workspaceId, { bomId: bom.id, share: { index: 0, of: 2 } }),
    () => quotesForCosting(db, workspaceId, { bomId: bom.id, share: { index: 1, of: 2 } }),
    // All the workspace's suppliers (tens, not thousands): no wait for the quotes first.
    () => scoped(db, 'suppliers', workspaceId).select('id', 'active', 'name') as Promise<{ id: string; active: boolean; name: string }[]>,
    () => bom.profileId ? getProfile(db, workspaceId, bom.profileId) : Promise.resolve(undefined),
    () => ratesAsOf(db, workspaceId, date),
    () => pivotOf(db, workspaceId),
  ] as const);
  const quotes = quotesA.concat(quotesB).sort(byQuoteId);
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
      quotes,
      suppliers,
      fxRates,
      pivot,
    },
  };
}
