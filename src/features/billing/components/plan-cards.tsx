import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { Tag } from '../../../components/ui/tag';
import { describeError } from '../../../components/ui/error-state';
import type { PlanId } from '../../../shared/plans';
import type { Billing } from '../api';
import { limitLines, planPrice } from '../display';
import { useStartCheckout } from '../hooks';

/**
 * Farthing's three plans side by side. An owner without a running subscription upgrades
 * through the payment service's hosted checkout; with one, plan changes go through the
 * billing portal (the server refuses a second checkout).
 */
export function PlanCards({ billing, canManage, onCheckout }: { billing: Billing; canManage: boolean; onCheckout: (url: string) => void }) {
  const checkout = useStartCheckout();
  const rank = (id: PlanId) => billing.plans.findIndex((p) => p.id === id);
  const subscribed = billing.subscribedPlan !== 'bench' && (billing.status === 'active' || billing.status === 'past_due');

  return (
    <div className="flex flex-col gap-3">
      {checkout.isError ? <FormAlert>{describeError(checkout.error)}</FormAlert> : null}
      <ul aria-label="Plans" className="grid gap-4 md:grid-cols-3">
        {billing.plans.map((plan) => {
          const current = plan.id === billing.plan;
          const higher = rank(plan.id) > rank(billing.plan);
          return (
            <li
              key={plan.id}
              aria-label={`${plan.name} plan`}
              className={`flex flex-col gap-3 rounded-lg border bg-surface p-5 ${current ? 'border-copper shadow-[0_0_0_1px_#B5652B]' : 'border-rule'}`}
            >
              <div className="flex items-start justify-between gap-2">
                <div>
                  <h3 className="text-lg font-semibold">{plan.name}</h3>
                  <p className="text-sm text-muted tabular-nums">{planPrice(plan.monthlyCents)}</p>
                </div>
                {current ? <Tag tone="copper">Current plan</Tag> : null}
              </div>
              <ul className="flex flex-1 flex-col gap-1 text-sm">
                {limitLines(plan.limits).map((line) => (
                  <li key={line} className="flex gap-2">
                    <span aria-hidden="true" className="text-copper">
                      ·
                    </span>
                    {line}
                  </li>
                ))}
              </ul>
              {canManage && higher ? (
                subscribed ? (
                  <p className="text-xs text-muted">Change to {plan.name} in Manage billing.</p>
                ) : (
                  <Button
                    pending={checkout.isPending && checkout.variables === plan.id}
                    disabled={checkout.isPending}
                    onClick={() => checkout.mutate(plan.id, { onSuccess: ({ url }) => onCheckout(url) })}
                  >
                    Upgrade to {plan.name}
                  </Button>
                )
              ) : null}
            </li>
          );
        })}
      </ul>
    </div>
  );
}
