import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { bomsQueryOptions } from '../../../features/boms/api';
import { BomForm } from '../../../features/boms/components/bom-form';
import { BomsTable } from '../../../features/boms/components/boms-table';
import { LimitBanner } from '../../../features/billing/components/limit-banner';

export const bomsListLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(bomsQueryOptions());
  return null;
};

/** Every BOM revision of the workspace with its landed cost per unit at the planned quantity against its target. */
export function BomsListRoute() {
  const session = useSession();
  const navigate = useNavigate();
  const { data: boms } = useSuspenseQuery(bomsQueryOptions());
  const [creating, setCreating] = useState(false);
  const mayCreate = can(session.role, 'boms.write');

  const newButton = mayCreate ? <Button onClick={() => setCreating(true)}>New BOM</Button> : null;

  return (
    <>
      <PageHeader
        title="BOMs"
        description="Each revision with its state and its landed cost per unit at the planned quantity, against its target."
        actions={newButton}
      />
      <LimitBanner feature="boms" role={session.role} />
      <BomsTable
        boms={boms}
        empty={
          <EmptyState title="No BOMs in this workspace yet.">
            {mayCreate
              ? 'Start one from the schematic: name it, choose the reporting currency and the landed-cost profile, then add lines or import them. Use New BOM above.'
              : 'A designer or the owner starts a BOM; it appears here for everyone in the workspace.'}
          </EmptyState>
        }
      />
      <Dialog open={creating} title="New BOM" onClose={() => setCreating(false)} description="Revision 1 starts as a draft.">
        <BomForm onCancel={() => setCreating(false)} onDone={(bom) => navigate(`/boms/${bom.id}/lines`)} />
      </Dialog>
    </>
  );
}
