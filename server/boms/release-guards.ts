import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import type { DbOrTrx, Trx } from '../db/knex';
import type { BomRow } from './repository';

/**
 * Hooks other areas plug into BOMs without the BOM code knowing them: the stress check
 * (tally on the list, veto on release) and the plan limits (on create). Each defaults to
 * doing nothing.
 */
export const releaseGuards = {
  tallies: async (_deps: Deps, _workspaceId: string, _boms: BomRow[]): Promise<Map<string, unknown>> => new Map(),
  beforeRelease: async (_trx: Trx, _deps: Deps, _auth: Auth, _bom: BomRow): Promise<void> => undefined,
  beforeCreate: async (_db: DbOrTrx, _deps: Deps, _auth: Auth): Promise<void> => undefined,
};
