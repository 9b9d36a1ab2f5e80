import { useCallback, useMemo, useState, type ReactNode } from 'react';
import { BackToList, DetailSection } from '../../../components/ui/detail-section';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Dialog } from '../../../components/ui/dialog';
import { describeError } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { Tag } from '../../../components/ui/tag';
import { incotermNames } from '../../../lib/trade-labels';
import { useSession } from '../../../features/auth/session-context';
import { QuoteImport } from '../../../features/imports/components/quote-import';
import { partLabel, partsQueryOptions } from '../../../features/parts/api';
import { quotesQueryOptions, type Quote } from '../../../features/quotes/api';
import { QuoteEditor } from '../../../features/quotes/components/quote-editor';
import { QuotesTable } from '../../../features/quotes/components/quotes-table';
import { supplierQueryOptions, suppliersQueryOptions } from '../../../features/suppliers/api';
import { SupplierForm } from '../../../features/suppliers/components/supplier-form';
import { useDeleteSupplier } from '../../../features/suppliers/hooks';

export const supplierDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = params.id ?? '';
    await Promise.all([
      queryClient.ensureQueryData(supplierQueryOptions(id)),
      queryClient.ensureQueryData(quotesQueryOptions({ supplierId: id })),
      queryClient.ensureQueryData(suppliersQueryOptions()),
    ]);
    return null;
  };

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-xs font-semibold tracking-wide text-muted uppercase">{term}</dt>
      <dd className="text-sm">{children}</dd>
    </div>
  );
}

