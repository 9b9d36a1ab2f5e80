import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParams } from '../../src/shared/schemas/common';
import {
  bomCreateBody, bomPatchBody, stateBody, lineCreateBody, linePatchBody, bulkBody, lineParams, lineListQuery, costQuery, curveQuery,
} from '../../src/shared/schemas/boms';
import { scoped } from '../db/scope';
import { updateOrConflict } from '../db/versioned';
import { audit } from '../audit/repository';
import { bomView, editableBom, getBom, lineView, linesPage, type BomRow } from './repository';
import { createLines, updateLine, deleteLine, changeState, newRevision } from './service';
import { costOf, costTotalsOf, curveOf, ladderOf } from './cost';
import { rollupsFor, bomsWithRollups, plannedCost, plannedTotals } from './rollups';
import { acceptedEncoding } from '../http/encoding';
import { releaseGuards } from './release-guards';
import { today } from '../quotes/repository';
import { importBom } from './import';
import { saveSnapshot, listSnapshots, compare } from './compare';
import { snapshotBody, compareQuery } from '../../src/shared/schemas/boms';

async function checkProfile(db: Parameters<typeof scoped>[0], workspaceId: string, profileId: string | null | undefined) {
  if (profileId && !(await scoped(db, 'landed_cost_profiles', workspaceId).andWhere({ id: profileId }).first('id'))) {
    throw errors.validation('No such landed-cost profile in this workspace.', [{ path: 'profileId', message: 'refers to a missing profile' }]);
  }
}

