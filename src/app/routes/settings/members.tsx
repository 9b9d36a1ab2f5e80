import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryOptions } from '../../../features/auth/api';
import { useSession } from '../../../features/auth/session-context';
import { invitesQueryOptions, membersQueryOptions } from '../../../features/members/api';
import { InviteForm } from '../../../features/members/components/invite-form';
import { MembersTable } from '../../../features/members/components/members-table';
import { PendingInvites } from '../../../features/members/components/pending-invites';
import { billingQueryOptions } from '../../../features/billing/api';
import { limitState } from '../../../features/billing/limits';
import { LimitBanner } from '../../../features/billing/components/limit-banner';

export const membersLoader = (queryClient: QueryClient) => async () => {
  const session = await queryClient.ensureQueryData(meQueryOptions());
  if (!session) return null; // the app shell's loader sends this visitor to sign in
  await Promise.all([
    queryClient.ensureQueryData(membersQueryOptions()),
    can(session.role, 'members.manage') ? queryClient.ensureQueryData(invitesQueryOptions()) : null,
  ]);
  return null;
};

function OwnerInvites() {
  const { data: invites } = useSuspenseQuery(invitesQueryOptions());
  const billing = useQuery(billingQueryOptions());
  const limit = billing.data ? limitState(billing.data, 'members') : null;
  return (
    <section aria-labelledby="invites-title" className="mt-10 flex flex-col gap-4">
      <div>
        <h2 id="invites-title" className="text-lg font-semibold">
          Invite people
        </h2>
        <p className="mt-1 text-sm text-muted">
          The invitation goes by e-mail with a link that signs them into this workspace with the role you choose.
        </p>
      </div>
      <InviteForm blockedReason={limit?.reason ?? null} />
      <h3 className="mt-4 text-base font-semibold">Pending invites</h3>
      <PendingInvites invites={invites} />
    </section>
  );
}

export function MembersRoute() {
  const session = useSession();
  const { data: members } = useSuspenseQuery(membersQueryOptions());
  const canManage = can(session.role, 'members.manage');

  return (
    <>
      <PageHeader
        title="Members"
        description={`Everyone in ${session.workspace.name} and the role each holds here.`}
      />
      <LimitBanner feature="members" role={session.role} />
      <MembersTable
        members={members}
        currentUserId={session.user.id}
        workspaceName={session.workspace.name}
        canManage={canManage}
      />
      {canManage ? <OwnerInvites /> : null}
    </>
  );
}
