import type { Knex } from 'knex';

/**
 * Every read or write of workspace-owned data starts here, so no query can forget
 * the workspace: `scoped(db, 'parts', ws)` is `db('parts').where('parts.workspace_id', ws)`.
 */
export function scoped(db: Knex | Knex.Transaction, table: string, workspaceId: string): Knex.QueryBuilder {
  const name = table.split(/\s+as\s+/i).pop()!.trim();
  return db(table).where(`${name}.workspace_id`, workspaceId);
}

/** Updates one row by id and version inside a workspace; returns the new row or null when stale/missing. */
export async function updateVersioned<T>(
  db: Knex | Knex.Transaction,
  table: string,
  workspaceId: string,
  id: string,
  version: number,
  changes: Record<string, unknown>,
): Promise<T | null> {
  const [row] = await scoped(db, table, workspaceId)
    .andWhere({ id, version })
    .update({ ...changes, version: db.raw('version + 1'), updatedAt: db.fn.now() })
    .returning('*');
  return (row as T) ?? null;
}
