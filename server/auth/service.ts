import type { Request } from 'express';
import type { Deps } from '../deps';
import { errors } from '../http/errors';
import { usersRepo, type UserRow } from './repository';
import { hashPassword } from './passwords';
import { newSecret, hashSecret } from './secret-tokens';
import { resetMail } from '../mail/templates';
import { audit } from '../audit/repository';
import { seedStressPolicies } from '../stress/seed-policies';
import type { Role } from '../../src/shared/schemas/common';
import type { SignupBody } from '../../src/shared/schemas/auth';

export interface SessionView {
  user: { id: string; email: string; name: string };
  workspace: { id: string; name: string };
  role: Role;
}

const userView = (u: UserRow) => ({ id: u.id, email: u.email, name: u.name });

/** Establishes the session (a fresh session id: fixation protection) in one workspace. */
export function loginSession(req: Request, userId: string, workspaceId: string): Promise<void> {
  return new Promise((resolve, reject) => {
    req.login({ id: userId }, (err) => {
      if (err) return reject(err);
      req.session.workspaceId = workspaceId;
      req.session.save((e) => (e ? reject(e) : resolve()));
    });
  });
}

export async function sessionView(deps: Deps, userId: string, workspaceId: string): Promise<SessionView> {
  const user = await usersRepo.byId(deps.db, userId);
  const m = await usersRepo.membership(deps.db, userId, workspaceId);
  if (!user || !m) throw errors.unauthenticated();
  return { user: userView(user), workspace: { id: m.workspaceId, name: m.workspaceName }, role: m.role };
}

export async function signup(deps: Deps, body: SignupBody): Promise<{ userId: string; workspaceId: string }> {
  const passwordHash = await hashPassword(body.password);
  return deps.db.transaction(async (trx) => {
    const user = await usersRepo.create(trx, { email: body.email, name: body.name, passwordHash });
    const ws = await usersRepo.createWorkspace(trx, body.workspaceName);
    await usersRepo.addMember(trx, ws.id, user.id, 'owner');
    await seedStressPolicies(trx, ws.id);
    await audit(trx, { workspaceId: ws.id, userId: user.id, action: 'create', entity: 'workspace', entityId: ws.id, changes: { name: ws.name } });
    return { userId: user.id, workspaceId: ws.id };
  });
}

/** The workspace a user lands in after sign-in: the first they joined. */
export async function defaultWorkspace(deps: Deps, userId: string): Promise<string> {
  const ms = await usersRepo.memberships(deps.db, userId);
  if (!ms.length) throw errors.forbidden('Your account belongs to no workspace any more.');
  return ms[0].workspaceId;
}

export async function requestReset(deps: Deps, email: string): Promise<void> {
  const user = await usersRepo.byEmail(deps.db, email);
  if (!user) return; // same answer either way: no account probing
  const { secret, hash } = newSecret();
  await usersRepo.createReset(deps.db, user.id, hash, new Date(Date.now() + 3600_000));
  const link = `${deps.config.PUBLIC_URL}/reset-password/${secret}`;
  try {
    await deps.mailer.send(resetMail({ to: user.email, link }));
  } catch (err) {
    deps.logger.error({ err }, 'password reset mail not sent');
  }
}

export async function confirmReset(deps: Deps, token: string, password: string): Promise<void> {
  const passwordHash = await hashPassword(password);
  await deps.db.transaction(async (trx) => {
    const userId = await usersRepo.consumeReset(trx, hashSecret(token));
    if (!userId) throw errors.validation('This reset link is not valid or has expired.', [{ path: 'token', message: 'is not valid or has expired' }]);
    await usersRepo.setPassword(trx, userId, passwordHash);
    // Signing out everywhere: a reset usually follows a suspected leak.
    await trx.raw(`DELETE FROM session WHERE sess::jsonb -> 'passport' ->> 'user' = ?`, [userId]);
  });
}
