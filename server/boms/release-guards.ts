import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import type { DbOrTrx, Trx } from '../db/knex';
import type { BomRow } from './repository';
import { stressTallies, assertReleasable } from '../stress/service';
import { assertAllowed } from '../billing/plan';
import { HttpError } from '../http/errors';

/**
 * What other areas say about a BOM's life: the stress tally on the list, the stress
 * veto on release, and (with plans) the limit on creating BOMs.
 */
export const releaseGuards = {
  /** The stress tally of one BOM (stored with its roll-up); null without a stress policy. */
  tally: async (db: DbOrTrx, workspaceId: string, bom: BomRow) => {
    try {
      return (await stressTallies(db, workspaceId, [bom])).get(bom.id) ?? null;
    } catch (err) {
      // No stress policy in the workspace: nothing to tally, and the cost roll must not fail for it.
      if (err instanceof HttpError && err.status === 409) return null;
      throw err;
    }
  },
  beforeRelease: (trx: Trx, deps: Deps, auth: Auth, bom: BomRow) => assertReleasable(trx, deps, auth, bom),
  beforeCreate: (db: DbOrTrx, deps: Deps, auth: Auth) => assertAllowed(db, auth.workspaceId, deps.config.BILLING_GRACE_DAYS, 'boms'),
};
