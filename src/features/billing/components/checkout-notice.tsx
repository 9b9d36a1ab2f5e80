import { FormAlert } from '../../../components/ui/form-alert';
import { Spinner } from '../../../components/ui/spinner';
import type { CheckoutPhase } from '../checkout';

/** What the owner sees on coming back from the hosted checkout page. */
export function CheckoutNotice({
  outcome,
  phase,
  planName,
}: {
  outcome: 'success' | 'cancelled';
  phase: CheckoutPhase | null;
  planName: string;
}) {
  if (outcome === 'cancelled') {
    return (
      <FormAlert tone="info">
        Checkout was cancelled and nothing was charged. The workspace stays on the {planName} plan.
      </FormAlert>
    );
  }
  if (phase === 'confirmed') {
    return (
      <FormAlert tone="success">
        <span className="font-medium">You&apos;re on {planName}.</span> Thank you: the payment is confirmed and the new limits apply now.
      </FormAlert>
    );
  }
  return (
    <div role="status" className="flex flex-col gap-1 rounded-md border border-slate-info/30 bg-slate-info/5 px-3 py-2 text-sm text-slate-info">
      <p className="flex items-center gap-2 font-medium">
        <Spinner />
        Confirming your payment…
      </p>
      {phase === 'slow' ? (
        <p>
          The payment service has not confirmed the payment yet. This page keeps checking; if you were charged and nothing changes
          within a few minutes, open Manage billing.
        </p>
      ) : null}
    </div>
  );
}
