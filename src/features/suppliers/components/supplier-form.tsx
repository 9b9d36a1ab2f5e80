import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion } from '../../../lib/stale-version';
import { incotermOptions } from '../../../lib/trade-labels';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { CurrencyField } from '../../../components/ui/currency-field';
import { FormAlert, StaleVersionAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextareaField } from '../../../components/ui/textarea-field';
import type { Supplier } from '../api';
import { useCreateSupplier, useUpdateSupplier } from '../hooks';
import {
  emptySupplierForm,
  supplierFormFields,
  supplierFormSchema,
  supplierFormValues,
  type SupplierFormOutput,
  type SupplierFormValues,
} from '../supplier-form';

/** Adds a supplier (no `supplier`) or changes one. */
export function SupplierForm({ supplier, onDone, onCancel }: { supplier?: Supplier; onDone: (supplier: Supplier) => void; onCancel: () => void }) {
  const createSupplier = useCreateSupplier();
  const updateSupplier = useUpdateSupplier(supplier?.id ?? '');
  const [formError, setFormError] = useState<string | null>(null);
  const [stale, setStale] = useState(false);
  const [baseVersion, setBaseVersion] = useState(supplier?.version ?? 0);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<SupplierFormValues, unknown, SupplierFormOutput>({
    resolver: zodResolver(supplierFormSchema),
    defaultValues: supplier ? supplierFormValues(supplier) : emptySupplierForm,
  });
  const pending = createSupplier.isPending || updateSupplier.isPending;

  const onSubmit = handleSubmit((body) => {
    setFormError(null);
    setStale(false);
    const onError = (error: unknown) => {
      if (isStaleVersion(error)) setStale(true);
      else setFormError(applyServerErrors(error, setError, supplierFormFields));
    };
    if (supplier) updateSupplier.mutate({ ...body, version: baseVersion }, { onSuccess: onDone, onError });
    else createSupplier.mutate(body, { onSuccess: onDone, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={supplier ? `Edit ${supplier.name}` : 'New supplier'} className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      {stale && supplier ? (
        <StaleVersionAlert
          onReload={() => {
            reset(supplierFormValues(supplier));
            setBaseVersion(supplier.version);
            setStale(false);
          }}
        />
      ) : null}
      <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField
          label="Country"
          autoComplete="off"
          maxLength={2}
          placeholder="CN"
          hint="ISO 3166 two-letter code."
          style={{ textTransform: 'uppercase' }}
          error={errors.country?.message}
          {...register('country')}
        />
        <CurrencyField label="Currency" hint="What they quote in." error={errors.currency?.message} {...register('currency')} />
        <SelectField label="Default Incoterm" options={incotermOptions} error={errors.defaultIncoterm?.message} {...register('defaultIncoterm')} />
      </div>
      <TextareaField
        label="Contact e-mails"
        rows={3}
        hint="One address per line. RFQs go to these addresses."
        error={errors.contactEmails?.message}
        {...register('contactEmails')}
      />
      <CheckboxField
        label="Active"
        hint="Quotes of an inactive supplier stay visible but are never chosen for a BOM or the quote board."
        {...register('active')}
      />
      <TextareaField label="Notes" rows={3} error={errors.notes?.message} {...register('notes')} />
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Cancel
        </Button>
        <Button type="submit" pending={pending}>
          Save supplier
        </Button>
      </div>
    </form>
  );
}
