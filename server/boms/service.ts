import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import type { Trx } from '../db/knex';
import { errors } from '../http/errors';
import { scoped } from '../db/scope';
import { updateOrConflict } from '../db/versioned';
import { audit } from '../audit/repository';
import { can } from '../../src/shared/permissions';
import type { BomState, LineCreateBody, LinePatchBody } from '../../src/shared/schemas/boms';
import { editableBom, getBom, lineColumns, lineView, bomView, type BomRow, type LineRow } from './repository';

/** Lines may name only parts and quotes of this workspace; a pinned quote must be for the line's part. */
async function checkLineRefs(trx: Trx, workspaceId: string, rows: { partId?: string | null; pinnedQuoteId?: string | null }[]) {
  const partIds = [...new Set(rows.map((r) => r.partId).filter((x): x is string => Boolean(x)))];
  const quoteIds = [...new Set(rows.map((r) => r.pinnedQuoteId).filter((x): x is string => Boolean(x)))];
  if (partIds.length) {
    const found = await scoped(trx, 'parts', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [partIds]).pluck('id');
    const missing = partIds.filter((id) => !found.includes(id));
    if (missing.length) throw errors.validation('A line names a part that is not in this workspace.', missing.map((id) => ({ path: 'partId', message: `no part ${id}` })));
  }
  if (quoteIds.length) {
    const quotes = (await scoped(trx, 'quotes', workspaceId).andWhereRaw('id = ANY(?::bigint[])', [quoteIds]).select('id', 'partId')) as { id: string; partId: string }[];
    for (const r of rows) {
      if (!r.pinnedQuoteId) continue;
      const q = quotes.find((x) => x.id === r.pinnedQuoteId);
      if (!q) throw errors.validation('The pinned quote is not in this workspace.', [{ path: 'pinnedQuoteId', message: 'refers to a missing quote' }]);
      if (r.partId && q.partId !== r.partId) throw errors.validation('The pinned quote is for another part.', [{ path: 'pinnedQuoteId', message: "is not a quote for this line's part" }]);
    }
  }
}

/** Buyers may only pin a quote on a line; everything else about lines is the designer's. */
function checkLineRole(auth: Auth, body: Record<string, unknown>) {
  if (can(auth.role, 'boms.write')) return;
  const keys = Object.keys(body).filter((k) => k !== 'version' && k !== 'id');
  if (can(auth.role, 'lines.pin') && keys.every((k) => k === 'pinnedQuoteId')) return;
  throw errors.forbidden('Your role may only pin a quote on a line.');
}

export async function createLines(deps: Deps, auth: Auth, bomId: string, bodies: LineCreateBody[], trx: Trx) {
  await editableBom(trx, auth.workspaceId, bomId, true);
  await checkLineRefs(trx, auth.workspaceId, bodies);
  if (!bodies.length) return [];
  const maxPos = await scoped(trx, 'bom_lines', auth.workspaceId).andWhere({ bomId }).max('position as m').first();
  let next = Number(maxPos?.m ?? -1) + 1;
  const rows: LineRow[] = [];
  for (let i = 0; i < bodies.length; i += 1000) {
    const chunk = bodies.slice(i, i + 1000).map((b) => ({ ...lineColumns(b), position: b.position ?? next++, workspaceId: auth.workspaceId, bomId }));
    rows.push(...((await trx('bom_lines').insert(chunk).returning('*')) as LineRow[]));
  }
  return rows;
}

export async function updateLine(deps: Deps, auth: Auth, bomId: string, lineId: string, body: LinePatchBody, trx: Trx) {
  checkLineRole(auth, body);
  await editableBom(trx, auth.workspaceId, bomId);
  const { version, ...changes } = body;
  const current = (await scoped(trx, 'bom_lines', auth.workspaceId).andWhere({ id: lineId, bomId }).first()) as LineRow | undefined;
  if (!current) throw errors.notFound('line');
  // The part and the pinned quote are checked only when one of them changes: an edit of
  // anything else (a quantity, a note) leaves them as they were checked when set.
  if (changes.partId !== undefined || changes.pinnedQuoteId !== undefined) {
    await checkLineRefs(trx, auth.workspaceId, [{ partId: changes.partId !== undefined ? changes.partId : current.partId, pinnedQuoteId: changes.pinnedQuoteId !== undefined ? changes.pinnedQuoteId : current.pinnedQuoteId }]);
  }
  const cols = lineColumns(changes);
  // Choosing a part resolves an imported line.
  if (changes.partId) cols.unresolved = null;
  return updateOrConflict<LineRow>(trx, 'bom_lines', auth.workspaceId, lineId, version, cols, 'line');
}

