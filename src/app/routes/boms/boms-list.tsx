import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState } from '../../../components/ui/empty-state';

/** The BOMs list. The API has no BOM routes yet, so the page says so rather than show rows. */
export function BomsListRoute() {
  return (
    <>
      <PageHeader title="BOMs" />
      <EmptyState title="No BOMs in this workspace yet.">The BOM editor arrives in a later release.</EmptyState>
    </>
  );
}
