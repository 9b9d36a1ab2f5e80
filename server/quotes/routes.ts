import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParam, idParams } from '../../src/shared/schemas/common';
import { quoteCreateBody, quotePatchBody, quoteOut, offersQuery } from '../../src/shared/schemas/quotes';
import { offersForPart } from './board';
import { importQuotes, quoteTemplateCsv } from './import';
import { scoped } from '../db/scope';
import { updateOrConflict, deleteOrNotFound, getOrNotFound } from '../db/versioned';
import { audit } from '../audit/repository';
import { loadQuotes, quoteView, writeBreaks } from './repository';
import type { DbOrTrx } from '../db/knex';

const list = z.object({ items: z.array(quoteOut), nextCursor: z.string().nullable() });

async function one(db: DbOrTrx, workspaceId: string, id: string) {
  const [q] = await loadQuotes(db, workspaceId, { ids: [id] });
  if (!q) throw errors.notFound('quote');
  return quoteView(q);
}

/** Both the part and the supplier must be of this workspace (the schema's keys say so too). */
async function checkRefs(db: DbOrTrx, workspaceId: string, refs: { partId?: string; supplierId?: string }) {
  if (refs.partId && !(await scoped(db, 'parts', workspaceId).andWhere({ id: refs.partId }).first('id'))) {
    throw errors.validation('No such part in this workspace.', [{ path: 'partId', message: 'refers to a missing part' }]);
  }
  if (refs.supplierId && !(await scoped(db, 'suppliers', workspaceId).andWhere({ id: refs.supplierId }).first('id'))) {
    throw errors.validation('No such supplier in this workspace.', [{ path: 'supplierId', message: 'refers to a missing supplier' }]);
  }
}

export const quoteRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/quotes', access: 'quotes.read', tag: 'Quotes',
    summary: 'Quotes with their price breaks; filter by part or supplier. Expired quotes stay, marked expired.',
    query: z.strictObject({ partId: idParam.optional(), supplierId: idParam.optional() }), response: list,
    handler: async ({ auth, query, deps }) => ({
      items: (await loadQuotes(deps.db, auth.workspaceId, { partIds: query.partId ? [query.partId] : undefined, supplierId: query.supplierId })).map((q) => quoteView(q)),
      nextCursor: null,
    }),
  }),
  route({
    method: 'get', path: '/api/parts/:id/quotes', access: 'quotes.read', tag: 'Quotes',
    summary: 'Every quote for one part.', params: idParams, response: list,
    handler: async ({ auth, params, deps }) => {
      await getOrNotFound(deps.db, 'parts', auth.workspaceId, params.id, 'part');
      return { items: (await loadQuotes(deps.db, auth.workspaceId, { partIds: [params.id] })).map((q) => quoteView(q)), nextCursor: null };
    },
  }),
  route({
    method: 'post', path: '/api/quotes', access: 'quotes.write', tag: 'Quotes', status: 201,
    summary: 'Add a quote with its price breaks (ascending minimum quantities, prices with up to 6 decimals).',
    body: quoteCreateBody, response: quoteOut,
    handler: async ({ auth, body, deps }) =>
      deps.db.transaction(async (trx) => {
        await checkRefs(trx, auth.workspaceId, body);
        const { priceBreaks, ...fields } = body;
        const [row] = await trx('quotes').insert({ ...fields, workspaceId: auth.workspaceId }).returning('id');
        await writeBreaks(trx, auth.workspaceId, row.id, priceBreaks);
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'quote', entityId: row.id, changes: body });
        return one(trx, auth.workspaceId, row.id);
      }),
  }),
  route({
    method: 'get', path: '/api/quotes/:id', access: 'quotes.read', tag: 'Quotes',
    summary: 'One quote.', params: idParams, response: quoteOut,
    handler: async ({ auth, params, deps }) => one(deps.db, auth.workspaceId, params.id),
  }),
  route({
    method: 'patch', path: '/api/quotes/:id', access: 'quotes.write', tag: 'Quotes',
    summary: 'Change a quote (send the version you read); price breaks, when sent, replace the old ones.',
    params: idParams, body: quotePatchBody, response: quoteOut,
    handler: async ({ auth, params, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const { version, priceBreaks, ...changes } = body;
        await checkRefs(trx, auth.workspaceId, { supplierId: changes.supplierId });
        const current = await one(trx, auth.workspaceId, params.id);
        const from = changes.validFrom !== undefined ? changes.validFrom : current.validFrom;
        const until = changes.validUntil !== undefined ? changes.validUntil : current.validUntil;
        if (from && until && from > until) throw errors.validation('The validity dates are reversed.', [{ path: 'validUntil', message: 'must not be before validFrom' }]);
        await updateOrConflict(trx, 'quotes', auth.workspaceId, params.id, version, changes, 'quote');
        if (priceBreaks) await writeBreaks(trx, auth.workspaceId, params.id, priceBreaks);
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'quote', entityId: params.id, changes: body });
        return one(trx, auth.workspaceId, params.id);
      }),
  }),
  route({
    method: 'delete', path: '/api/quotes/:id', access: 'quotes.write', tag: 'Quotes',
    summary: 'Delete a quote.', params: idParams,
    handler: async ({ auth, params, deps }) =>
      deps.db.transaction(async (trx) => {
        await deleteOrNotFound(trx, 'quotes', auth.workspaceId, params.id, 'quote');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'delete', entity: 'quote', entityId: params.id });
        return undefined;
      }),
  }),
  route({
    method: 'get', path: '/api/parts/:id/offers', access: 'quotes.read', tag: 'Quote board',
    summary: 'The quote board: every offer for one part at a quantity, in landed cost per piece (percentage adders and duty of the profile), the cheapest marked, ineligible offers with the reason.',
    params: idParams, query: offersQuery,
    handler: async ({ auth, params, query, deps }) => offersForPart(deps, auth.workspaceId, params.id, query),
  }),
  route({
    method: 'post', path: '/api/quotes/import', access: 'quotes.write', tag: 'Quotes', bodyKind: 'multipart', maxUploadBytes: 10 * 1024 * 1024,
    summary: 'Import quotes from CSV or XLSX: one row per price break. Without `?commit=true` it answers a preview (columns, suggested mapping, per-row problems); with it, all quotes are written in one transaction or none. Form fields: `file`, optional `mapping` (JSON: field → column), optional `supplierId` (one supplier for the whole file).',
    query: z.strictObject({ commit: z.enum(['true', 'false']).optional() }),
    handler: async ({ auth, query, upload, deps }) => importQuotes(deps, auth, upload.file, upload.fields, query.commit === 'true'),
  }),
  route({
    method: 'get', path: '/api/quotes/import/template.csv', access: 'quotes.read', tag: 'Quotes',
    summary: 'A CSV template for quote import.',
    handler: async ({ res }) => {
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', 'attachment; filename="farthing-quote-import.csv"');
      res.send(quoteTemplateCsv);
      return undefined;
    },
  }),
];
