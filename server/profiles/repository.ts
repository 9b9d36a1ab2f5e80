import type { DbOrTrx } from '../db/knex';
import { scoped } from '../db/scope';
import type { LandedCostProfile } from '../costing';

export interface ProfileRow extends LandedCostProfile {
  id: string;
  name: string;
  currency: string;
  notes: string;
  version: number;
}

/** A profile's fields as the API gives them. */
export const PROFILE_FIELDS = [
  'id', 'name', 'currency', 'originPct', 'freightPct', 'freightPerShipment', 'freightCurrency', 'shipments', 'freightBasis',
  'insurancePct', 'dutyBasis', 'dutyRates', 'defaultDutyPct', 'feesPerShipment', 'destinationPct', 'maxLeadTimeDays',
  'attritionPct', 'smtRatePerPlacement', 'thtRatePerJoint', 'handRatePerOp', 'notes', 'version',
] as const;

export function profileView(r: ProfileRow): ProfileRow {
  return Object.fromEntries(PROFILE_FIELDS.map((f) => [f, r[f as keyof ProfileRow] ?? null])) as unknown as ProfileRow;
}

export async function getProfile(db: DbOrTrx, workspaceId: string, id: string): Promise<ProfileRow | undefined> {
  return scoped(db, 'landed_cost_profiles', workspaceId).andWhere({ id }).first();
}

