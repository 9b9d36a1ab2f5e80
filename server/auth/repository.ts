import type { DbOrTrx } from '../db/knex';
import type { Role } from '../../src/shared/schemas/common';

export interface UserRow {
  id: string;
  email: string;
  name: string;
  passwordHash: string;
}

export interface MembershipView {
  workspaceId: string;
  workspaceName: string;
  role: Role;
}

// Users and memberships are not workspace-owned data: a user spans workspaces.
export const usersRepo = {
  byEmail: (db: DbOrTrx, email: string) => db('users').where({ email }).first<UserRow | undefined>(),
  byId: (db: DbOrTrx, id: string) => db('users').where({ id }).first<UserRow | undefined>(),
  async create(db: DbOrTrx, u: { email: string; name: string; passwordHash: string }): Promise<UserRow> {
    const [row] = await db('users').insert(u).returning('*');
    return row;
  },
  setPassword: (db: DbOrTrx, id: string, passwordHash: string) =>
    db('users').where({ id }).update({ passwordHash, updatedAt: db.fn.now(), version: db.raw('version + 1') }),

  memberships: (db: DbOrTrx, userId: string): Promise<MembershipView[]> =>
    db('memberships as m')
      .join('workspaces as w', 'w.id', 'm.workspaceId')
      .where('m.userId', userId)
      .orderBy('m.createdAt')
      .select('m.workspaceId', 'w.name as workspaceName', 'm.role'),

  membership: (db: DbOrTrx, userId: string, workspaceId: string): Promise<MembershipView | undefined> =>
    db('memberships as m')
      .join('workspaces as w', 'w.id', 'm.workspaceId')
      .where({ 'm.userId': userId, 'm.workspaceId': workspaceId })
      .first('m.workspaceId', 'w.name as workspaceName', 'm.role'),

  async createWorkspace(db: DbOrTrx, name: string): Promise<{ id: string; name: string }> {
    const [row] = await db('workspaces').insert({ name }).returning(['id', 'name']);
    return row;
  },
  addMember: (db: DbOrTrx, workspaceId: string, userId: string, role: Role) =>
    db('memberships').insert({ workspaceId, userId, role }),

  async createReset(db: DbOrTrx, userId: string, tokenHash: string, expiresAt: Date): Promise<void> {
    await db('password_resets').insert({ userId, tokenHash, expiresAt });
  },
  /** Marks a reset used and returns its user, only if it is unused and unexpired. */
  async consumeReset(db: DbOrTrx, tokenHash: string): Promise<string | null> {
    const [row] = await db('password_resets')
      .where({ tokenHash })
      .whereNull('usedAt')
      .andWhere('expiresAt', '>', db.fn.now())
      .update({ usedAt: db.fn.now() })
      .returning('userId');
    return row?.userId ?? null;
  },
};
