import { describe, expect, it } from 'vitest';
import { plans, planIds } from '../../shared/plans';
import type { Billing } from './api';
import { limitState } from './limits';

function billingOn(plan: 'bench' | 'workshop' | 'factory', usage: Partial<Billing['usage']> = {}): Billing {
  return {
    plan,
    planName: plans[plan].name,
    subscribedPlan: plan,
    status: plan === 'bench' ? 'none' : 'active',
    currentPeriodEnd: null,
    cancelAtPeriodEnd: false,
    graceEndsAt: null,
    limits: plans[plan].limits,
    usage: { boms: 0, members: 1, pendingInvites: 0, ...usage },
    plans: planIds.map((id) => ({ id, name: plans[id].name, monthlyCents: plans[id].monthlyCents, limits: plans[id].limits })),
  };
}

describe('plan limits in words', () => {
  it('shows a counted limit before it is reached, and refuses at it', () => {
    const two = limitState(billingOn('bench', { boms: 2 }), 'boms');
    expect(two).toMatchObject({ reached: false, used: 2, limit: 3, reason: null });
    expect(two?.sentence).toBe('Bench plan: 2 of 3 BOMs used — upgrade to Workshop for more.');
    const three = limitState(billingOn('bench', { boms: 3 }), 'boms');
    expect(three).toMatchObject({ reached: true, upgradeTo: { id: 'workshop' } });
    expect(three?.sentence).toBe('Bench plan: 3 of 3 BOMs used — upgrade to Workshop for more.');
    expect(three?.reason).toBe('The Bench plan allows 3 BOMs; Workshop allows more.');
  });

  it('counts pending invitations against the members limit, as the server does', () => {
    const state = limitState(billingOn('bench', { members: 1, pendingInvites: 1 }), 'members');
    expect(state).toMatchObject({ reached: true, used: 2, limit: 2 });
    expect(state?.sentence).toContain('2 of 2 members used (invitations included)');
  });

  it('names the cheapest plan with a feature the plan lacks', () => {
    expect(limitState(billingOn('bench'), 'rfq')?.reason).toBe(
      'The Bench plan does not include requests for quotation; upgrade to Workshop to send RFQs.',
    );
    expect(limitState(billingOn('workshop'), 'apiTokens')?.upgradeTo?.name).toBe('Factory');
    expect(limitState(billingOn('workshop'), 'rfq')).toBeNull();
  });

  it('has nothing to say on a plan without the limit', () => {
    expect(limitState(billingOn('workshop', { boms: 40 }), 'boms')).toBeNull();
    expect(limitState(billingOn('factory', { members: 60 }), 'members')).toBeNull();
  });
});
