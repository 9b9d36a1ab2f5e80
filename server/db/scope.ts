import type { Knex } from 'knex';

/**
 * Every read or write of workspace-owned data starts here, so no query can forget
 * the workspace: `scoped(db, 'parts', ws)` is `db('parts').where('parts.workspace_id', ws)`.
 */
export function scoped(db: Knex | Knex.Transaction, table: string, workspaceId: string): Knex.QueryBuilder {
  const name = table.split(/\s+as\s+/i).pop()!.trim();
  return db(table).where(`${name}.workspace_id`, workspaceId);
}
