import { Tag } from '../../../components/ui/tag';
import type { Billing } from '../api';
import { dateInWords, daysUntil, statusLabels } from '../display';

function StatusSentence({ billing }: { billing: Billing }) {
  const subscribed = billing.plans.find((p) => p.id === billing.subscribedPlan)?.name ?? billing.subscribedPlan;
  switch (billing.status) {
    case 'active':
      if (!billing.currentPeriodEnd) return <p>The subscription is active.</p>;
      return billing.cancelAtPeriodEnd ? (
        <p>
          Cancels on <strong className="font-medium">{dateInWords(billing.currentPeriodEnd)}</strong>; the workspace then returns to the Bench
          plan. Nothing is deleted.
        </p>
      ) : (
        <p>
          Renews on <strong className="font-medium">{dateInWords(billing.currentPeriodEnd)}</strong>.
        </p>
      );
    case 'past_due': {
      if (!billing.graceEndsAt) return <p>The last payment failed. Update the card in Manage billing.</p>;
      const days = daysUntil(billing.graceEndsAt);
      return days > 0 ? (
        <p>
          The last payment failed. {subscribed} stays in force until <strong className="font-medium">{dateInWords(billing.graceEndsAt)}</strong>{' '}
          ({days === 1 ? '1 day left' : `${days} days left`}); after that the workspace falls back to the Bench plan. Update the card in
          Manage billing.
        </p>
      ) : (
        <p>
          The last payment failed and the grace period ended on <strong className="font-medium">{dateInWords(billing.graceEndsAt)}</strong>: the
          Bench plan&apos;s limits apply until the payment goes through. Nothing is deleted.
        </p>
      );
    }
    case 'canceled':
      return <p>The subscription has ended; the workspace is on the free Bench plan. Nothing was deleted.</p>;
    default:
      return <p>No subscription and nothing to pay.</p>;
  }
}

/** The plan in force, its status in words, and when it renews, ends or falls back. */
export function PlanStatus({ billing }: { billing: Billing }) {
  const tone = billing.status === 'active' ? 'ok' : billing.status === 'past_due' ? 'warning' : 'muted';
  return (
    <div className="flex flex-col gap-2 text-sm text-muted">
      <div className="flex flex-wrap items-center gap-2">
        <p className="text-2xl font-semibold tracking-tight text-ink">{billing.planName}</p>
        <Tag tone={tone}>{statusLabels[billing.status]}</Tag>
      </div>
      <StatusSentence billing={billing} />
    </div>
  );
}
