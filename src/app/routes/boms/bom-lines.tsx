import { useMemo, useState } from 'react';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { can } from '../../../shared/permissions';
import { FormAlert } from '../../../components/ui/form-alert';
import { useSession } from '../../../features/auth/session-context';
import { bomQueryOptions, linesQueryOptions } from '../../../features/boms/api';
import { ImportDialog } from '../../../features/boms/components/import-dialog';
import { LinesGrid } from '../../../features/boms/components/lines-grid/lines-grid';
import { bomIdFrom, useBomId } from './bom-params';

export const bomLinesLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(linesQueryOptions(bomIdFrom(params)));
    return null;
  };

/** The Lines tab: the editable grid and the import. */
export function BomLinesRoute() {
  const id = useBomId();
  const session = useSession();
  const { data: bom } = useSuspenseQuery(bomQueryOptions(id));
  const { data: lines } = useSuspenseQuery(linesQueryOptions(id));
  const [importing, setImporting] = useState(false);
  const [imported, setImported] = useState<number | null>(null);
  const editable = bom.state !== 'released';
  const rights = useMemo(
    () => ({ design: editable && can(session.role, 'boms.write'), pin: editable && can(session.role, 'lines.pin') }),
    [editable, session.role],
  );

  return (
    <div className="flex flex-col gap-3">
      {imported !== null ? <FormAlert tone="success">Imported {imported} line{imported === 1 ? '' : 's'}.</FormAlert> : null}
      <LinesGrid key={bom.id} bom={bom} lines={lines} rights={rights} onImport={rights.design ? () => setImporting(true) : undefined} />
      <ImportDialog bomId={bom.id} open={importing} onClose={() => setImporting(false)} onImported={setImported} />
    </div>
  );
}
