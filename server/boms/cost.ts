import type { Deps } from '../deps';
import type { DbOrTrx } from '../db/knex';
import { errors } from '../http/errors';
import { costRoll, volumeCurve, shelfLadder, prepareCostRoll, rollPrepared, CostingInputError, type CostRollLine, type CostRollResult } from '../costing';
import { today } from '../quotes/repository';
import { loadCostingData, type CostingData } from './inputs';
import { getBom, type BomRow } from './repository';

function engine<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof CostingInputError) throw errors.validation(err.message);
    throw err;
  }
}

type NamedLine = CostRollLine & { internalPn: string | null; mpn: string | null; supplierName: string | null };

/**
 * Names beside ids, so the client and the export need no second lookup. The lines are the
 * roll's own fresh objects, named in place: copying 10,000 of them cost more than naming.
 */
function decorate(data: CostingData, result: CostRollResult) {
  const parts = new Map(data.parts.map((p) => [p.id, p]));
  const suppliers = new Map(data.input.suppliers.map((s) => [s.id, s.name ?? '']));
  const lines = result.lines as NamedLine[];
  for (const l of lines) {
    const p = l.partId ? parts.get(l.partId) : undefined;
    l.internalPn = p?.internalPn ?? null;
    l.mpn = p?.mpn ?? null;
    l.supplierName = l.supplierId ? suppliers.get(l.supplierId) ?? null : null;
  }
  return {
    ...result,
    bomId: data.bom.id,
    profileId: data.profile?.id ?? null,
    profileName: data.profile?.name ?? null,
    lines,
    bySupplier: result.bySupplier.map((s) => ({ ...s, supplierName: suppliers.get(s.supplierId) ?? null })),
  };
}

export type CostView = ReturnType<typeof decorate>;

export async function costOf(db: DbOrTrx, workspaceId: string, bom: BomRow, qty?: number, date?: string): Promise<CostView> {
  const d = date ?? today();
  const data = await loadCostingData(db, workspaceId, bom, d);
  const result = engine(() =>
    costRoll({
      ...data.input,
      bom: { qty: qty ?? bom.plannedQty, date: d, reportingCurrency: bom.reportingCurrency, amortisationQty: bom.amortisationQty, targetUnitCost: bom.targetUnitCost },
    }),
  );
  return decorate(data, result);
}

/**
 * The cost roll's totals without its lines (the running panel): the same figures by the
 * volume curve's totals-only roll, several times cheaper on a large BOM.
 */
export async function costTotalsOf(db: DbOrTrx, workspaceId: string, bom: BomRow, qty?: number, date?: string): Promise<CostView> {
  const d = date ?? today();
  const data = await loadCostingData(db, workspaceId, bom, d);
  const result = engine(() => {
    const prepared = prepareCostRoll({
      ...data.input,
      bom: { qty: qty ?? bom.plannedQty, date: d, reportingCurrency: bom.reportingCurrency, amortisationQty: bom.amortisationQty, targetUnitCost: bom.targetUnitCost },
    });
    return rollPrepared(prepared, qty ?? bom.plannedQty, { lines: false });
  });
  return decorate(data, result);
}

export async function curveOf(deps: Deps, workspaceId: string, bomId: string, quantities: number[] | undefined, date?: string) {
  const bom = await getBom(deps.db, workspaceId, bomId);
  const d = date ?? today();
  const qs = quantities ?? defaultCurve(bom.plannedQty);
  const data = await loadCostingData(deps.db, workspaceId, bom, d);
  const curve = engine(() =>
    volumeCurve({ ...data.input, bom: { qty: bom.plannedQty, date: d, reportingCurrency: bom.reportingCurrency, amortisationQty: bom.amortisationQty, targetUnitCost: bom.targetUnitCost } }, qs),
  );
  return { bomId, ...curve };
}

/** 12 quantities around the planned one, from a tenth to ten times it. */
export function defaultCurve(planned: number): number[] {
  const factors = [0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3, 5, 7.5, 10];
  return [...new Set(factors.map((f) => Math.max(1, Math.round(planned * f))))];
}

export async function ladderOf(deps: Deps, workspaceId: string, bomId: string, qty?: number) {
  const bom = await getBom(deps.db, workspaceId, bomId);
  const shelf = bom.shelf ?? {};
  if (!shelf.price) throw errors.validation('Set the shelf price of this BOM first.', [{ path: 'shelf.price', message: 'is required for the ladder' }]);
  const cost = await costOf(deps.db, workspaceId, bom, qty);
  const ladder = engine(() =>
    shelfLadder({
      price: shelf.price!, vatPct: shelf.vatPct ?? '0', retailerMarginPct: shelf.retailerMarginPct ?? '0', importerMarginPct: shelf.importerMarginPct ?? '0',
      freightToStorePerUnit: shelf.freightToStorePerUnit ?? '0', landedPerUnit: cost.totals.landedPerUnit,
    }),
  );
  return { bomId, qty: cost.qty, currency: bom.reportingCurrency, shelf, ...ladder, leftOut: cost.leftOut.count };
}
