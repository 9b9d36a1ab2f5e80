import type { Request, Response, NextFunction } from 'express';
import type { Knex } from 'knex';
import { hashSecret } from './secret-tokens';
import { usersRepo } from './repository';
import { errors } from '../http/errors';
import { membershipReadWithSession } from './session';

/**
 * Works out who is asking, once per request: a Bearer API token (acting as its user in
 * its workspace with that user's current role) or the session (user + chosen workspace).
 * The role is read fresh each time, so a role change or removal applies at once.
 */
export function resolveAuth(db: Knex) {
  return async (req: Request, _res: Response, next: NextFunction) => {
    try {
      req.auth = null;
      const header = req.headers.authorization;
      if (header?.startsWith('Bearer ')) {
        const hash = hashSecret(header.slice(7).trim());
        const row = await db('api_tokens as t')
          .join('memberships as m', function () {
            this.on('m.userId', 't.userId').andOn('m.workspaceId', 't.workspaceId');
          })
          .where('t.tokenHash', hash)
          .whereNull('t.revokedAt')
          .first('t.id', 't.userId', 't.workspaceId', 'm.role');
        if (!row) return next(errors.unauthenticated('This API token is not valid or was revoked.'));
        req.auth = { userId: row.userId, workspaceId: row.workspaceId, role: row.role, via: 'token', tokenId: row.id };
        await db('api_tokens').where({ id: row.id }).update({ lastUsedAt: db.fn.now() });
        return next();
      }
      const userId = (req.user as { id?: string } | undefined)?.id;
      const workspaceId = req.session?.workspaceId;
      if (userId && workspaceId) {
        // Read with the session when it was loaded (one statement for both), else now.
        const read = membershipReadWithSession(req);
        const role = read && read.userId === String(userId) && read.workspaceId === String(workspaceId) ? read.role : (await usersRepo.membership(db, userId, workspaceId))?.role;
        if (role) req.auth = { userId, workspaceId, role, via: 'session' };
      }
      next();
    } catch (err) {
      next(err);
    }
  };
}