export const bomRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/boms', access: 'boms.read', tag: 'BOMs',
    summary: 'The BOM list: every revision with its state and the landed cost per unit at its planned quantity (from the stored roll-up) against its target.',
    query: z.strictObject({ q: z.string().max(200).optional() }),
    handler: async ({ auth, query, deps }) => {
      // One statement: under load each round trip waits its turn.
      const { boms, lineCount, read } = await bomsWithRollups(deps.db, auth.workspaceId, query.q === undefined ? undefined : `%${query.q.replace(/[%_\\]/g, '\\$&')}%`);
      const rollups = await rollupsFor(deps, auth.workspaceId, boms, read);
      return {
        items: boms.map((b) => {
          const r = rollups.get(b.id);
          return {
            ...bomView(b),
            lineCount: lineCount.get(b.id) ?? 0,
            cost: r ? { qty: r.qty, currency: r.currency, landedPerUnit: r.landedPerUnit, leftOut: r.leftOut, warnings: r.warnings, costingDate: r.costingDate, fresh: r.fresh } : null,
            stress: r?.stressTally ?? null,
          };
        }),
        nextCursor: null,
      };
    },
  }),
  route({
    method: 'post', path: '/api/boms', access: 'boms.write', tag: 'BOMs', status: 201,
    summary: 'Create a BOM (revision 1, draft).', body: bomCreateBody,
    handler: async ({ auth, body, deps }) =>
      deps.db.transaction(async (trx) => {
        await releaseGuards.beforeCreate(trx, deps, auth);
        await checkProfile(trx, auth.workspaceId, body.profileId);
        const { rows } = await trx.raw(`SELECT nextval(pg_get_serial_sequence('boms', 'id')) AS id`);
        const id = String(rows[0].id);
        const [row] = await trx('boms').insert({ ...body, shelf: JSON.stringify(body.shelf), id, familyId: id, workspaceId: auth.workspaceId }).returning('*');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'bom', entityId: id, changes: body });
        return bomView(row);
      }),
  }),
  route({
    method: 'get', path: '/api/boms/:id', access: 'boms.read', tag: 'BOMs',
    summary: 'One BOM revision with the other revisions of its family.', params: idParams,
    handler: async ({ auth, params, deps }) => {
      const bom = await getBom(deps.db, auth.workspaceId, params.id);
      const family = (await scoped(deps.db, 'boms', auth.workspaceId).andWhere({ familyId: bom.familyId }).orderBy('revision').select('id', 'revision', 'state', 'releasedAt', 'updatedAt')) as Pick<BomRow, 'id' | 'revision' | 'state' | 'releasedAt' | 'updatedAt'>[];
      return { ...bomView(bom), revisions: family.map((f) => ({ id: f.id, revision: f.revision, state: f.state, releasedAt: f.releasedAt ? new Date(f.releasedAt).toISOString() : null })) };
    },
  }),
  route({
    method: 'patch', path: '/api/boms/:id', access: 'boms.write', tag: 'BOMs',
    summary: 'Change a BOM revision (send the version you read); a released revision is read-only.', params: idParams, body: bomPatchBody,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        await editableBom(trx, auth.workspaceId, params.id);
        const { version: v, ...changes } = body;
        await checkProfile(trx, auth.workspaceId, changes.profileId);
        const cols: Record<string, unknown> = { ...changes };
        if (changes.shelf) cols.shelf = JSON.stringify(changes.shelf);
        const row = await updateOrConflict<BomRow>(trx, 'boms', auth.workspaceId, params.id, v, cols, 'BOM');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'bom', entityId: params.id, changes });
        return bomView(row);
      }),
  }),
  route({
    method: 'delete', path: '/api/boms/:id', access: 'boms.write', tag: 'BOMs',
    summary: 'Delete a BOM revision that is not released.', params: idParams,
    handler: async ({ auth, params, deps }) =>
      deps.db.transaction(async (trx) => {
        await editableBom(trx, auth.workspaceId, params.id);
        await scoped(trx, 'boms', auth.workspaceId).andWhere({ id: params.id }).delete();
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'delete', entity: 'bom', entityId: params.id });
        return undefined;
      }),
  }),
  route({
    method: 'post', path: '/api/boms/:id/state', access: 'boms.write', tag: 'BOMs',
    summary: 'Move a BOM through Draft → In review → Released (only an owner releases; a released revision is final).',
    params: idParams, body: stateBody,
    handler: async ({ auth, params, body, deps }) => changeState(deps, auth, params.id, body.state, body.version, (trx, bom) => releaseGuards.beforeRelease(trx, deps, auth, bom)),
  }),
  route({
    method: 'post', path: '/api/boms/:id/revisions', access: 'boms.write', tag: 'BOMs', status: 201,
    summary: 'Make the next revision: a draft copy of this BOM and its lines.', params: idParams,
    handler: async ({ auth, params, deps }) => newRevision(deps, auth, params.id),
  }),

  route({
    method: 'get', path: '/api/boms/:id/lines', access: 'boms.read', tag: 'Lines',
    summary: 'The lines of a BOM in order, 500 a page (`limit` up to 5,000); `nextCursor` asks for the next page, and a 409 says the lines changed between pages (read again from the first).', params: idParams, query: lineListQuery,
    handler: async ({ auth, params, query, deps }) => {
      const page = await linesPage(deps.db, auth.workspaceId, params.id, query.limit, query.cursor);
      // The BOM is read only to tell an empty BOM from a missing one (404).
      if (page.lines.length === 0) await getBom(deps.db, auth.workspaceId, params.id);
      return { items: page.lines.map(lineView), nextCursor: page.nextCursor };
    },
  }),
  route({
    method: 'post', path: '/api/boms/:id/lines', access: 'boms.write', tag: 'Lines', status: 201,
    summary: 'Add a line: a part line, or a cost line (labour, packaging, test, tooling, other) with a unit or one-time cost.',
    params: idParams, body: lineCreateBody,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const [row] = await createLines(deps, auth, params.id, [body], trx);
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'line', entityId: row.id, changes: body });
        return lineView(row);
      }),
  }),
  route({
    method: 'patch', path: '/api/boms/:id/lines/:lineId', access: 'lines.pin', tag: 'Lines',
    summary: 'Change a line (send the version you read). Buyers may change only the pinned quote.',
    params: lineParams, body: linePatchBody,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const row = await updateLine(deps, auth, params.id, params.lineId, body, trx);
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'line', entityId: params.lineId, changes: body });
        return lineView(row);
      }),
  }),
  route({
    method: 'delete', path: '/api/boms/:id/lines/:lineId', access: 'boms.write', tag: 'Lines',
    summary: 'Remove a line (optionally only at a given version: ?version=).', params: lineParams,
    query: z.strictObject({ version: z.coerce.number().int().min(1).optional() }),
    handler: async ({ auth, params, query, deps }) =>
      deps.db.transaction(async (trx) => {
        await deleteLine(auth, params.id, params.lineId, query.version, trx);
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'delete', entity: 'line', entityId: params.lineId });
        return undefined;
      }),
  }),
  route({
    method: 'post', path: '/api/boms/:id/lines/bulk', access: 'boms.write', tag: 'Lines',
    summary: 'Create, update and delete many lines in one transaction: all apply, or none (a stale version anywhere is a 409).',
    params: idParams, body: bulkBody,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const created = await createLines(deps, auth, params.id, body.create, trx);
        const updated = [];
        for (const u of body.update) {
          const { id, ...patch } = u;
          updated.push(await updateLine(deps, auth, params.id, id, patch, trx));
        }
        for (const d of body.delete) await deleteLine(auth, params.id, d.id, d.version, trx);
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'bulk', entity: 'line', entityId: params.id, changes: { created: created.length, updated: updated.length, deleted: body.delete.length } });
        return { created: created.map(lineView), updated: updated.map(lineView), deleted: body.delete.map((d) => d.id) };
      }),
  }),

  route({
    method: 'get', path: '/api/boms/:id/cost', access: 'boms.read', tag: 'Cost roll',
    summary: 'The cost roll: landed cost per unit at a build quantity (default: planned) and costing date (default: today), per line and in totals, in the reporting currency.',
    params: idParams, query: costQuery,
    handler: async ({ req, res, auth, params, query, deps }) => {
      // The same URL may go compressed or not, by the request's Accept-Encoding.
      res.vary('Accept-Encoding');
      // The usual read (planned quantity, today) takes the BOM with its stored roll-up.
      if (query.qty === undefined && query.date === undefined) {
        return query.view === 'totals' ? plannedTotals(deps, auth.workspaceId, params.id) : plannedCost(deps, auth.workspaceId, params.id, acceptedEncoding(req));
      }
      const bom = await getBom(deps.db, auth.workspaceId, params.id);
      const planned = (query.qty === undefined || query.qty === bom.plannedQty) && (query.date === undefined || query.date === today());
      if (query.view === 'totals') {
        return planned ? plannedTotals(deps, auth.workspaceId, bom.id) : costTotalsOf(deps.db, auth.workspaceId, bom, query.qty, query.date);
      }
      return planned ? plannedCost(deps, auth.workspaceId, bom.id, acceptedEncoding(req), query.qty) : costOf(deps.db, auth.workspaceId, bom, query.qty, query.date);
    },
  }),
  route({
    method: 'get', path: '/api/boms/:id/cost/curve', access: 'boms.read', tag: 'Cost roll',
    summary: 'The volume curve: the cost roll totals at several build quantities (data read once). Default: 12 quantities around the planned one.',
    params: idParams, query: curveQuery,
    handler: async ({ auth, params, query, deps }) => curveOf(deps, auth.workspaceId, params.id, query.qty, query.date),
  }),
  route({
    method: 'get', path: '/api/boms/:id/shelf-ladder', access: 'boms.read', tag: 'Cost roll',
    summary: 'The shelf-price ladder: from shelf price to the allowed landed cost, beside the computed landed cost and the gap.',
    params: idParams, query: z.strictObject({ qty: z.coerce.number().int().min(1).max(100_000_000).optional() }),
    handler: async ({ auth, params, query, deps }) => ladderOf(deps, auth.workspaceId, params.id, query.qty),
  }),
  route({
    method: 'post', path: '/api/boms/:id/import', access: 'boms.write', tag: 'Lines', bodyKind: 'multipart', maxUploadBytes: 10 * 1024 * 1024,
    summary: 'Import lines from CSV or XLSX: matched to library parts by MPN or internal PN; unmatched rows become unresolved lines. Without `?commit=true` a preview with per-row problems; with it, every row in one transaction or none. Form fields: `file`, optional `mapping` (JSON).',
    params: idParams, query: z.strictObject({ commit: z.enum(['true', 'false']).optional() }),
    handler: async ({ auth, params, query, upload, deps }) => importBom(deps, auth, params.id, upload.file, upload.fields, query.commit === 'true'),
  }),
  route({
    method: 'post', path: '/api/boms/:id/snapshots', access: 'snapshots.write', tag: 'Cost roll', status: 201,
    summary: 'Save the cost roll as it is now (at a quantity and date) under a name, to compare later.', params: idParams, body: snapshotBody,
    handler: async ({ auth, params, body, deps }) => saveSnapshot(deps, auth, params.id, body.name, body.qty, body.date),
  }),
  route({
    method: 'get', path: '/api/boms/:id/snapshots', access: 'boms.read', tag: 'Cost roll',
    summary: 'Saved cost snapshots of a BOM revision.', params: idParams,
    handler: async ({ auth, params, deps }) => ({ items: await listSnapshots(deps, auth.workspaceId, params.id), nextCursor: null }),
  }),
  route({
    method: 'get', path: '/api/cost-compare', access: 'boms.read', tag: 'Cost roll',
    summary: 'Compare two snapshots or two revisions (`snapshot:<id>` or `bom:<id>`): change in every total and per line.', query: compareQuery,
    handler: async ({ auth, query, deps }) => compare(deps, auth.workspaceId, query.left, query.right, query.qty),
  }),
];