export async function deleteLine(auth: Auth, bomId: string, lineId: string, version: number | undefined, trx: Trx) {
  await editableBom(trx, auth.workspaceId, bomId);
  const q = scoped(trx, 'bom_lines', auth.workspaceId).andWhere({ id: lineId, bomId });
  if (version !== undefined) q.andWhere({ version });
  const n = await q.delete();
  if (!n) {
    const exists = await scoped(trx, 'bom_lines', auth.workspaceId).andWhere({ id: lineId, bomId }).first('id');
    throw exists ? errors.stale('line') : errors.notFound('line');
  }
}

const transitions: Record<BomState, BomState[]> = {
  draft: ['in_review'],
  in_review: ['draft', 'released'],
  released: [],
};

/**
 * Draft → In review → Released. Only an owner releases; a released revision never changes
 * state again. `beforeRelease` lets the stress check veto a release.
 */
export async function changeState(
  deps: Deps,
  auth: Auth,
  bomId: string,
  to: BomState,
  version: number | undefined,
  beforeRelease?: (trx: Trx, bom: BomRow) => Promise<void>,
) {
  return deps.db.transaction(async (trx) => {
    const bom = await getBom(trx, auth.workspaceId, bomId);
    if (version !== undefined && version !== bom.version) throw errors.stale('BOM');
    if (bom.state === to) return bomView(bom);
    if (!transitions[bom.state].includes(to)) {
      throw errors.conflict(bom.state === 'released' ? 'A released revision is final; make a new revision.' : `A ${bom.state.replace('_', ' ')} BOM cannot go to ${to.replace('_', ' ')}.`);
    }
    if (to === 'released') {
      if (!can(auth.role, 'boms.release')) throw errors.forbidden('Only an owner releases a BOM.');
      if (beforeRelease) await beforeRelease(trx, bom);
    }
    const changes: Record<string, unknown> = { state: to };
    if (to === 'released') Object.assign(changes, { releasedAt: trx.fn.now(), releasedBy: auth.userId });
    const row = await updateOrConflict<BomRow>(trx, 'boms', auth.workspaceId, bomId, bom.version, changes, 'BOM');
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'state', entity: 'bom', entityId: bomId, changes: { state: [bom.state, to] } });
    return bomView(row);
  });
}

/** The next revision: a draft copy of the BOM and its lines, numbered after the family's latest. */
export async function newRevision(deps: Deps, auth: Auth, bomId: string) {
  return deps.db.transaction((trx) => newRevisionIn(trx, auth, bomId));
}

/** The same, inside a transaction the caller owns (a swap on a released BOM). */
export async function newRevisionIn(trx: Trx, auth: Auth, bomId: string) {
  {
    const bom = await getBom(trx, auth.workspaceId, bomId);
    // Serialise revision numbering within the family.
    await trx.raw('SELECT pg_advisory_xact_lock(?)', [Number(bom.familyId)]);
    const last = await scoped(trx, 'boms', auth.workspaceId).andWhere({ familyId: bom.familyId }).max('revision as r').first();
    const {
      id: _id, revision: _r, state: _s, releasedAt: _ra, version: _v, createdAt: _c, updatedAt: _u, ...copy
    } = bom as BomRow & { releasedBy?: string | null };
    delete (copy as Record<string, unknown>).releasedBy;
    const [row] = (await trx('boms')
      .insert({ ...copy, shelf: JSON.stringify(bom.shelf ?? {}), workspaceId: auth.workspaceId, revision: Number(last?.r ?? bom.revision) + 1, state: 'draft' })
      .returning('*')) as BomRow[];
    // Every column of every line (select *, not `linesOf`), so a column added later is copied too.
    const lines = (await scoped(trx, 'bom_lines', auth.workspaceId).andWhere({ bomId }).orderBy([{ column: 'position' }, { column: 'id' }])) as Record<string, unknown>[];
    for (let i = 0; i < lines.length; i += 1000) {
      await trx('bom_lines').insert(
        lines.slice(i, i + 1000).map(({ id: _lid, bomId: _b, version: _lv, createdAt: _c, updatedAt: _u, ...l }) => ({ ...l, workspaceId: auth.workspaceId, bomId: row.id })),
      );
    }
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'revision', entity: 'bom', entityId: row.id, changes: { from: bomId, revision: row.revision } });
    return bomView(row);
  }
}

export { lineView };