export function SupplierDetailRoute() {
  const { id = '' } = useParams();
  const session = useSession();
  const navigate = useNavigate();
  const { data: supplier } = useSuspenseQuery(supplierQueryOptions(id));
  const { data: quotes } = useSuspenseQuery(quotesQueryOptions({ supplierId: id }));
  const { data: suppliers } = useSuspenseQuery(suppliersQueryOptions());
  // Quotes name their part by id only: the library (shared with the Parts page's cache)
  // names them, and feeds the part picker. The page shows at once; names follow.
  const parts = useQuery(partsQueryOptions({}));
  const [editing, setEditing] = useState(false);
  const [importing, setImporting] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [quoteEditing, setQuoteEditing] = useState<Quote | 'new' | null>(null);
  const deleteSupplier = useDeleteSupplier();
  const canWriteSuppliers = can(session.role, 'suppliers.write');
  const canWriteQuotes = can(session.role, 'quotes.write');

  const partNames = useMemo(() => new Map((parts.data ?? []).map((p) => [p.id, partLabel(p)])), [parts.data]);
  const partName = useCallback((partId: string) => partNames.get(partId) ?? `Part #${partId}`, [partNames]);
  const partChoices = useMemo(() => (parts.data ?? []).map((p) => ({ id: p.id, label: partLabel(p) })), [parts.data]);
  const onEditQuote = useCallback((quote: Quote) => setQuoteEditing(quote), []);

  return (
    <>
      <PageHeader
        title={supplier.name}
        description={
          <span className="inline-flex flex-wrap items-center gap-2">
            {supplier.active ? <Tag tone="ok">Active</Tag> : <Tag tone="muted">Inactive</Tag>}
            <span>
              {supplier.country} · quotes in {supplier.currency} · usually {supplier.defaultIncoterm}
            </span>
          </span>
        }
        actions={
          <>
            {canWriteQuotes ? (
              <Button variant="secondary" onClick={() => setImporting(true)}>
                Import quotes
              </Button>
            ) : null}
            {canWriteSuppliers ? (
              <>
                <Button variant="secondary" onClick={() => setEditing(true)}>
                  Edit supplier
                </Button>
                <Button variant="danger" onClick={() => setDeleting(true)}>
                  Delete supplier
                </Button>
              </>
            ) : null}
          </>
        }
      />
      <BackToList to="/suppliers">All suppliers</BackToList>

      <div className="flex flex-col gap-10">
        <DetailSection id="supplier-details" title="Details">
          <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-4">
            <Item term="Country">{supplier.country}</Item>
            <Item term="Currency">{supplier.currency}</Item>
            <Item term="Default Incoterm">
              {supplier.defaultIncoterm} — {incotermNames[supplier.defaultIncoterm]}
            </Item>
            <Item term="Status">{supplier.active ? 'Active: its quotes can be chosen' : 'Inactive: its quotes are shown but never chosen'}</Item>
            <div className="col-span-full">
              <Item term="Contacts">
                {supplier.contactEmails.length === 0 ? (
                  <span className="text-muted">No contact address yet.</span>
                ) : (
                  <ul className="flex flex-wrap gap-x-4 gap-y-1">
                    {supplier.contactEmails.map((email) => (
                      <li key={email}>
                        <a href={`mailto:${email}`} className="text-copper-dark underline-offset-2 hover:underline">
                          {email}
                        </a>
                      </li>
                    ))}
                  </ul>
                )}
              </Item>
            </div>
            {supplier.notes ? (
              <div className="col-span-full">
                <Item term="Notes">
                  <span className="whitespace-pre-line">{supplier.notes}</span>
                </Item>
              </div>
            ) : null}
          </dl>
        </DetailSection>

        <DetailSection
          id="supplier-quotes"
          title="Quotes"
          action={
            canWriteQuotes ? (
              <Button onClick={() => setQuoteEditing('new')} pending={parts.isPending}>
                Add quote
              </Button>
            ) : null
          }
        >
          {parts.isError ? <p className="text-sm text-muted">Part names could not be loaded: {describeError(parts.error)}</p> : null}
          <QuotesTable quotes={quotes} show="part" partName={partName} canWrite={canWriteQuotes} onEdit={onEditQuote} empty="No quotes from this supplier yet." />
        </DetailSection>
      </div>

      <Dialog open={editing} title={`Edit ${supplier.name}`} onClose={() => setEditing(false)}>
        <SupplierForm supplier={supplier} onDone={() => setEditing(false)} onCancel={() => setEditing(false)} />
      </Dialog>
      <Dialog
        open={importing}
        title={`Import quotes from ${supplier.name}`}
        description="A price list as CSV or XLSX, one row per price break. The whole file is read as this supplier's unless you choose otherwise."
        size="xl"
        onClose={() => setImporting(false)}
      >
        <QuoteImport suppliers={suppliers} defaultSupplierId={supplier.id} />
      </Dialog>
      <Dialog
        open={quoteEditing !== null}
        title={quoteEditing === 'new' ? `Add quote from ${supplier.name}` : `Edit quote from ${supplier.name}`}
        size="lg"
        onClose={() => setQuoteEditing(null)}
      >
        {quoteEditing !== null ? (
          <QuoteEditor
            quote={quoteEditing === 'new' ? undefined : quoteEditing}
            partLabel={quoteEditing !== 'new' ? partName(quoteEditing.partId) : undefined}
            supplierId={supplier.id}
            suppliers={suppliers}
            parts={partChoices}
            onDone={() => setQuoteEditing(null)}
            onCancel={() => setQuoteEditing(null)}
          />
        ) : null}
      </Dialog>
      <ConfirmDialog
        open={deleting}
        title={`Delete ${supplier.name}?`}
        confirmLabel="Delete supplier for good"
        pending={deleteSupplier.isPending}
        error={deleteSupplier.isError ? describeError(deleteSupplier.error) : null}
        onCancel={() => {
          setDeleting(false);
          deleteSupplier.reset();
        }}
        onConfirm={() => deleteSupplier.mutate(supplier.id, { onSuccess: () => navigate('/suppliers', { replace: true }) })}
      >
        Only a supplier without quotes can be deleted; one with quotes can be marked inactive instead.
      </ConfirmDialog>
    </>
  );
}
