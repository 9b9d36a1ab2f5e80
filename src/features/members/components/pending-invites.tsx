import { useMemo } from 'react';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { describeError } from '../../../components/ui/error-state';
import { formatDate } from '../../../lib/format';
import { roleLabels } from '../../../lib/roles';
import type { Invite } from '../api';
import { useRevokeInvite } from '../hooks';

const column = createColumnHelper<Invite>();

function RevokeInviteButton({ invite }: { invite: Invite }) {
  const revoke = useRevokeInvite();
  return (
    <div className="flex items-center justify-end gap-2">
      {revoke.isError ? (
        <span role="alert" className="text-xs text-brick">
          {describeError(revoke.error)}
        </span>
      ) : null}
      <Button
        variant="danger"
        size="sm"
        aria-label={`Revoke invite for ${invite.email}`}
        pending={revoke.isPending}
        onClick={() => revoke.mutate(invite.id)}
      >
        Revoke
      </Button>
    </div>
  );
}

/** Invitations sent and not yet accepted; revoking one makes its link useless. */
export function PendingInvites({ invites }: { invites: Invite[] }) {
  const [sorting, onSortingChange] = useUrlSorting('invitesSort');
  const columns = useMemo(
    () => [
      column.accessor('email', { header: 'Email' }),
      column.accessor('role', { header: 'Role', cell: (info) => roleLabels[info.getValue()] }),
      column.accessor('createdAt', {
        header: 'Sent',
        cell: (info) => <span className="tabular-nums">{formatDate(info.getValue())}</span>,
      }),
      column.accessor('expiresAt', {
        header: 'Expires',
        cell: (info) => <span className="tabular-nums">{formatDate(info.getValue())}</span>,
      }),
      column.display({
        id: 'actions',
        header: 'Actions',
        meta: { hiddenHeader: true },
        cell: (info) => <RevokeInviteButton invite={info.row.original} />,
      }),
    ],
    [],
  );

  return (
    <DataTable
      label="Pending invites"
      columns={columns}
      data={invites}
      getRowId={(invite) => invite.id}
      sorting={sorting}
      onSortingChange={onSortingChange}
      empty={<EmptyState title="No pending invites." />}
    />
  );
}
