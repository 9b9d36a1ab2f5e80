import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import { scoped } from '../db/scope';
import { errors } from '../http/errors';
import { audit } from '../audit/repository';
import { checksFor, worstStatus, severityRank, type StressStatus } from '../derating';
import { prepareCostRoll, rollPrepared, Dec, type CostRollInput } from '../costing';
import { getBom, linesOf, lineView, type BomRow } from '../boms/repository';
import { loadCostingData } from '../boms/inputs';
import { loadQuotes, today } from '../quotes/repository';
import { newRevisionIn, updateLine } from '../boms/service';
import { policyFor } from './policies';
import { operatingPointOf, lineOf } from './service';

const passing: StressStatus[] = ['clear', 'close'];

/** The value that defines what a part does in the circuit, by category; other categories have none. */
const valueKey: Record<string, string | undefined> = { resistor: 'resistanceOhm', capacitor: 'capacitanceF' };

function sameValue(category: string, a: Record<string, unknown>, b: Record<string, unknown>): boolean {
  const key = valueKey[category];
  if (!key) return true;
  const x = Number(a?.[key]);
  const y = Number(b?.[key]);
  if (!Number.isFinite(x) || !Number.isFinite(y)) return false;
  return Math.abs(x - y) <= Math.abs(x) * 1e-9;
}

/**
 * Parts of the line's category that pass at its operating point under the BOM's policy,
 * ranked by the BOM's landed cost per unit at the planned quantity with that part on the
 * line (the cost roll's own engine and quotes). For a line that already passes, only parts
 * that also cost less are offered: the cost-down direction.
 */
export async function alternativesFor(deps: Deps, workspaceId: string, bomId: string, lineId: string) {
  const bom = await getBom(deps.db, workspaceId, bomId);
  const line = await lineOf(deps.db, workspaceId, bomId, lineId);
  if (line.kind !== 'part' || !line.partId) throw errors.validation('Only a part line has alternatives.');
  const current = await scoped(deps.db, 'parts', workspaceId).andWhere({ id: line.partId }).first('id', 'category', 'ratings', 'internalPn');
  const policy = await policyFor(deps.db, workspaceId, bom.stressPolicyId);
  const limits = { id: policy.id, name: policy.name, limits: policy.limits };
  const op = operatingPointOf(line);
  const ambient = Number(bom.ambientC);
  const statusOf = (category: string, ratings: unknown) => worstStatus(checksFor(category as never, ratings as never, op, ambient, limits).map((c) => c.status));
  const currentStatus = statusOf(current.category, current.ratings);

  const candidates = ((await scoped(deps.db, 'parts', workspaceId).andWhere({ category: current.category }).andWhereNot({ id: line.partId })
    .select('id', 'internalPn', 'mpn', 'manufacturer', 'description', 'package', 'ratings')) as { id: string; internalPn: string; mpn: string; manufacturer: string; description: string; package: string; ratings: Record<string, unknown> }[])
    // Same value as the part on the line (a 22 MΩ bleeder stays 22 MΩ; a 1 nF capacitor stays 1 nF).
    .filter((p) => sameValue(current.category, current.ratings, p.ratings))
    .map((p) => ({ ...p, status: statusOf(current.category, p.ratings) }))
    .filter((p) => passing.includes(p.status));

  const date = today();
  const data = await loadCostingData(deps.db, workspaceId, bom, date);
  const extraQuotes = candidates.length ? await loadQuotes(deps.db, workspaceId, { partIds: candidates.map((c) => c.id) }) : [];
  const extraParts = candidates.length ? await scoped(deps.db, 'parts', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [candidates.map((c) => c.id)]).select('id', 'category', 'mount', 'pins', 'hsCode', 'unitWeightG') : [];
  const supplierIds = [...new Set(extraQuotes.map((q) => q.supplierId))].filter((id) => !data.input.suppliers.some((s) => s.id === id));
  const extraSuppliers = supplierIds.length ? await scoped(deps.db, 'suppliers', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [supplierIds]).select('id', 'active', 'name') : [];
  const base: CostRollInput = {
    ...data.input,
    parts: [...data.input.parts, ...extraParts],
    quotes: [...data.input.quotes, ...(extraQuotes.map((q) => ({ ...q, createdAt: new Date(q.createdAt).toISOString() })) as unknown as CostRollInput['quotes'])],
    suppliers: [...data.input.suppliers, ...extraSuppliers],
    bom: { qty: bom.plannedQty, date, reportingCurrency: bom.reportingCurrency, amortisationQty: bom.amortisationQty, targetUnitCost: bom.targetUnitCost },
  };
  const rollWith = (partId: string) => {
    const input = { ...base, lines: base.lines.map((l) => (l.id === lineId ? { ...l, partId, pinnedQuoteId: null } : l)) };
    const r = rollPrepared(prepareCostRoll(input), bom.plannedQty);
    const mine = r.lines.find((l) => l.lineId === lineId);
    return { landedPerUnit: r.totals.landedPerUnit, costed: mine?.status === 'costed' };
  };
  const now = rollWith(line.partId);
  const ranked = candidates
    .map((c) => {
      const r = rollWith(c.id);
      return { ...c, landedPerUnit: r.costed ? r.landedPerUnit : null, costDifference: r.costed ? new Dec(r.landedPerUnit).minus(now.landedPerUnit).toFixed(10) : null };
    })
    .filter((c) => c.landedPerUnit !== null)
    .filter((c) => !passing.includes(currentStatus) || new Dec(c.costDifference!).lt(0))
    .sort((a, b) => new Dec(a.landedPerUnit!).cmp(b.landedPerUnit!) || severityRank(a.status) - severityRank(b.status));
  return {
    lineId, bomId, partId: line.partId, currentStatus, currentLandedPerUnit: now.landedPerUnit, currency: bom.reportingCurrency, qty: bom.plannedQty,
    direction: passing.includes(currentStatus) ? 'cheaper' : 'passing',
    candidates: ranked.slice(0, 25).map(({ ratings: _r, ...c }) => c),
  };
}

