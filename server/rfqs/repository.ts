import type { DbOrTrx } from '../db/knex';
import { errors } from '../http/errors';
import { hashSecret } from '../auth/secret-tokens';

export interface RecipientRow {
  id: string;
  workspaceId: string;
  rfqId: string;
  supplierId: string;
  status: 'sent' | 'opened' | 'answered' | 'declined';
  expiresAt: Date;
  rfqState: 'open' | 'closed';
  title: string;
  replyBy: string;
  quantities: number[];
  message: string;
  supplierName: string;
  supplierCurrency: string;
  supplierIncoterm: string;
  workspaceName: string;
  createdBy: string | null;
}

/**
 * A supplier's private link: the token alone identifies one recipient of one RFQ, and
 * everything the page reads or writes is scoped to that recipient's workspace, RFQ and
 * supplier. Unknown → 404; closed or expired → 410 with a clear message.
 */
export async function recipientByToken(db: DbOrTrx, token: string): Promise<RecipientRow> {
  const row = (await db('rfq_recipients as r')
    .join('rfqs', function () {
      this.on('rfqs.id', 'r.rfqId').andOn('rfqs.workspaceId', 'r.workspaceId');
    })
    .join('suppliers as s', function () {
      this.on('s.id', 'r.supplierId').andOn('s.workspaceId', 'r.workspaceId');
    })
    .join('workspaces as w', 'w.id', 'r.workspaceId')
    .where('r.tokenHash', hashSecret(token))
    .first(
      'r.id', 'r.workspaceId', 'r.rfqId', 'r.supplierId', 'r.status', 'r.expiresAt', 'rfqs.state as rfqState', 'rfqs.title',
      db.raw(`to_char(rfqs.reply_by, 'YYYY-MM-DD') as reply_by`), 'rfqs.quantities', 'rfqs.message', 'rfqs.createdBy',
      's.name as supplierName', 's.currency as supplierCurrency', 's.defaultIncoterm as supplierIncoterm', 'w.name as workspaceName',
    )) as RecipientRow | undefined;
  if (!row) throw errors.notFound('request for quotation (the link is not valid)');
  if (row.rfqState === 'closed') throw errors.linkExpired('This request for quotation is closed; the buyer no longer takes answers on this link.');
  if (new Date(row.expiresAt).getTime() < Date.now()) throw errors.linkExpired('This link has expired; ask the buyer for a new one.');
  return row;
}
