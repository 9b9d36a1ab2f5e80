import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import { errors } from '../http/errors';
import { scoped } from '../db/scope';
import { audit } from '../audit/repository';
import { newSecret } from '../auth/secret-tokens';
import { assertAllowed } from '../billing/plan';
import { today } from '../quotes/repository';
import { writeBreaks } from '../quotes/repository';
import type { RfqAnswerBody, RfqCreateBody } from '../../src/shared/schemas/rfqs';
import { rfqMail, answeredMail } from './mails';
import { recipientByToken, type RecipientRow } from './repository';

const LINK_DAYS_AFTER_REPLY_BY = 14;

async function sendLink(deps: Deps, r: { rfqId: string; supplierId: string; recipientId: string }, token: string, reminder = false) {
  const [rfq, supplier, items, creator] = await Promise.all([
    deps.db('rfqs').where({ id: r.rfqId }).first('title', 'quantities', 'message', 'createdBy', deps.db.raw(`to_char(reply_by, 'YYYY-MM-DD') as reply_by`)),
    deps.db('suppliers').where({ id: r.supplierId }).first('name', 'contactEmails'),
    deps.db('rfq_items').where({ rfqId: r.rfqId }).count('* as n').first(),
    deps.db('rfqs').join('users', 'users.id', 'rfqs.createdBy').where('rfqs.id', r.rfqId).first('users.name'),
  ]);
  for (const to of supplier.contactEmails as string[]) {
    await deps.mailer.send(rfqMail({
      to, from: creator?.name ?? 'A buyer', title: rfq.title, supplier: supplier.name, replyBy: rfq.replyBy, quantities: rfq.quantities,
      parts: Number(items?.n ?? 0), link: `${deps.config.PUBLIC_URL}/rfq/${token}`, message: rfq.message, reminder,
    }));
  }
}

export async function createRfq(deps: Deps, auth: Auth, body: RfqCreateBody) {
  await assertAllowed(deps.db, auth.workspaceId, deps.config.BILLING_GRACE_DAYS, 'rfq');
  if (body.replyBy < today()) throw errors.validation('The reply-by date is in the past.', [{ path: 'replyBy', message: 'must be today or later' }]);
  const tokens: { recipientId: string; supplierId: string; token: string }[] = [];
  const rfq = await deps.db.transaction(async (trx) => {
    let partIds = body.partIds;
    if (body.bomId) {
      const bom = await scoped(trx, 'boms', auth.workspaceId).andWhere({ id: body.bomId }).first('id');
      if (!bom) throw errors.validation('No such BOM in this workspace.', [{ path: 'bomId', message: 'refers to a missing BOM' }]);
      if (!partIds.length) {
        partIds = (await scoped(trx, 'bom_lines', auth.workspaceId).andWhere({ bomId: body.bomId, kind: 'part', dnp: false }).whereNotNull('partId').distinct('partId').pluck('partId')) as string[];
      }
    }
    partIds = [...new Set(partIds)];
    if (!partIds.length) throw errors.validation('The request names no parts.', [{ path: 'partIds', message: 'choose at least one part' }]);
    const found = await scoped(trx, 'parts', auth.workspaceId).andWhereRaw('id = ANY(?::bigint[])', [partIds]).pluck('id');
    if (found.length !== partIds.length) throw errors.validation('A part is not in this workspace.', [{ path: 'partIds', message: 'refers to a missing part' }]);
    const suppliers = (await scoped(trx, 'suppliers', auth.workspaceId).andWhereRaw('id = ANY(?::bigint[])', [body.supplierIds]).select('id', 'name', 'contactEmails', 'active')) as { id: string; name: string; contactEmails: string[]; active: boolean }[];
    if (suppliers.length !== new Set(body.supplierIds).size) throw errors.validation('A supplier is not in this workspace.', [{ path: 'supplierIds', message: 'refers to a missing supplier' }]);
    const mute = suppliers.filter((s) => !s.contactEmails.length);
    if (mute.length) throw errors.validation(`${mute.map((s) => s.name).join(', ')} has no contact e-mail.`, [{ path: 'supplierIds', message: 'a supplier needs a contact e-mail' }]);
    const [row] = await trx('rfqs')
      .insert({ workspaceId: auth.workspaceId, title: body.title, bomId: body.bomId, quantities: body.quantities, replyBy: body.replyBy, message: body.message, createdBy: auth.userId })
      .returning('*');
    await trx('rfq_items').insert(partIds.map((partId) => ({ workspaceId: auth.workspaceId, rfqId: row.id, partId })));
    const expiresAt = new Date(new Date(`${body.replyBy}T23:59:59Z`).getTime() + LINK_DAYS_AFTER_REPLY_BY * 86400_000);
    for (const s of suppliers) {
      const { secret, hash } = newSecret('rfq_');
      const [rec] = await trx('rfq_recipients').insert({ workspaceId: auth.workspaceId, rfqId: row.id, supplierId: s.id, tokenHash: hash, expiresAt }).returning('id');
      tokens.push({ recipientId: rec.id, supplierId: s.id, token: secret });
    }
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'create', entity: 'rfq', entityId: row.id, changes: { ...body, partIds } });
    return row;
  });
  // Queued after the commit: the links exist before anyone can click them.
  for (const t of tokens) await sendLink(deps, { rfqId: rfq.id, supplierId: t.supplierId, recipientId: t.recipientId }, t.token);
  return rfqDetail(deps, auth.workspaceId, rfq.id);
}

