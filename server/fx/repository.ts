import type { DbOrTrx } from '../db/knex';
import type { FxRate } from '../costing';

/**
 * The FX rows a costing on a date can use: the latest row dated on or before it for each
 * (base, quote) pair. Parameters: workspace id, date.
 */
export const RATES_AS_OF_SQL = `SELECT DISTINCT ON (base, quote) id::text AS id, to_char(date, 'YYYY-MM-DD') AS date, base, quote, rate::text AS rate
       FROM fx_rates WHERE workspace_id = ? AND date <= ?
      ORDER BY base, quote, date DESC`;

/** The FX rows a costing on `date` can use, in one query. */
export async function ratesAsOf(db: DbOrTrx, workspaceId: string, date: string): Promise<(FxRate & { id: string })[]> {
  const { rows } = await db.raw(RATES_AS_OF_SQL, [workspaceId, date]);
  return rows;
}

export async function pivotOf(db: DbOrTrx, workspaceId: string): Promise<string> {
  const ws = await db('workspaces').where({ id: workspaceId }).first('pivotCurrency');
  return ws?.pivotCurrency ?? 'EUR';
}
