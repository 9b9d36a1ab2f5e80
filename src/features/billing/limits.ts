import type { Billing } from './api';

export type LimitedFeature = 'boms' | 'members' | 'rfq' | 'apiTokens';

/** Where a workspace stands against one limit of its plan, in words ready for a banner. */
export type LimitState = {
  feature: LimitedFeature;
  planName: string;
  /** True when the next BOM, invitation, RFQ or token would be refused (402). */
  reached: boolean;
  /** For counted limits: what is used and what the plan allows; null for a feature the plan has or lacks. */
  used: number | null;
  limit: number | null;
  /** The cheapest plan that allows more, or null when none does. */
  upgradeTo: { id: string; name: string } | null;
  /** The banner's sentence, e.g. "Bench plan: 3 of 3 BOMs used — upgrade to Workshop for more." */
  sentence: string;
  /** Why the action is refused, beside a disabled button; null while it is allowed. */
  reason: string | null;
};

const counted = {
  boms: { one: 'BOM', many: 'BOMs', extra: '' },
  members: { one: 'member', many: 'members', extra: ' (invitations included)' },
} as const;

const included = {
  rfq: { what: 'requests for quotation', verb: 'send RFQs' },
  apiTokens: { what: 'API tokens', verb: 'create API tokens' },
} as const;

/** The count the server checks a limit against: members count with their pending invitations. */
function usedOf(billing: Billing, feature: 'boms' | 'members'): number {
  return feature === 'boms' ? billing.usage.boms : billing.usage.members + billing.usage.pendingInvites;
}

function firstPlanAllowing(billing: Billing, feature: LimitedFeature, used: number): { id: string; name: string } | null {
  // The plans come cheapest first, as the server lists them.
  for (const plan of billing.plans) {
    const limit = plan.limits[feature];
    const allows = typeof limit === 'boolean' ? limit : limit === null || used < limit;
    if (allows && plan.id !== billing.plan) return { id: plan.id, name: plan.name };
  }
  return null;
}

/**
 * The state of one limit, or null when the plan puts no limit on it (nothing to show).
 * Counted limits are shown before they are reached, so nobody meets the 402 unwarned.
 */
export function limitState(billing: Billing, feature: LimitedFeature): LimitState | null {
  const planName = billing.planName;
  if (feature === 'rfq' || feature === 'apiTokens') {
    if (billing.limits[feature]) return null;
    const upgradeTo = firstPlanAllowing(billing, feature, 0);
    const words = included[feature];
    return {
      feature,
      planName,
      reached: true,
      used: null,
      limit: null,
      upgradeTo,
      sentence: `The ${planName} plan does not include ${words.what}${upgradeTo ? ` — upgrade to ${upgradeTo.name} to ${words.verb}` : ''}.`,
      reason: upgradeTo
        ? `The ${planName} plan does not include ${words.what}; upgrade to ${upgradeTo.name} to ${words.verb}.`
        : `The ${planName} plan does not include ${words.what}.`,
    };
  }
  const limit = billing.limits[feature];
  if (limit === null) return null;
  const used = usedOf(billing, feature);
  const reached = used >= limit;
  const upgradeTo = reached ? firstPlanAllowing(billing, feature, used) : firstPlanAllowing(billing, feature, limit);
  const words = counted[feature];
  return {
    feature,
    planName,
    reached,
    used,
    limit,
    upgradeTo,
    sentence: `${planName} plan: ${used} of ${limit} ${limit === 1 ? words.one : words.many} used${words.extra}${upgradeTo ? ` — upgrade to ${upgradeTo.name} for more` : ''}.`,
    reason: reached
      ? `The ${planName} plan allows ${limit} ${limit === 1 ? words.one : words.many}${words.extra}${upgradeTo ? `; ${upgradeTo.name} allows more` : ''}.`
      : null,
  };
}
