import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { idParams } from '../../src/shared/schemas/common';
import { rfqCreateBody, rfqAnswerBody } from '../../src/shared/schemas/rfqs';
import { scoped } from '../db/scope';
import { createRfq, rfqDetail, remind, closeRfq, supplierView, submitAnswers } from './service';
import { answerSheet, readAnswerSheet } from './sheet';

const tokenParams = z.strictObject({ token: z.string().regex(/^rfq_[A-Za-z0-9_-]{20,80}$/, 'is not a link token') });

export const rfqRoutes: RouteDef[] = [
  route({
    method: 'get', path: '/api/rfqs', access: 'rfqs.read', tag: 'RFQs',
    summary: 'Requests for quotation, newest first, with their answer counts.',
    handler: async ({ auth, deps }) => {
      const rows = await scoped(deps.db, 'rfqs', auth.workspaceId).orderBy('id', 'desc')
        .select('id', 'title', 'state', 'quantities', 'createdAt', deps.db.raw(`to_char(reply_by, 'YYYY-MM-DD') as reply_by`),
          deps.db.raw(`(SELECT count(*) FROM rfq_recipients r WHERE r.rfq_id = rfqs.id)::int AS recipients`),
          deps.db.raw(`(SELECT count(*) FROM rfq_recipients r WHERE r.rfq_id = rfqs.id AND r.status IN ('answered','declined'))::int AS answered`));
      return { items: rows.map((r: Record<string, unknown>) => ({ ...r, createdAt: new Date(r.createdAt as Date).toISOString() })), nextCursor: null };
    },
  }),
  route({
    method: 'post', path: '/api/rfqs', access: 'rfqs.write', tag: 'RFQs', status: 201,
    summary: 'Send a request for quotation: parts (or a whole BOM), suppliers, quantities and a reply-by date. Each supplier contact gets a private, expiring link by e-mail.',
    body: rfqCreateBody,
    handler: async ({ auth, body, deps }) => createRfq(deps, auth, body),
  }),
  route({
    method: 'get', path: '/api/rfqs/:id', access: 'rfqs.read', tag: 'RFQs',
    summary: 'One request with each supplier’s status: sent, opened, answered, declined or overdue.', params: idParams,
    handler: async ({ auth, params, deps }) => rfqDetail(deps, auth.workspaceId, params.id),
  }),
  route({
    method: 'post', path: '/api/rfqs/:id/reminders', access: 'rfqs.write', tag: 'RFQs',
    summary: 'Remind the suppliers who have not answered (each gets a fresh link; the old one stops working).', params: idParams,
    handler: async ({ auth, params, deps }) => remind(deps, auth, params.id),
  }),
  route({
    method: 'post', path: '/api/rfqs/:id/close', access: 'rfqs.write', tag: 'RFQs',
    summary: 'Close the request: the suppliers’ links stop working.', params: idParams,
    handler: async ({ auth, params, deps }) => closeRfq(deps, auth, params.id),
  }),
  route({
    method: 'get', path: '/api/rfq-replies/:token', access: 'public', tag: 'RFQ replies (suppliers)',
    summary: 'What the private link shows a supplier: the requested parts and quantities. No account; the token is the key.', params: tokenParams,
    handler: async ({ params, deps }) => supplierView(deps, params.token),
  }),
  route({
    method: 'post', path: '/api/rfq-replies/:token', access: 'public', tag: 'RFQ replies (suppliers)',
    summary: 'Submit offers (price breaks, MOQ, order multiple, lead time, validity, Incoterm, currency per part) or decline parts; offers become quotes with source `rfq`.',
    params: tokenParams, body: rfqAnswerBody,
    handler: async ({ params, body, deps }) => submitAnswers(deps, params.token, body),
  }),
  route({
    method: 'get', path: '/api/rfq-replies/:token/sheet.xlsx', access: 'public', tag: 'RFQ replies (suppliers)',
    summary: 'The answer sheet to fill offline.', params: tokenParams,
    handler: async ({ params, res, deps }) => {
      const view = await supplierView(deps, params.token);
      res.setHeader('Content-Type', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
      res.setHeader('Content-Disposition', 'attachment; filename="quotation-sheet.xlsx"');
      res.send(await answerSheet(view));
      return undefined;
    },
  }),
  route({
    method: 'post', path: '/api/rfq-replies/:token/sheet', access: 'public', tag: 'RFQ replies (suppliers)', bodyKind: 'multipart', maxUploadBytes: 5 * 1024 * 1024,
    summary: 'Upload the filled answer sheet; the same checks as the form, all or nothing.', params: tokenParams,
    handler: async ({ params, upload, deps }) => {
      await supplierView(deps, params.token);
      return submitAnswers(deps, params.token, await readAnswerSheet(upload.file));
    },
  }),
];
