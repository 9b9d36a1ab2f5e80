import { useMemo, useState } from 'react';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { describeError } from '../../../components/ui/error-state';
import { formatDate } from '../../../lib/format';
import { roleLabels } from '../../../lib/roles';
import type { Member } from '../api';
import { useRemoveMember } from '../hooks';
import { MemberRoleCell } from './member-role-cell';

const column = createColumnHelper<Member>();

/**
 * The workspace's members. An owner may change roles and remove people, except on
 * their own row: the server guards the last owner, and the screen does not tempt it.
 */
export function MembersTable({
  members,
  currentUserId,
  workspaceName,
  canManage,
}: {
  members: Member[];
  currentUserId: string;
  workspaceName: string;
  canManage: boolean;
}) {
  const [sorting, onSortingChange] = useUrlSorting('sort');
  const [removing, setRemoving] = useState<Member | null>(null);
  const removeMember = useRemoveMember();

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <span className="font-medium">
            {info.getValue()}
            {info.row.original.userId === currentUserId ? <span className="ml-2 text-xs font-normal text-muted">(you)</span> : null}
          </span>
        ),
      }),
      column.accessor('email', { header: 'Email', cell: (info) => <span className="text-muted">{info.getValue()}</span> }),
      column.accessor('role', {
        header: 'Role',
        cell: (info) =>
          canManage && info.row.original.userId !== currentUserId ? (
            <MemberRoleCell member={info.row.original} />
          ) : (
            roleLabels[info.getValue()]
          ),
      }),
      column.accessor('joinedAt', {
        header: 'Joined',
        cell: (info) => <span className="tabular-nums">{formatDate(info.getValue())}</span>,
      }),
      ...(canManage
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              meta: { hiddenHeader: true },
              cell: (info) =>
                info.row.original.userId === currentUserId ? null : (
                  <div className="text-right">
                    <Button
                      variant="danger"
                      size="sm"
                      aria-label={`Remove ${info.row.original.name}`}
                      onClick={() => setRemoving(info.row.original)}
                    >
                      Remove
                    </Button>
                  </div>
                ),
            }),
          ]
        : []),
    ],
    [canManage, currentUserId],
  );

  return (
    <>
      <DataTable
        label="Members"
        columns={columns}
        data={members}
        getRowId={(member) => member.userId}
        sorting={sorting}
        onSortingChange={onSortingChange}
        empty={<EmptyState title="No members yet." />}
      />
      <ConfirmDialog
        open={removing !== null}
        title={removing ? `Remove ${removing.name} from ${workspaceName}?` : ''}
        confirmLabel="Remove member"
        pending={removeMember.isPending}
        error={removeMember.isError ? describeError(removeMember.error) : null}
        onCancel={() => {
          setRemoving(null);
          removeMember.reset();
        }}
        onConfirm={() => {
          if (removing) removeMember.mutate(removing.userId, { onSuccess: () => setRemoving(null) });
        }}
      >
        They lose access to this workspace at once. You can invite them again later.
      </ConfirmDialog>
    </>
  );
}
