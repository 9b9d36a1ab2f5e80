import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParams } from '../../src/shared/schemas/common';
import { partCreateBody, partPatchBody, partListQuery, partOut, parseRatings, type PartOut } from '../../src/shared/schemas/parts';
import type { PartCategory } from '../../src/shared/schemas/trade';
import { scoped } from '../db/scope';
import { updateOrConflict, deleteOrNotFound, getOrNotFound } from '../db/versioned';
import { page } from '../http/pagination';
import { audit } from '../audit/repository';
import { applyPartSearch } from './search';

const view = (r: PartOut): PartOut => ({
  id: r.id, internalPn: r.internalPn, mpn: r.mpn, manufacturer: r.manufacturer, category: r.category,
  description: r.description, package: r.package, mount: r.mount, pins: r.pins, hsCode: r.hsCode,
  unitWeightG: r.unitWeightG, ratings: r.ratings, version: r.version,
});

function ratingsOrThrow(category: PartCategory, ratings: unknown) {
  const r = parseRatings(category, ratings);
  if (!r.ok) throw errors.validation('The ratings are not valid for this category.', r.issues);
  return r.value;
}

export const partRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/parts', access: 'parts.read', tag: 'Parts',
    summary: 'The parts library. `q` searches in the trade\'s words (`10k 0603`, `22M 1206`, an MPN); keyset paging by `cursor`.',
    query: partListQuery, response: z.object({ items: z.array(partOut), nextCursor: z.string().nullable() }),
    handler: async ({ auth, query, deps }) => {
      const q = scoped(deps.db, 'parts', auth.workspaceId).orderBy('parts.id').limit(query.limit + 1);
      if (query.category) q.andWhere('parts.category', query.category);
      if (query.cursor) q.andWhere('parts.id', '>', query.cursor);
      if (query.q) applyPartSearch(q, query.q);
      if (query.ids) q.andWhereRaw('parts.id = ANY(?::bigint[])', [query.ids]);
      const rows = (await q) as PartOut[];
      const p = page(rows, query.limit);
      return { items: p.items.map(view), nextCursor: p.nextCursor };
    },
  }),
  route({
    method: 'post', path: '/api/parts', access: 'parts.write', tag: 'Parts', status: 201,
    summary: 'Add a part; ratings by category accept the trade\'s notations ("2kV", "4K7", "1/4W").',
    body: partCreateBody, response: partOut,
    handler: async ({ auth, body, deps }) => {
      const ratings = ratingsOrThrow(body.category, body.ratings);
      return deps.db.transaction(async (trx) => {
        const [row] = await trx('parts').insert({ ...body, ratings: JSON.stringify(ratings), workspaceId: auth.workspaceId }).returning('*');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'part', entityId: row.id, changes: { ...body, ratings } });
        return view(row);
      });
    },
  }),
  route({
    method: 'get', path: '/api/parts/:id', access: 'parts.read', tag: 'Parts',
    summary: 'One part with its ratings.', params: idParams, response: partOut,
    handler: async ({ auth, params, deps }) => view(await getOrNotFound(deps.db, 'parts', auth.workspaceId, params.id, 'part')),
  }),
  route({
    method: 'patch', path: '/api/parts/:id', access: 'parts.write', tag: 'Parts',
    summary: 'Change a part (send the version you read). Changing the category replaces the ratings.',
    params: idParams, body: partPatchBody, response: partOut,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const { version, ...changes } = body;
        const current = await getOrNotFound<PartOut>(trx, 'parts', auth.workspaceId, params.id, 'part');
        const update: Record<string, unknown> = { ...changes };
        if (changes.ratings !== undefined || changes.category !== undefined) {
          const category = changes.category ?? current.category;
          update.ratings = JSON.stringify(ratingsOrThrow(category, changes.ratings ?? (changes.category ? {} : current.ratings)));
        }
        const row = await updateOrConflict<PartOut>(trx, 'parts', auth.workspaceId, params.id, version, update, 'part');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'part', entityId: params.id, changes });
        return view(row);
      }),
  }),
  route({
    method: 'delete', path: '/api/parts/:id', access: 'parts.write', tag: 'Parts',
    summary: 'Delete a part with its quotes and datasheets.', params: idParams,
    handler: async ({ auth, params, deps }) =>
      deps.db.transaction(async (trx) => {
        await deleteOrNotFound(trx, 'parts', auth.workspaceId, params.id, 'part');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'delete', entity: 'part', entityId: params.id });
        return undefined;
      }),
  }),
  route({
    method: 'get', path: '/api/parts/:id/boms', access: 'boms.read', tag: 'Parts',
    summary: 'The BOM revisions that use a part, with the lines’ designators and quantity per unit.', params: idParams,
    handler: async ({ auth, params, deps }) => {
      await getOrNotFound(deps.db, 'parts', auth.workspaceId, params.id, 'part');
      const rows = (await scoped(deps.db, 'bom_lines', auth.workspaceId)
        .andWhere('bom_lines.partId', params.id)
        .join('boms', function () {
          this.on('boms.id', 'bom_lines.bomId').andOn('boms.workspaceId', 'bom_lines.workspaceId');
        })
        .groupBy('boms.id', 'boms.name', 'boms.revision', 'boms.state')
        .orderBy([{ column: 'boms.name' }, { column: 'boms.revision', order: 'desc' }])
        .select('boms.id', 'boms.name', 'boms.revision', 'boms.state', deps.db.raw(`string_agg(nullif(bom_lines.ref_des, ''), ', ') AS ref_des`), deps.db.raw('sum(bom_lines.qty_per_unit)::text AS qty_per_unit'))) as {
        id: string; name: string; revision: number; state: string; refDes: string | null; qtyPerUnit: string;
      }[];
      return { items: rows.map((r) => ({ ...r, qtyPerUnit: r.qtyPerUnit.replace(/\.?0+$/, '') })), nextCursor: null };
    },
  }),
];
