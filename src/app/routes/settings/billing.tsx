import { can } from '../../../shared/permissions';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { LaterReleasePage } from '../later-release';

export function BillingRoute() {
  const session = useSession();
  // The link is only offered to owners; this guards an address typed by hand.
  if (!can(session.role, 'billing.manage')) {
    return (
      <>
        <PageHeader title="Plan & billing" />
        <p role="alert" className="max-w-prose rounded-lg border border-rule bg-surface px-5 py-4 text-sm text-muted">
          Only the workspace owner manages the plan and billing.
        </p>
      </>
    );
  }
  return (
    <LaterReleasePage title="Plan & billing">
      Choosing a plan and paying for this workspace arrive in a later release.
    </LaterReleasePage>
  );
}