export async function rfqDetail(deps: Deps, workspaceId: string, id: string) {
  const rfq = await scoped(deps.db, 'rfqs', workspaceId).andWhere({ id }).first('id', 'title', 'bomId', 'quantities', 'state', 'message', 'closedAt', 'createdAt', 'version', deps.db.raw(`to_char(reply_by, 'YYYY-MM-DD') as reply_by`));
  if (!rfq) throw errors.notFound('request for quotation');
  const [items, recipients, answers] = await Promise.all([
    scoped(deps.db, 'rfq_items', workspaceId).andWhere({ rfqId: id }).join('parts', function () {
      this.on('parts.id', 'rfq_items.partId').andOn('parts.workspaceId', 'rfq_items.workspaceId');
    }).select('rfq_items.id', 'rfq_items.partId', 'parts.internalPn', 'parts.mpn', 'parts.description'),
    scoped(deps.db, 'rfq_recipients', workspaceId).andWhere({ rfqId: id }).join('suppliers', function () {
      this.on('suppliers.id', 'rfq_recipients.supplierId').andOn('suppliers.workspaceId', 'rfq_recipients.workspaceId');
    }).select('rfq_recipients.id', 'rfq_recipients.supplierId', 'suppliers.name as supplierName', 'rfq_recipients.status', 'rfq_recipients.sentAt', 'rfq_recipients.openedAt', 'rfq_recipients.answeredAt', 'rfq_recipients.remindedAt', 'rfq_recipients.expiresAt'),
    scoped(deps.db, 'rfq_answers', workspaceId).join('rfq_recipients', 'rfq_recipients.id', 'rfq_answers.recipientId').where('rfq_recipients.rfqId', id).select('rfq_answers.recipientId', 'rfq_answers.itemId', 'rfq_answers.declined', 'rfq_answers.quoteId'),
  ]);
  const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);
  const overdue = rfq.state === 'open' && rfq.replyBy < today();
  return {
    id: rfq.id, title: rfq.title, bomId: rfq.bomId, quantities: rfq.quantities, replyBy: rfq.replyBy, state: rfq.state, message: rfq.message,
    closedAt: iso(rfq.closedAt), createdAt: iso(rfq.createdAt), version: rfq.version, items,
    recipients: recipients.map((r: Record<string, unknown>) => ({
      id: r.id, supplierId: r.supplierId, supplierName: r.supplierName,
      status: (r.status === 'sent' || r.status === 'opened') && overdue ? 'overdue' : r.status,
      sentAt: iso(r.sentAt as Date), openedAt: iso(r.openedAt as Date | null), answeredAt: iso(r.answeredAt as Date | null), remindedAt: iso(r.remindedAt as Date | null),
      answers: answers.filter((a: { recipientId: string }) => a.recipientId === r.id),
    })),
  };
}

export async function remind(deps: Deps, auth: Auth, id: string) {
  const rfq = await scoped(deps.db, 'rfqs', auth.workspaceId).andWhere({ id }).first('id', 'state');
  if (!rfq) throw errors.notFound('request for quotation');
  if (rfq.state !== 'open') throw errors.conflict('This request is closed.');
  const waiting = (await scoped(deps.db, 'rfq_recipients', auth.workspaceId).andWhere({ rfqId: id }).whereIn('status', ['sent', 'opened']).select('id', 'supplierId')) as { id: string; supplierId: string }[];
  // Only hashes are kept, so a reminder carries a fresh link; the old one stops working.
  for (const r of waiting) {
    const { secret, hash } = newSecret('rfq_');
    await deps.db('rfq_recipients').where({ id: r.id }).update({ tokenHash: hash, remindedAt: deps.db.fn.now() });
    await sendLink(deps, { rfqId: id, supplierId: r.supplierId, recipientId: r.id }, secret, true);
  }
  await audit(deps.db, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'remind', entity: 'rfq', entityId: id, changes: { recipients: waiting.length } });
  return { reminded: waiting.length };
}

export async function closeRfq(deps: Deps, auth: Auth, id: string) {
  const n = await scoped(deps.db, 'rfqs', auth.workspaceId).andWhere({ id, state: 'open' }).update({ state: 'closed', closedAt: deps.db.fn.now(), version: deps.db.raw('version + 1') });
  if (!n) {
    const exists = await scoped(deps.db, 'rfqs', auth.workspaceId).andWhere({ id }).first('id');
    if (!exists) throw errors.notFound('request for quotation');
  }
  await audit(deps.db, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'close', entity: 'rfq', entityId: id });
  return rfqDetail(deps, auth.workspaceId, id);
}

// ---- the supplier's side, through the private link -------------------------------------

