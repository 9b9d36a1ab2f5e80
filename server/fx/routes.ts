import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import { idParams } from '../../src/shared/schemas/common';
import { fxRateBody, fxRateOut, fxListQuery } from '../../src/shared/schemas/fx';
import { scoped } from '../db/scope';
import { deleteOrNotFound } from '../db/versioned';
import { audit } from '../audit/repository';
import { sniff } from '../http/upload';
import { parseEurFeed } from './feed-csv';

const view = (r: { id: string; date: string; base: string; quote: string; rate: string; source: string }) => ({
  id: r.id, date: r.date, base: r.base, quote: r.quote, rate: r.rate.replace(/\.?0+$/, ''), source: r.source,
});

export const fxRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/fx-rates', access: 'fx.read', tag: 'FX rates',
    summary: 'FX rates, newest first: a row means 1 base = rate quote on that date.',
    query: fxListQuery, response: z.object({ items: z.array(fxRateOut), nextCursor: z.string().nullable() }),
    handler: async ({ auth, query, deps }) => {
      const q = scoped(deps.db, 'fx_rates', auth.workspaceId).orderBy([{ column: 'date', order: 'desc' }, 'base', 'quote']).limit(query.limit);
      if (query.from) q.andWhere('date', '>=', query.from);
      if (query.to) q.andWhere('date', '<=', query.to);
      if (query.currency) q.andWhere((w) => w.where('base', query.currency!).orWhere('quote', query.currency!));
      return { items: (await q).map(view), nextCursor: null };
    },
  }),
  route({
    method: 'post', path: '/api/fx-rates', access: 'fx.write', tag: 'FX rates', status: 201,
    summary: 'Enter one rate by hand; the same date and pair again is a 409.', body: fxRateBody, response: fxRateOut,
    handler: async ({ auth, body, deps }) =>
      deps.db.transaction(async (trx) => {
        const [row] = await trx('fx_rates').insert({ ...body, workspaceId: auth.workspaceId, source: 'manual' }).returning('*');
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'fx_rate', entityId: row.id, changes: body });
        return view(row);
      }),
  }),
  route({
    method: 'delete', path: '/api/fx-rates/:id', access: 'fx.write', tag: 'FX rates',
    summary: 'Delete one rate.', params: idParams,
    handler: async ({ auth, params, deps }) => {
      await deleteOrNotFound(deps.db, 'fx_rates', auth.workspaceId, params.id, 'FX rate');
      return undefined;
    },
  }),
  route({
    method: 'post', path: '/api/fx-rates/import', access: 'fx.write', tag: 'FX rates', bodyKind: 'multipart', maxUploadBytes: 5 * 1024 * 1024,
    summary: 'Import a daily EUR reference-rate feed as CSV (`date,currency,rate`, or `Date,USD,JPY,…`). All rows or none; existing rows for the same date and pair are replaced.',
    handler: async ({ auth, upload, deps }) => {
      if (sniff(upload.file.buffer) !== 'text') throw errors.unsupported('The feed must be a CSV text file.');
      const { rates, problems } = parseEurFeed(upload.file.buffer.toString('utf8'));
      if (problems.length) throw errors.validation(`The feed has ${problems.length} problem(s); nothing was imported.`, problems.slice(0, 50).map((p) => ({ path: `row ${p.row}`, message: p.message })));
      await deps.db.transaction(async (trx) => {
        for (let i = 0; i < rates.length; i += 1000) {
          await trx('fx_rates')
            .insert(rates.slice(i, i + 1000).map((r) => ({ ...r, workspaceId: auth.workspaceId, source: 'feed' })))
            .onConflict(['workspace_id', 'date', 'base', 'quote'])
            .merge(['rate', 'source']);
        }
        await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'import', entity: 'fx_rate', changes: { rows: rates.length } });
      });
      return { imported: rates.length };
    },
  }),
];
