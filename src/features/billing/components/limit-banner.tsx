import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import type { Role } from '../../../shared/schemas/common';
import { billingQueryOptions } from '../api';
import { limitState, type LimitedFeature } from '../limits';

/**
 * One line above a list saying how much of the plan's limit is used ("Bench plan: 3 of 3
 * BOMs used — upgrade to Workshop for more"), so the limit is seen before it is hit. An
 * owner gets the way to Plan & billing; anyone else is told who can change the plan.
 * Shows nothing on a plan without that limit, or while the plan is still loading.
 */
export function LimitBanner({ feature, role }: { feature: LimitedFeature; role: Role }) {
  const billing = useQuery(billingQueryOptions());
  if (!billing.data) return null;
  const state = limitState(billing.data, feature);
  if (!state) return null;
  const owner = can(role, 'billing.manage');

  return (
    <section
      aria-label="Plan limit"
      className={[
        'mb-4 flex flex-wrap items-center gap-x-3 gap-y-1 rounded-md border px-4 py-2.5 text-sm',
        state.reached ? 'border-copper/50 bg-copper/5 text-ink' : 'border-slate-info/25 bg-slate-info/5 text-ink',
      ].join(' ')}
    >
      <svg aria-hidden="true" viewBox="0 0 16 16" className={`size-4 shrink-0 ${state.reached ? 'text-copper' : 'text-slate-info'}`}>
        <circle cx="8" cy="8" r="6.5" fill="none" stroke="currentColor" strokeWidth="1.5" />
        <path d="M8 4.5v4.5M8 11v.5" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
      </svg>
      <span className="min-w-0 flex-1">{state.sentence}</span>
      {state.upgradeTo ? (
        owner ? (
          <Link to="/settings/billing" className="font-medium text-copper-dark underline underline-offset-2 hover:text-copper">
            Plan &amp; billing
          </Link>
        ) : (
          <span className="text-muted">The workspace owner can change the plan.</span>
        )
      ) : null}
    </section>
  );
}
