import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import { errors } from '../http/errors';
import { membersRepo } from './repository';
import { usersRepo } from '../auth/repository';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { newSecret, hashSecret } from '../auth/secret-tokens';
import { inviteMail } from '../mail/templates';
import { audit } from '../audit/repository';
import { assertAllowed } from '../billing/plan';
import type { Role } from '../../src/shared/schemas/common';
import type { AcceptInviteBody, InviteBody } from '../../src/shared/schemas/auth';

const INVITE_DAYS = 7;

export const memberView = (m: { userId: string; email: string; name: string; role: Role; joinedAt: Date }) => ({
  userId: m.userId, email: m.email, name: m.name, role: m.role, joinedAt: new Date(m.joinedAt).toISOString(),
});

export async function invite(deps: Deps, auth: Auth, body: InviteBody) {
  await assertAllowed(deps.db, auth.workspaceId, deps.config.BILLING_GRACE_DAYS, 'members');
  const existing = await usersRepo.byEmail(deps.db, body.email);
  if (existing && (await usersRepo.membership(deps.db, existing.id, auth.workspaceId))) {
    throw errors.conflict('This person is already a member of the workspace.', [{ path: 'email', message: 'is already a member' }]);
  }
  const { secret, hash } = newSecret();
  const expiresAt = new Date(Date.now() + INVITE_DAYS * 86400_000);
  const row = await deps.db.transaction(async (trx) => {
    const r = await membersRepo.createInvite(trx, { workspaceId: auth.workspaceId, email: body.email, role: body.role, tokenHash: hash, invitedBy: auth.userId, expiresAt });
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'invite', entity: 'member', entityId: null, changes: { email: body.email, role: body.role } });
    return r;
  });
  const inviter = await usersRepo.byId(deps.db, auth.userId);
  const ws = await usersRepo.membership(deps.db, auth.userId, auth.workspaceId);
  try {
    await deps.mailer.send(
      inviteMail({ to: body.email, inviter: inviter?.name ?? 'A colleague', workspace: ws?.workspaceName ?? 'a workspace', role: body.role, link: `${deps.config.PUBLIC_URL}/invite/${secret}`, expiresAt }),
    );
  } catch (err) {
    deps.logger.error({ err }, 'invite mail not sent');
  }
  return { id: row.id, email: row.email, role: row.role, expiresAt: new Date(row.expiresAt).toISOString(), createdAt: new Date(row.createdAt).toISOString() };
}

export async function previewInvite(deps: Deps, token: string) {
  const inv = await membersRepo.openInviteByHash(deps.db, hashSecret(token));
  if (!inv) throw errors.notFound('invitation (it may have expired or been used)');
  return { email: inv.email, workspaceName: inv.workspaceName, role: inv.role };
}

/** Accepting joins the workspace; an existing account must prove itself with its password. */
export async function acceptInvite(deps: Deps, body: AcceptInviteBody): Promise<{ userId: string; workspaceId: string }> {
  const newHash = await hashPassword(body.password);
  return deps.db.transaction(async (trx) => {
    const inv = await membersRepo.openInviteByHash(trx, hashSecret(body.token));
    if (!inv) throw errors.validation('This invitation is not valid, has expired or was already used.', [{ path: 'token', message: 'is not valid or has expired' }]);
    let user = await usersRepo.byEmail(trx, inv.email);
    if (user) {
      if (!(await verifyPassword(body.password, user.passwordHash))) {
        throw errors.validation('An account with this e-mail exists; enter its password to join.', [{ path: 'password', message: 'does not match the existing account' }]);
      }
    } else {
      user = await usersRepo.create(trx, { email: inv.email, name: body.name, passwordHash: newHash });
    }
    const taken = await trx('invites').where({ id: inv.id }).whereNull('acceptedAt').update({ acceptedAt: trx.fn.now() });
    if (!taken) throw errors.conflict('This invitation was just used.');
    await usersRepo.addMember(trx, inv.workspaceId, user.id, inv.role);
    await audit(trx, { workspaceId: inv.workspaceId, userId: user.id, action: 'join', entity: 'member', entityId: user.id, changes: { role: inv.role } });
    return { userId: user.id, workspaceId: inv.workspaceId };
  });
}

export async function changeRole(deps: Deps, auth: Auth, userId: string, role: Role, version?: number) {
  return deps.db.transaction(async (trx) => {
    const m = await membersRepo.get(trx, auth.workspaceId, userId);
    if (!m) throw errors.notFound('member');
    if (version !== undefined && version !== m.version) throw errors.stale('member');
    if (m.role === 'owner' && role !== 'owner' && (await membersRepo.ownerCount(trx, auth.workspaceId)) <= 1) {
      throw errors.conflict('A workspace keeps at least one owner; make someone else owner first.');
    }
    await membersRepo.setRole(trx, auth.workspaceId, userId, role);
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'update', entity: 'member', entityId: userId, changes: { role: [m.role, role] } });
    return memberView({ ...m, role });
  });
}

export async function removeMember(deps: Deps, auth: Auth, userId: string) {
  await deps.db.transaction(async (trx) => {
    const m = await membersRepo.get(trx, auth.workspaceId, userId);
    if (!m) throw errors.notFound('member');
    if (m.role === 'owner' && (await membersRepo.ownerCount(trx, auth.workspaceId)) <= 1) {
      throw errors.conflict('A workspace keeps at least one owner.');
    }
    await membersRepo.remove(trx, auth.workspaceId, userId);
    await trx('api_tokens').where({ workspaceId: auth.workspaceId, userId }).whereNull('revokedAt').update({ revokedAt: trx.fn.now() });
    await audit(trx, { workspaceId: auth.workspaceId, userId: auth.userId, action: 'remove', entity: 'member', entityId: userId, changes: { email: m.email } });
  });
}
