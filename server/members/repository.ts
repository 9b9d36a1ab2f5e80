import type { DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';
import type { Role } from '../../src/shared/schemas/common';

export interface MemberRow {
  userId: string;
  email: string;
  name: string;
  role: Role;
  version: number;
  joinedAt: Date;
}

export const membersRepo = {
  list: (db: DbOrTrx, workspaceId: string): Promise<MemberRow[]> =>
    scoped(db, 'memberships', workspaceId)
      .join('users', 'users.id', 'memberships.userId')
      .orderBy('memberships.createdAt')
      .select('memberships.userId', 'users.email', 'users.name', 'memberships.role', 'memberships.version', 'memberships.createdAt as joinedAt'),
  get: (db: DbOrTrx, workspaceId: string, userId: string): Promise<MemberRow | undefined> =>
    scoped(db, 'memberships', workspaceId)
      .join('users', 'users.id', 'memberships.userId')
      .andWhere('memberships.userId', userId)
      .first('memberships.userId', 'users.email', 'users.name', 'memberships.role', 'memberships.version', 'memberships.createdAt as joinedAt'),
  async ownerCount(db: DbOrTrx, workspaceId: string): Promise<number> {
    const row = await scoped(db, 'memberships', workspaceId).andWhere({ role: 'owner' }).count<{ count: string }[]>('* as count');
    return Number(row[0].count);
  },
  setRole: (db: DbOrTrx, workspaceId: string, userId: string, role: Role) =>
    scoped(db, 'memberships', workspaceId).andWhere({ userId }).update({ role, version: db.raw('version + 1') }),
  remove: (db: DbOrTrx, workspaceId: string, userId: string) =>
    scoped(db, 'memberships', workspaceId).andWhere({ userId }).delete(),

  invites: (db: DbOrTrx, workspaceId: string): Promise<{ id: string; email: string; role: Role; expiresAt: Date; createdAt: Date }[]> =>
    scoped(db, 'invites', workspaceId)
      .whereNull('acceptedAt')
      .andWhere('expiresAt', '>', db.fn.now())
      .orderBy('createdAt', 'desc')
      .select('id', 'email', 'role', 'expiresAt', 'createdAt'),
  async createInvite(db: DbOrTrx, v: { workspaceId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date }) {
    const [row] = await db('invites').insert(v).returning(['id', 'email', 'role', 'expiresAt', 'createdAt']);
    return row;
  },
  deleteInvite: (db: DbOrTrx, workspaceId: string, id: string) => scoped(db, 'invites', workspaceId).andWhere({ id }).delete(),
  /** An open invite by its token, wherever it belongs: the token itself is the proof. */
  openInviteByHash: (db: DbOrTrx, tokenHash: string) =>
    db('invites as i')
      .join('workspaces as w', 'w.id', 'i.workspaceId')
      .where('i.tokenHash', tokenHash)
      .whereNull('i.acceptedAt')
      .andWhere('i.expiresAt', '>', db.fn.now())
      .first('i.id', 'i.workspaceId', 'i.email', 'i.role', 'w.name as workspaceName'),
  markAccepted: (db: DbOrTrx, id: string) => db('invites').where({ id }).whereNull('acceptedAt').update({ acceptedAt: db.fn.now() }),
};
