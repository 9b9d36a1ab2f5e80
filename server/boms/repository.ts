import { camelColumns, type DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';
import { errors } from '../http/errors';
import type { BomState } from '../../src/shared/schemas/boms';

export interface BomRow {
  id: string;
  familyId: string;
  revision: number;
  name: string;
  state: BomState;
  reportingCurrency: string;
  profileId: string | null;
  stressPolicyId: string | null;
  ambientC: string;
  plannedQty: number;
  targetUnitCost: string | null;
  amortisationQty: number | null;
  shelf: Record<string, string | null>;
  notes: string;
  releasedAt: Date | null;
  version: number;
  createdAt: Date;
  updatedAt: Date;
}

export interface LineRow {
  id: string;
  bomId: string;
  position: number;
  kind: string;
  refDes: string;
  partId: string | null;
  qtyPerUnit: string;
  attritionPct: string | null;
  pinnedQuoteId: string | null;
  dnp: boolean;
  note: string;
  unitCost: string | null;
  oneTimeCost: string | null;
  currency: string | null;
  opVoltageV: number | null;
  opCurrentA: number | null;
  opPowerW: number | null;
  opAmbientC: number | null;
  unresolved: string | null;
  version: number;
}

const trimZeros = (s: string | null) => (s === null ? null : s.includes('.') ? s.replace(/\.?0+$/, '') : s);

export function bomView(b: BomRow) {
  return {
    id: b.id, familyId: b.familyId, name: b.name, revision: b.revision, state: b.state, reportingCurrency: b.reportingCurrency,
    profileId: b.profileId, stressPolicyId: b.stressPolicyId, ambientC: Number(b.ambientC), plannedQty: b.plannedQty,
    targetUnitCost: b.targetUnitCost, amortisationQty: b.amortisationQty,
    shelf: { price: null, vatPct: '0', retailerMarginPct: '0', importerMarginPct: '0', freightToStorePerUnit: '0', ...b.shelf },
    notes: b.notes, releasedAt: b.releasedAt ? new Date(b.releasedAt).toISOString() : null, version: b.version,
    createdAt: new Date(b.createdAt).toISOString(), updatedAt: new Date(b.updatedAt).toISOString(),
  };
}

export function lineView(l: LineRow) {
  return {
    id: l.id, bomId: l.bomId, position: l.position, kind: l.kind, refDes: l.refDes, partId: l.partId,
    qtyPerUnit: trimZeros(l.qtyPerUnit), attritionPct: trimZeros(l.attritionPct), pinnedQuoteId: l.pinnedQuoteId, dnp: l.dnp,
    note: l.note, unitCost: l.unitCost, oneTimeCost: l.oneTimeCost, currency: l.currency,
    operatingPoint: { voltageV: l.opVoltageV, currentA: l.opCurrentA, powerW: l.opPowerW, ambientC: l.opAmbientC },
    unresolved: l.unresolved, version: l.version,
  };
}

/** API line fields → columns (the operating point is flattened into op_* columns). */
export function lineColumns(body: Record<string, unknown>): Record<string, unknown> {
  const { operatingPoint, ...rest } = body as { operatingPoint?: Record<string, number | null | undefined> };
  const out: Record<string, unknown> = { ...rest };
  if (operatingPoint) {
    if (operatingPoint.voltageV !== undefined) out.opVoltageV = operatingPoint.voltageV;
    if (operatingPoint.currentA !== undefined) out.opCurrentA = operatingPoint.currentA;
    if (operatingPoint.powerW !== undefined) out.opPowerW = operatingPoint.powerW;
    if (operatingPoint.ambientC !== undefined) out.opAmbientC = operatingPoint.ambientC;
  }
  return out;
}

export async function getBom(db: DbOrTrx, workspaceId: string, id: string): Promise<BomRow> {
  const row = await scoped(db, 'boms', workspaceId).andWhere({ id }).first();
  if (!row) throw errors.notFound('BOM');
  return row as BomRow;
}

/** A released revision is read-only: edits go to the next revision. */
export async function editableBom(db: DbOrTrx, workspaceId: string, id: string, lock = false): Promise<BomRow> {
  const q = scoped(db, 'boms', workspaceId).andWhere({ id });
  if (lock) q.forUpdate();
  const row = (await q.first()) as BomRow | undefined;
  if (!row) throw errors.notFound('BOM');
  if (row.state === 'released') {
    throw errors.readOnly(`Revision ${row.revision} of ${row.name} is released and read-only; make a new revision to change it.`);
  }
  return row;
}

const LINE_COLUMNS: (keyof LineRow)[] = [
  'id', 'bomId', 'position', 'kind', 'refDes', 'partId', 'qtyPerUnit', 'attritionPct', 'pinnedQuoteId', 'dnp', 'note',
  'unitCost', 'oneTimeCost', 'currency', 'opVoltageV', 'opCurrentA', 'opPowerW', 'opAmbientC', 'unresolved', 'version',
];

/** A BOM's lines in order; the row timestamps are left out (parsing them was a third of reading 1,000 lines). */
export function linesOf(db: DbOrTrx, workspaceId: string, bomId: string): Promise<LineRow[]> {
  return scoped(db, 'bom_lines', workspaceId).andWhere({ bomId }).orderBy([{ column: 'position' }, { column: 'id' }]).select(camelColumns(db, LINE_COLUMNS)) as unknown as Promise<LineRow[]>;
}

/**
 * One page of a BOM's lines in order, after the line a cursor names, and the cursor of the
 * next page (null on the last). A cursor is "position.id.epoch": ids break ties of
 * position, and the workspace's costing epoch (moved by every insert, delete or move of a
 * line) tells when the lines changed between two pages; that answers 409, and the reader
 * starts again, so the pages read together are one consistent list.
 */
export async function linesPage(db: DbOrTrx, workspaceId: string, bomId: string, limit: number, cursor?: string): Promise<{ lines: LineRow[]; nextCursor: string | null }> {
  const q = scoped(db, 'bom_lines', workspaceId).andWhere({ bomId }).orderBy([{ column: 'position' }, { column: 'id' }])
    .select(camelColumns(db, LINE_COLUMNS), db.raw('(SELECT costing_epoch FROM workspaces WHERE id = ?) AS "listEpoch"', [workspaceId]))
    .limit(limit + 1);
  const [position, id, epoch] = cursor ? cursor.split('.') : [];
  if (cursor) q.andWhereRaw('(position, id) > (?::int, ?::bigint)', [position, id]);
  const rows = (await q) as unknown as (LineRow & { listEpoch: string })[];
  // With no line after the cursor the epoch is read on its own (lines may have been deleted).
  const now = rows.length > 0 ? rows[0].listEpoch : cursor ? (await db('workspaces').where({ id: workspaceId }).first('costingEpoch'))?.costingEpoch : undefined;
  if (cursor && String(now) !== epoch) {
    throw errors.conflict('The lines changed while they were read page by page: read them again from the first page.');
  }
  const more = rows.length > limit;
  const lines = more ? rows.slice(0, limit) : rows;
  const last = lines[lines.length - 1];
  return { lines, nextCursor: more ? `${last.position}.${last.id}.${last.listEpoch}` : null };
}
