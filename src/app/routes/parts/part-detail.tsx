import { Suspense, useCallback, useState } from 'react';
import { BackToList, DetailSection } from '../../../components/ui/detail-section';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button, buttonClasses } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Dialog } from '../../../components/ui/dialog';
import { describeError } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { partBomsQueryOptions, partFilesQueryOptions, partLabel, partQueryOptions } from '../../../features/parts/api';
import { Datasheets } from '../../../features/parts/components/datasheets';
import { PartForm } from '../../../features/parts/components/part-form';
import { PartFields, PartRatings } from '../../../features/parts/components/part-summary';
import { useDeletePart } from '../../../features/parts/hooks';
import { categoryLabels } from '../../../features/parts/part-form';
import { quotesQueryOptions, type Quote } from '../../../features/quotes/api';
import { QuoteEditor } from '../../../features/quotes/components/quote-editor';
import { QuotesTable } from '../../../features/quotes/components/quotes-table';
import { suppliersQueryOptions } from '../../../features/suppliers/api';

export const partDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.id ?? '';
    await Promise.all([
      queryClient.ensureQueryData(partQueryOptions(id)),
      queryClient.ensureQueryData(partFilesQueryOptions(id)),
      queryClient.ensureQueryData(quotesQueryOptions({ partId: id })),
      queryClient.ensureQueryData(suppliersQueryOptions()),
    ]);
    return null;
  };

export function PartDetailRoute() {
  const { id = '' } = useParams();
  const session = useSession();
  const navigate = useNavigate();
  const { data: part } = useSuspenseQuery(partQueryOptions(id));
  const { data: quotes } = useSuspenseQuery(quotesQueryOptions({ partId: id }));
  const { data: suppliers } = useSuspenseQuery(suppliersQueryOptions());
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [quoteEditing, setQuoteEditing] = useState<Quote | 'new' | null>(null);
  const deletePart = useDeletePart();
  const canWriteParts = can(session.role, 'parts.write');
  const canWriteQuotes = can(session.role, 'quotes.write');
  const onEditQuote = useCallback((quote: Quote) => setQuoteEditing(quote), []);

  return (
    <>
      <PageHeader
        title={part.internalPn}
        description={[part.mpn, part.manufacturer, categoryLabels[part.category]].filter(Boolean).join(' · ')}
        actions={
          <>
            <Link to={`/quote-board?part=${encodeURIComponent(part.id)}`} className={buttonClasses('secondary')}>
              Open quote board
            </Link>
            {canWriteParts ? (
              <>
                <Button variant="secondary" onClick={() => setEditing(true)}>
                  Edit part
                </Button>
                <Button variant="danger" onClick={() => setDeleting(true)}>
                  Delete part
                </Button>
              </>
            ) : null}
          </>
        }
      />
      <BackToList to="/parts">All parts</BackToList>

      <div className="flex flex-col gap-10">
        <DetailSection id="part-details" title="Details">
          <PartFields part={part} />
        </DetailSection>

        <DetailSection id="part-ratings" title="Ratings">
          <PartRatings part={part} />
        </DetailSection>

        <DetailSection id="part-datasheets" title="Datasheets">
          <Suspense fallback={<LoadingState label="Loading datasheets…" />}>
            <Datasheets partId={part.id} canWrite={canWriteParts} />
          </Suspense>
        </DetailSection>

        <DetailSection
          id="part-quotes"
          title="Quotes"
          action={
            canWriteQuotes ? (
              <Button onClick={() => setQuoteEditing('new')} disabled={suppliers.length === 0} title={suppliers.length === 0 ? 'Add a supplier first' : undefined}>
                Add quote
              </Button>
            ) : null
          }
        >
          {canWriteQuotes && suppliers.length === 0 ? (
            <p className="text-sm text-muted">
              A quote comes from a supplier: <Link to="/suppliers" className="text-copper-dark underline">add a supplier</Link> first.
            </p>
          ) : null}
          <QuotesTable quotes={quotes} show="supplier" canWrite={canWriteQuotes} onEdit={onEditQuote} empty="No quotes for this part yet." />
        </DetailSection>

        <DetailSection id="part-boms" title="BOMs that use this part">
          <Suspense fallback={<LoadingState label="Loading the BOMs" />}>
            <PartBoms partId={part.id} />
          </Suspense>
        </DetailSection>
      </div>

      <Dialog open={editing} title={`Edit ${part.internalPn}`} size="lg" onClose={() => setEditing(false)}>
        <PartForm part={part} onDone={() => setEditing(false)} onCancel={() => setEditing(false)} />
      </Dialog>

      <Dialog
        open={quoteEditing !== null}
        title={quoteEditing === 'new' ? `Add quote for ${part.internalPn}` : `Edit quote for ${part.internalPn}`}
        size="lg"
        onClose={() => setQuoteEditing(null)}
      >
        {quoteEditing !== null ? (
          <QuoteEditor
            quote={quoteEditing === 'new' ? undefined : quoteEditing}
            partId={part.id}
            partLabel={partLabel(part)}
            suppliers={suppliers}
            onDone={() => setQuoteEditing(null)}
            onCancel={() => setQuoteEditing(null)}
          />
        ) : null}
      </Dialog>

      <ConfirmDialog
        open={deleting}
        title={`Delete ${part.internalPn}?`}
        confirmLabel="Delete part and its quotes"
        pending={deletePart.isPending}
        error={deletePart.isError ? describeError(deletePart.error) : null}
        onCancel={() => {
          setDeleting(false);
          deletePart.reset();
        }}
        onConfirm={() => deletePart.mutate(part.id, { onSuccess: () => navigate('/parts', { replace: true }) })}
      >
        Its quotes and datasheets are deleted with it.
      </ConfirmDialog>
    </>
  );
}

function PartBoms({ partId }: { partId: string }) {
  const { data } = useSuspenseQuery(partBomsQueryOptions(partId));
  if (!data.length) return <p className="text-sm text-muted">No BOM uses this part yet.</p>;
  return (
    <ul aria-label="BOMs that use this part" className="divide-y divide-rule rounded-lg border border-rule bg-surface text-sm">
      {data.map((b) => (
        <li key={b.id} className="flex items-center justify-between gap-3 px-3 py-2">
          <Link to={`/boms/${b.id}/lines`} className="font-medium text-copper-dark underline-offset-2 hover:underline">
            {b.name} · rev {b.revision}
          </Link>
          <span className="text-muted">
            {b.refDes ? `${b.refDes} · ` : ''}
            <span className="tabular-nums">{b.qtyPerUnit}</span> per unit · {b.state.replace('_', ' ')}
          </span>
        </li>
      ))}
    </ul>
  );
}
