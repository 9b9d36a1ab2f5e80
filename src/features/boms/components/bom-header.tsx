import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import type { Role } from '../../../shared/schemas/common';
import type { BomState } from '../../../shared/schemas/boms';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { describeError } from '../../../components/ui/error-state';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Dialog } from '../../../components/ui/dialog';
import { FormAlert } from '../../../components/ui/form-alert';
import { PageHeader } from '../../../components/ui/page-header';
import type { BomDetail } from '../api';
import { formatCount, formatPerUnit } from '../display';
import { useChangeBomState, useDeleteBom, useNewRevision } from '../hooks';
import { BomForm } from './bom-form';
import { DownloadWorkbookButton } from './download-workbook-button';
import { StateBadge } from './state-badge';

/**
 * The BOM page's heading: name, revision and state, and what the role may do next —
 * send to review, back to draft, release (owners), a new revision, the details.
 */
export function BomHeader({ bom, role }: { bom: BomDetail; role: Role }) {
  const navigate = useNavigate();
  const changeState = useChangeBomState(bom.id);
  const newRevision = useNewRevision(bom.id);
  const deleteBom = useDeleteBom();
  const [confirmRelease, setConfirmRelease] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const mayWrite = can(role, 'boms.write');
  const mayRelease = can(role, 'boms.release');

  const move = (state: BomState) => {
    setError(null);
    changeState.mutate(
      { state, version: bom.version },
      {
        onSuccess: () => setConfirmRelease(false),
        onError: (e) => {
          setConfirmRelease(false);
          setError(isStaleVersion(e) ? STALE_VERSION_MESSAGE : describeError(e));
        },
      },
    );
  };

  const makeRevision = () => {
    setError(null);
    newRevision.mutate(undefined, {
      onSuccess: (next) => navigate(`/boms/${next.id}/lines`),
      onError: (e) => setError(describeError(e)),
    });
  };

  const actions = (
    <>
      {can(role, 'export') ? <DownloadWorkbookButton bomId={bom.id} revision={bom.revision} /> : null}
      {mayWrite && bom.state === 'draft' ? (
        <Button variant="secondary" pending={changeState.isPending} onClick={() => move('in_review')}>
          Send to review
        </Button>
      ) : null}
      {mayWrite && bom.state === 'in_review' ? (
        <Button variant="secondary" pending={changeState.isPending && !confirmRelease} onClick={() => move('draft')}>
          Back to draft
        </Button>
      ) : null}
      {mayRelease && bom.state === 'in_review' ? <Button onClick={() => setConfirmRelease(true)}>Release</Button> : null}
      {mayWrite ? (
        <Button variant={bom.state === 'released' ? 'primary' : 'secondary'} pending={newRevision.isPending} onClick={makeRevision}>
          New revision
        </Button>
      ) : null}
      {mayWrite && bom.state !== 'released' ? (
        <Button variant="quiet" onClick={() => setEditing(true)}>
          Details
        </Button>
      ) : null}
    </>
  );

  return (
    <>
      <PageHeader
        title={bom.name}
        description={
          <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <span>Revision {bom.revision}</span>
            <StateBadge state={bom.state} />
            <span>{bom.reportingCurrency}</span>
            <span>Planned {formatCount(bom.plannedQty)} units</span>
            <span>Target {bom.targetUnitCost ? `${formatPerUnit(bom.targetUnitCost)} per unit` : 'not set'}</span>
          </span>
        }
        actions={actions}
      />
      {error ? (
        <div className="mb-4">
          <FormAlert>{error}</FormAlert>
        </div>
      ) : null}
      {bom.state === 'released' ? (
        <div className="mb-4">
          <FormAlert tone="info">
            Revision {bom.revision} is released and read-only{bom.releasedAt ? ` (released ${bom.releasedAt.slice(0, 10)})` : ''}.
            {mayWrite ? ' Make a new revision to change it.' : ''}
          </FormAlert>
        </div>
      ) : null}
      <ConfirmDialog
        open={confirmRelease}
        title={`Release revision ${bom.revision}?`}
        confirmLabel="Release"
        pending={changeState.isPending}
        onCancel={() => setConfirmRelease(false)}
        onConfirm={() => move('released')}
      >
        A released revision is final: its lines and costs can no longer change. Later changes go into a new revision.
      </ConfirmDialog>
      <Dialog open={editing} title="BOM details" onClose={() => setEditing(false)}>
        <BomForm bom={bom} onCancel={() => setEditing(false)} onDone={() => setEditing(false)} />
        <div className="mt-2 flex items-center justify-between gap-3 border-t border-rule pt-4">
          <p className="text-sm text-muted">Deleting removes this revision and its lines.</p>
          <Button variant="danger" size="sm" onClick={() => setConfirmDelete(true)}>
            Delete revision
          </Button>
        </div>
      </Dialog>
      <ConfirmDialog
        open={confirmDelete}
        title={`Delete revision ${bom.revision} of ${bom.name}?`}
        confirmLabel="Delete revision"
        pending={deleteBom.isPending}
        error={deleteBom.error ? describeError(deleteBom.error) : null}
        onCancel={() => setConfirmDelete(false)}
        onConfirm={() =>
          deleteBom.mutate(bom.id, {
            onSuccess: () => {
              const other = bom.revisions.filter((r) => r.id !== bom.id).at(-1);
              navigate(other ? `/boms/${other.id}/lines` : '/boms', { replace: true });
            },
          })
        }
      >
        Its lines and saved snapshots go with it. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
