import { useMemo, useState } from 'react';
import { createColumnHelper } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table/data-table';
import { useUrlSorting } from '../../../components/ui/data-table/use-url-sorting';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { describeError } from '../../../components/ui/error-state';
import { formatDate, formatDateTime } from '../../../lib/format';
import type { ApiToken } from '../api';
import { useRevokeToken } from '../hooks';

const column = createColumnHelper<ApiToken>();

export function TokensTable({ tokens }: { tokens: ApiToken[] }) {
  const [sorting, onSortingChange] = useUrlSorting('sort');
  const [revoking, setRevoking] = useState<ApiToken | null>(null);
  const revokeToken = useRevokeToken();

  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name', cell: (info) => <span className="font-medium">{info.getValue()}</span> }),
      column.accessor('createdAt', {
        header: 'Created',
        cell: (info) => <span className="tabular-nums">{formatDate(info.getValue())}</span>,
      }),
      // Never-used tokens sort as the oldest use (ISO timestamps compare as text).
      column.accessor((token) => token.lastUsedAt ?? '', {
        id: 'lastUsedAt',
        header: 'Last used',
        cell: (info) => {
          const value = info.row.original.lastUsedAt;
          return value ? <span className="tabular-nums">{formatDateTime(value)}</span> : <span className="text-muted">Never</span>;
        },
      }),
      column.display({
        id: 'actions',
        header: 'Actions',
        meta: { hiddenHeader: true },
        cell: (info) => (
          <div className="text-right">
            <Button
              variant="danger"
              size="sm"
              aria-label={`Revoke ${info.row.original.name}`}
              onClick={() => setRevoking(info.row.original)}
            >
              Revoke
            </Button>
          </div>
        ),
      }),
    ],
    [],
  );

  return (
    <>
      <DataTable
        label="API tokens"
        columns={columns}
        data={tokens}
        getRowId={(token) => token.id}
        sorting={sorting}
        onSortingChange={onSortingChange}
        empty={
          <EmptyState title="No API tokens yet.">
            A token lets a script read and write this workspace as you, with your role.
          </EmptyState>
        }
      />
      <ConfirmDialog
        open={revoking !== null}
        title={revoking ? `Revoke token “${revoking.name}”?` : ''}
        confirmLabel="Revoke token"
        pending={revokeToken.isPending}
        error={revokeToken.isError ? describeError(revokeToken.error) : null}
        onCancel={() => {
          setRevoking(null);
          revokeToken.reset();
        }}
        onConfirm={() => {
          if (revoking) revokeToken.mutate(revoking.id, { onSuccess: () => setRevoking(null) });
        }}
      >
        Scripts using it stop working at once. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
