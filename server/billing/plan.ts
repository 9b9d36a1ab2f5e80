import type { DbOrTrx } from '../db/knex';
import { errors } from '../http/errors';
import { plans, planAllowing, type PlanId, type Plan } from '../../src/shared/plans';
import { scoped } from '../db/scope';

export interface WorkspaceBilling {
  plan: PlanId;
  billingStatus: 'none' | 'active' | 'past_due' | 'canceled';
  currentPeriodEnd: Date | null;
  cancelAtPeriodEnd: boolean;
  pastDueSince: Date | null;
  stripeCustomerId: string | null;
  stripeSubscriptionId: string | null;
}

export async function billingOf(db: DbOrTrx, workspaceId: string): Promise<WorkspaceBilling> {
  return db('workspaces').where({ id: workspaceId }).first('plan', 'billingStatus', 'currentPeriodEnd', 'cancelAtPeriodEnd', 'pastDueSince', 'stripeCustomerId', 'stripeSubscriptionId');
}

/**
 * The plan whose limits apply now: the paid plan while the subscription is active, or past
 * due within the grace period; Bench otherwise. Nothing is ever deleted on a downgrade.
 */
export function effectivePlan(b: WorkspaceBilling, graceDays: number, now = Date.now()): { plan: Plan; graceEndsAt: Date | null } {
  if (b.plan === 'bench') return { plan: plans.bench, graceEndsAt: null };
  if (b.billingStatus === 'active') return { plan: plans[b.plan], graceEndsAt: null };
  if (b.billingStatus === 'past_due' && b.pastDueSince) {
    const ends = new Date(new Date(b.pastDueSince).getTime() + graceDays * 86400_000);
    return { plan: ends.getTime() > now ? plans[b.plan] : plans.bench, graceEndsAt: ends };
  }
  return { plan: plans.bench, graceEndsAt: null };
}

export async function usageOf(db: DbOrTrx, workspaceId: string) {
  const [boms, members, invites] = await Promise.all([
    scoped(db, 'boms', workspaceId).countDistinct('familyId as n').first(),
    scoped(db, 'memberships', workspaceId).count('* as n').first(),
    scoped(db, 'invites', workspaceId).whereNull('acceptedAt').andWhere('expiresAt', '>', db.fn.now()).count('* as n').first(),
  ]);
  return { boms: Number(boms?.n ?? 0), members: Number(members?.n ?? 0), pendingInvites: Number(invites?.n ?? 0) };
}

/** 402 with the plan that would allow it, when the workspace's plan does not. */
export async function assertAllowed(db: DbOrTrx, workspaceId: string, graceDays: number, feature: 'boms' | 'members' | 'rfq' | 'apiTokens') {
  const { plan } = effectivePlan(await billingOf(db, workspaceId), graceDays);
  const limit = plan.limits[feature];
  if (typeof limit === 'boolean') {
    if (!limit) throw errors.planLimit(`The ${plan.name} plan does not include ${feature === 'rfq' ? 'requests for quotation' : 'API tokens'}; the ${planAllowing(feature).name} plan does.`);
    return;
  }
  if (limit === null) return;
  const usage = await usageOf(db, workspaceId);
  const used = feature === 'boms' ? usage.boms : usage.members + usage.pendingInvites;
  if (used >= limit) {
    const what = feature === 'boms' ? `${limit} BOMs` : `${limit} members (invitations included)`;
    throw errors.planLimit(`The ${plan.name} plan allows ${what}; the ${planAllowing(feature, used).name} plan allows more.`);
  }
}