/**
 * Puts another part on the line. On a released BOM this makes the next revision first
 * and swaps the copied line there.
 */
export async function swapPart(deps: Deps, auth: Auth, bomId: string, lineId: string, partId: string, version: number) {
  return deps.db.transaction(async (trx) => {
    let bom: BomRow = await getBom(trx, auth.workspaceId, bomId);
    let targetLine = await lineOf(trx, auth.workspaceId, bomId, lineId);
    if (targetLine.version !== version) throw errors.stale('line');
    const [from, to] = await Promise.all([
      scoped(trx, 'parts', auth.workspaceId).andWhere({ id: targetLine.partId }).first('category'),
      scoped(trx, 'parts', auth.workspaceId).andWhere({ id: partId }).first('category'),
    ]);
    if (!to) throw errors.validation('No such part in this workspace.', [{ path: 'partId', message: 'refers to a missing part' }]);
    if (from && from.category !== to.category) throw errors.validation('A swap keeps the part category.', [{ path: 'partId', message: `is a ${to.category}, the line holds a ${from.category}` }]);
    // On a released BOM the swap goes to the next revision, in this same transaction.
    if (bom.state === 'released') {
      const next = await newRevisionIn(trx, auth, bomId);
      bom = await getBom(trx, auth.workspaceId, next.id);
      const copied = await linesOf(trx, auth.workspaceId, next.id);
      const match = copied.find((l) => l.position === targetLine.position && l.partId === targetLine.partId);
      if (!match) throw errors.conflict('The line was not found in the new revision.');
      targetLine = match;
    }
    const updated = await updateLine(deps, auth, bom.id, targetLine.id, { partId, pinnedQuoteId: null, version: targetLine.version }, trx);
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'swap_part', entity: 'line', entityId: updated.id, changes: { from: targetLine.partId, to: partId, bomId: bom.id } });
    return { bomId: bom.id, revision: bom.revision, newRevision: bom.id !== bomId, line: lineView(updated) };
  });
}
