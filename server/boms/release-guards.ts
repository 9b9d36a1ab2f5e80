import type { Deps } from '../deps';
import type { Auth } from '../http/route';
import type { DbOrTrx, Trx } from '../db/knex';
import type { BomRow } from './repository';
import { stressCheckOf, assertReleasable } from '../stress/service';
import { assertAllowed } from '../billing/plan';
import { HttpError } from '../http/errors';

/**
 * What other areas say about a BOM's life: the stress tally on the list, the stress
 * veto on release, and (with plans) the limit on creating BOMs.
 */
export const releaseGuards = {
  /** The stress check of one BOM without waivers (stored with its roll-up); null without a stress policy. */
  stressCheck: async (db: DbOrTrx, workspaceId: string, bom: BomRow) => {
    try {
      return await stressCheckOf(db, workspaceId, bom);
    } catch (err) {
      // No stress policy in the workspace: nothing to check, and the cost roll must not fail for it.
      if (err instanceof HttpError && err.status === 409) return null;
      throw err;
    }
  },
  beforeRelease: (trx: Trx, deps: Deps, auth: Auth, bom: BomRow) => assertReleasable(trx, deps, auth, bom),
  beforeCreate: (db: DbOrTrx, deps: Deps, auth: Auth) => assertAllowed(db, auth.workspaceId, deps.config.BILLING_GRACE_DAYS, 'boms'),
};
