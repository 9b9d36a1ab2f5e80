import type { Deps } from '../deps';
import { errors } from '../http/errors';
import { scoped } from '../db/scope';
import { audit } from '../audit/repository';
import { Dec } from '../costing';
import type { Auth } from '../http/route';
import { costOf, type CostView } from './cost';
import { getBom } from './repository';

type Side = Pick<CostView, 'qty' | 'date' | 'currency' | 'totals' | 'lines'> & { label: string };

const totalKeys = ['goods', 'excessValue', 'origin', 'freight', 'insurance', 'duty', 'fees', 'destination', 'assembly', 'costLinesPerUnit', 'oneTimePerUnit', 'landedTotal', 'landedPerUnit'] as const;

// Revisions copy lines, so a line is known by its designators, else its part, else its kind.
const lineKey = (l: CostView['lines'][number]) => (l.refDes ? `ref:${l.refDes}` : l.partId ? `part:${l.partId}` : `kind:${l.kind}:${l.category}`);
const diff = (a: string | null | undefined, b: string | null | undefined) => (a == null || b == null ? null : new Dec(b).minus(a).toFixed(6));

export async function saveSnapshot(deps: Deps, auth: Auth, bomId: string, name: string, qty?: number, date?: string) {
  const bom = await getBom(deps.db, auth.workspaceId, bomId);
  const cost = await costOf(deps.db, auth.workspaceId, bom, qty, date);
  const [row] = await deps.db('cost_snapshots')
    .insert({ workspaceId: auth.workspaceId, bomId, name, qty: cost.qty, costingDate: cost.date, result: JSON.stringify(cost), createdBy: auth.userId })
    .returning(['id', 'name', 'qty', 'costingDate', 'createdAt']);
  await audit(deps.db, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'snapshot', entity: 'bom', entityId: bomId, changes: { name, qty: cost.qty } });
  return { id: row.id, name: row.name, qty: row.qty, date: row.costingDate, landedPerUnit: cost.totals.landedPerUnit, currency: cost.currency, createdAt: new Date(row.createdAt).toISOString() };
}

export async function listSnapshots(deps: Deps, workspaceId: string, bomId: string) {
  await getBom(deps.db, workspaceId, bomId);
  const rows = (await scoped(deps.db, 'cost_snapshots', workspaceId).andWhere({ bomId }).orderBy('id', 'desc')
    .select('id', 'name', 'qty', 'costingDate', 'createdAt', deps.db.raw(`result -> 'totals' ->> 'landedPerUnit' AS landed_per_unit`), deps.db.raw(`result ->> 'currency' AS currency`))) as {
    id: string; name: string; qty: number; costingDate: string; createdAt: Date; landedPerUnit: string; currency: string;
  }[];
  return rows.map((r) => ({ id: r.id, name: r.name, qty: r.qty, date: r.costingDate, landedPerUnit: r.landedPerUnit, currency: r.currency, createdAt: new Date(r.createdAt).toISOString() }));
}

async function side(deps: Deps, workspaceId: string, ref: string, qty?: number): Promise<Side> {
  const [kind, id] = ref.split(':');
  if (kind === 'snapshot') {
    const row = await scoped(deps.db, 'cost_snapshots', workspaceId).andWhere({ id }).first('name', 'result');
    if (!row) throw errors.notFound('snapshot');
    return { ...(row.result as CostView), label: `Snapshot “${row.name}”` };
  }
  const bom = await getBom(deps.db, workspaceId, id);
  const cost = await costOf(deps.db, workspaceId, bom, qty);
  return { ...cost, label: `${bom.name} rev ${bom.revision}` };
}

/** Two snapshots or two revisions side by side: change in every total and per line. */
export async function compare(deps: Deps, workspaceId: string, left: string, right: string, qty?: number) {
  const [a, b] = await Promise.all([side(deps, workspaceId, left, qty), side(deps, workspaceId, right, qty)]);
  if (a.currency !== b.currency) throw errors.validation(`The two sides are in different currencies (${a.currency} and ${b.currency}).`);
  const totals = totalKeys.map((k) => ({ name: k, left: a.totals[k] ?? null, right: b.totals[k] ?? null, change: diff(a.totals[k], b.totals[k]) }));
  // Repeated keys (two labour lines) are told apart by their order.
  const keyed = (lines: CostView['lines']) => {
    const seen = new Map<string, number>();
    return new Map(lines.map((l) => {
      const k = lineKey(l);
      const n = (seen.get(k) ?? 0) + 1;
      seen.set(k, n);
      return [n === 1 ? k : `${k}#${n}`, l] as const;
    }));
  };
  const left_ = keyed(a.lines);
  const right_ = keyed(b.lines);
  const keys = [...new Set([...left_.keys(), ...right_.keys()])];
  const lines = keys.map((k) => {
    const l = left_.get(k);
    const r = right_.get(k);
    return {
      key: k,
      refDes: (r ?? l)?.refDes ?? null,
      internalPn: (r ?? l)?.internalPn ?? null,
      change: !l ? 'added' : !r ? 'removed' : l.partId !== r.partId ? 'part_changed' : l.landed !== r.landed ? 'cost_changed' : 'same',
      left: l ? { partId: l.partId, internalPn: l.internalPn, supplierName: l.supplierName, orderQty: l.orderQty, unitPrice: l.unitPrice, landed: l.landed, landedPerUnit: l.landedPerUnit } : null,
      right: r ? { partId: r.partId, internalPn: r.internalPn, supplierName: r.supplierName, orderQty: r.orderQty, unitPrice: r.unitPrice, landed: r.landed, landedPerUnit: r.landedPerUnit } : null,
      landedPerUnitChange: diff(l?.landedPerUnit ?? '0', r?.landedPerUnit ?? '0'),
    };
  });
  return { currency: a.currency, left: { ref: left, label: a.label, qty: a.qty, date: a.date }, right: { ref: right, label: b.label, qty: b.qty, date: b.date }, totals, lines };
}
