import type { DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';

export interface AuditEntry {
  workspaceId: string;
  userId: string | null;
  action: string;
  entity: string;
  entityId?: string | null;
  changes?: unknown;
}

/** Who changed what, when; written in the same transaction as the change itself. */
export async function audit(db: DbOrTrx, e: AuditEntry): Promise<void> {
  await db('audit_log').insert({
    workspaceId: e.workspaceId,
    userId: e.userId,
    action: e.action,
    entity: e.entity,
    entityId: e.entityId ?? null,
    changes: e.changes === undefined ? null : JSON.stringify(e.changes),
  });
}

export interface AuditRow {
  id: string;
  action: string;
  entity: string;
  entityId: string | null;
  changes: unknown;
  createdAt: Date;
  userName: string | null;
}

export function listAudit(db: DbOrTrx, workspaceId: string, limit: number, before?: string): Promise<AuditRow[]> {
  const q = scoped(db, 'audit_log', workspaceId)
    .leftJoin('users', 'users.id', 'audit_log.userId')
    .orderBy('audit_log.id', 'desc')
    .limit(limit)
    .select('audit_log.id', 'audit_log.action', 'audit_log.entity', 'audit_log.entityId', 'audit_log.changes', 'audit_log.createdAt', 'users.name as userName');
  if (before) q.andWhere('audit_log.id', '<', before);
  return q as unknown as Promise<AuditRow[]>;
}