export async function supplierView(deps: Deps, token: string) {
  const r = await recipientByToken(deps.db, token);
  if (r.status === 'sent') await deps.db('rfq_recipients').where({ id: r.id }).update({ status: 'opened', openedAt: deps.db.fn.now() });
  const items = (await scoped(deps.db, 'rfq_items', r.workspaceId).andWhere({ rfqId: r.rfqId })
    .join('parts', function () {
      this.on('parts.id', 'rfq_items.partId').andOn('parts.workspaceId', 'rfq_items.workspaceId');
    })
    .orderBy('rfq_items.id')
    .select('rfq_items.id as itemId', 'parts.internalPn', 'parts.mpn', 'parts.manufacturer', 'parts.description', 'parts.package', 'rfq_items.note')) as SupplierItem[];
  const answers = (await deps.db('rfq_answers').where({ recipientId: r.id }).select('itemId', 'declined', 'quoteId')) as { itemId: string; declined: boolean; quoteId: string | null }[];
  return {
    title: r.title, buyer: r.workspaceName, supplier: r.supplierName, replyBy: r.replyBy, quantities: r.quantities, message: r.message,
    status: r.status === 'sent' ? 'opened' : r.status, defaultCurrency: r.supplierCurrency, defaultIncoterm: r.supplierIncoterm,
    expiresAt: new Date(r.expiresAt).toISOString(), items, answers,
  };
}

export interface SupplierItem {
  itemId: string;
  internalPn: string;
  mpn: string;
  manufacturer: string;
  description: string;
  package: string;
  note: string;
}

/** Offers become quotes with source `rfq` in the buyer's workspace, all in one transaction. */
export async function submitAnswers(deps: Deps, token: string, body: RfqAnswerBody) {
  const r: RecipientRow = await recipientByToken(deps.db, token);
  const items = (await scoped(deps.db, 'rfq_items', r.workspaceId).andWhere({ rfqId: r.rfqId }).select('id', 'partId')) as { id: string; partId: string }[];
  const byId = new Map(items.map((i) => [i.id, i]));
  // Problems name the answer by its position in the request, as the schema's own do.
  const unknown = body.items.map((a, i) => ({ a, i })).filter(({ a }) => !byId.has(a.itemId));
  if (unknown.length) throw errors.validation('An answer names a part this request does not ask for.', unknown.map(({ i }) => ({ path: `items.${i}.itemId`, message: 'is not in this request' })));
  const validFrom = today();
  const result = await deps.db.transaction(async (trx) => {
    let quotes = 0;
    let declined = 0;
    const previous = new Map(((await trx('rfq_answers').where({ recipientId: r.id }).select('itemId', 'quoteId')) as { itemId: string; quoteId: string | null }[]).map((x) => [x.itemId, x.quoteId]));
    for (const [index, a] of body.items.entries()) {
      if (!a.declined && a.validUntil < validFrom) throw errors.validation('An offer is already expired.', [{ path: `items.${index}.validUntil`, message: 'must be today or later' }]);
      // A corrected answer replaces the supplier's earlier offer for that part.
      const old = previous.get(a.itemId);
      if (old) await scoped(trx, 'quotes', r.workspaceId).andWhere({ id: old, source: 'rfq' }).delete();
      let quoteId: string | null = null;
      if (a.declined) declined++;
      else {
        const [q] = await trx('quotes').insert({
          workspaceId: r.workspaceId, partId: byId.get(a.itemId)!.partId, supplierId: r.supplierId, currency: a.currency, incoterm: a.incoterm,
          moq: a.moq, orderMultiple: a.orderMultiple, leadTimeDays: a.leadTimeDays, validFrom, validUntil: a.validUntil, source: 'rfq',
          note: (a.note ?? `Answer to "${r.title}"`).slice(0, 1000),
        }).returning('id');
        await writeBreaks(trx, r.workspaceId, q.id, a.priceBreaks);
        quoteId = q.id;
        quotes++;
      }
      await trx('rfq_answers').insert({ workspaceId: r.workspaceId, recipientId: r.id, itemId: a.itemId, declined: a.declined, quoteId })
        .onConflict(['recipient_id', 'item_id']).merge(['declined', 'quoteId']);
    }
    const status = quotes === 0 && declined === items.length ? 'declined' : 'answered';
    await trx('rfq_recipients').where({ id: r.id }).update({ status, answeredAt: trx.fn.now() });
    await audit(trx, { workspaceId: r.workspaceId, userId: null, action: 'answer', entity: 'rfq', entityId: r.rfqId, changes: { supplierId: r.supplierId, quotes, declined } });
    return { quotes, declined, status };
  });
  const buyer = r.createdBy ? await deps.db('users').where({ id: r.createdBy }).first('email') : null;
  if (buyer) await deps.mailer.send(answeredMail({ to: buyer.email, supplier: r.supplierName, title: r.title, quotes: result.quotes, declined: result.declined, link: `${deps.config.PUBLIC_URL}/rfqs/${r.rfqId}` }));
  return result;
}
