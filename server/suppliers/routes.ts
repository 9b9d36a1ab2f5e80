import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { idParams } from '../../src/shared/schemas/common';
import { supplierCreateBody, supplierPatchBody, supplierOut } from '../../src/shared/schemas/suppliers';
import { scoped } from '../db/scope';
import { updateOrConflict, deleteOrNotFound, getOrNotFound } from '../db/versioned';
import { audit } from '../audit/repository';
import { errors } from '../http/errors';

type SupplierRow = z.infer<typeof supplierOut>;
const view = (r: SupplierRow): SupplierRow => ({
  id: r.id, name: r.name, country: r.country, currency: r.currency, defaultIncoterm: r.defaultIncoterm,
  contactEmails: r.contactEmails, active: r.active, notes: r.notes, version: r.version,
});

export const supplierRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/suppliers', access: 'suppliers.read', tag: 'Suppliers',
    summary: 'Suppliers of the workspace, by name.',
    query: z.strictObject({ q: z.string().max(200).optional(), active: z.enum(['true', 'false']).optional() }),
    response: z.object({ items: z.array(supplierOut), nextCursor: z.string().nullable() }),
    handler: async ({ auth, query, deps }) => {
      const q = scoped(deps.db, 'suppliers', auth.workspaceId).orderBy('name');
      if (query.q) q.andWhere('name', 'ilike', `%${query.q.replace(/[%_\\]/g, '\\$&')}%`);
      if (query.active) q.andWhere({ active: query.active === 'true' });
      return { items: (await q).map(view), nextCursor: null };
    },
  }),
  route({
    method: 'post', path: '/api/suppliers', access: 'suppliers.write', tag: 'Suppliers', status: 201,
    summary: 'Add a supplier.', body: supplierCreateBody, response: supplierOut,
    handler: async ({ auth, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const [row] = await trx('suppliers').insert({ ...body, workspaceId: auth.workspaceId }).returning('*');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'supplier', entityId: row.id, changes: body });
        return view(row);
      }),
  }),
  route({
    method: 'get', path: '/api/suppliers/:id', access: 'suppliers.read', tag: 'Suppliers',
    summary: 'One supplier.', params: idParams, response: supplierOut,
    handler: async ({ auth, params, deps }) => view(await getOrNotFound(deps.db, 'suppliers', auth.workspaceId, params.id, 'supplier')),
  }),
  route({
    method: 'patch', path: '/api/suppliers/:id', access: 'suppliers.write', tag: 'Suppliers',
    summary: 'Change a supplier (send the version you read).', params: idParams, body: supplierPatchBody, response: supplierOut,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const { version, ...changes } = body;
        const row = await updateOrConflict<SupplierRow>(trx, 'suppliers', auth.workspaceId, params.id, version, changes, 'supplier');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'supplier', entityId: params.id, changes });
        return view(row);
      }),
  }),
  route({
    method: 'delete', path: '/api/suppliers/:id', access: 'suppliers.write', tag: 'Suppliers',
    summary: 'Delete a supplier that has no quotes (otherwise mark it inactive).', params: idParams,
    handler: async ({ auth, params, deps }) =>
      deps.db.transaction(async (trx) => {
        const used = await scoped(trx, 'quotes', auth.workspaceId).andWhere({ supplierId: params.id }).first('id');
        if (used) throw errors.conflict('This supplier has quotes; mark it inactive instead of deleting it.');
        await deleteOrNotFound(trx, 'suppliers', auth.workspaceId, params.id, 'supplier');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'delete', entity: 'supplier', entityId: params.id });
        return undefined;
      }),
  }),
];
