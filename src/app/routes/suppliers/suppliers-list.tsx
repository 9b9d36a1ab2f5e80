import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { FormPanel } from '../../../components/ui/form-panel';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { QuoteImport } from '../../../features/imports/components/quote-import';
import { suppliersQueryOptions } from '../../../features/suppliers/api';
import { SupplierForm } from '../../../features/suppliers/components/supplier-form';
import { SuppliersTable } from '../../../features/suppliers/components/suppliers-table';

export const suppliersListLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(suppliersQueryOptions());
  return null;
};

export function SuppliersListRoute() {
  const session = useSession();
  const navigate = useNavigate();
  const { data: suppliers } = useSuspenseQuery(suppliersQueryOptions());
  const [creating, setCreating] = useState(false);
  const [importing, setImporting] = useState(false);
  const canWriteSuppliers = can(session.role, 'suppliers.write');
  const canWriteQuotes = can(session.role, 'quotes.write');

  return (
    <>
      <PageHeader
        title="Suppliers"
        description="Component suppliers and contract manufacturers, with their contacts, currency and usual Incoterm."
        actions={
          creating || importing ? null : (
            <>
              {canWriteQuotes ? (
                <Button variant="secondary" onClick={() => setImporting(true)}>
                  Import quotes
                </Button>
              ) : null}
              {canWriteSuppliers ? <Button onClick={() => setCreating(true)}>New supplier</Button> : null}
            </>
          )
        }
      />
      {creating ? (
        <FormPanel title="New supplier">
          <SupplierForm onDone={(supplier) => navigate(`/suppliers/${supplier.id}`)} onCancel={() => setCreating(false)} />
        </FormPanel>
      ) : importing ? (
        <FormPanel
          title="Import quotes"
          description="A supplier's price list as CSV or XLSX, one row per price break. Rows of the same part, supplier and terms become one quote."
        >
          <QuoteImport suppliers={suppliers} />
          <div>
            <Button variant="secondary" onClick={() => setImporting(false)}>
              Back to suppliers
            </Button>
          </div>
        </FormPanel>
      ) : (
        <SuppliersTable suppliers={suppliers} />
      )}
    </>
  );
}
