import type { DbOrTrx } from './knex';
import { scoped } from './scope';
import { errors } from '../http/errors';

/**
 * The optimistic-locking update every area uses: the row changes only if its version is
 * still the one the client saw; otherwise 409 (or 404 when the id is not in this workspace).
 */
export async function updateOrConflict<T>(
  db: DbOrTrx,
  table: string,
  workspaceId: string,
  id: string,
  version: number,
  changes: Record<string, unknown>,
  what: string,
): Promise<T> {
  const [row] = await scoped(db, table, workspaceId)
    .andWhere({ id, version })
    .update({ ...changes, version: db.raw('version + 1'), updatedAt: db.fn.now() })
    .returning('*');
  if (row) return row as T;
  const exists = await scoped(db, table, workspaceId).andWhere({ id }).first('id');
  throw exists ? errors.stale(what) : errors.notFound(what);
}

export async function deleteOrNotFound(db: DbOrTrx, table: string, workspaceId: string, id: string, what: string): Promise<void> {
  const n = await scoped(db, table, workspaceId).andWhere({ id }).delete();
  if (!n) throw errors.notFound(what);
}

export async function getOrNotFound<T>(db: DbOrTrx, table: string, workspaceId: string, id: string, what: string): Promise<T> {
  const row = await scoped(db, table, workspaceId).andWhere({ id }).first();
  if (!row) throw errors.notFound(what);
  return row as T;
}
