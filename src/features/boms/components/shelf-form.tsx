import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import type { Bom, Shelf } from '../api';
import { useUpdateBom } from '../hooks';
import { shelfFormFields, shelfFormSchema, shelfFormValues, type ShelfFormValues } from '../shelf-form';

/** The shelf price and what the chain takes off it: VAT, the retailer's and the importer's margins, freight to the store. */
export function ShelfForm({ bom, readOnly }: { bom: Bom; readOnly: boolean }) {
  const updateBom = useUpdateBom(bom.id);
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ShelfFormValues, unknown, Shelf>({ resolver: zodResolver(shelfFormSchema), defaultValues: shelfFormValues(bom.shelf) });

  const onSubmit = handleSubmit((value) => {
    setFormError(null);
    setSaved(false);
    updateBom.mutate(
      { shelf: value, version: bom.version },
      {
        onSuccess: () => setSaved(true),
        onError: (error) => setFormError(isStaleVersion(error) ? STALE_VERSION_MESSAGE : applyServerErrors(error, setError, shelfFormFields)),
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Shelf price" className="flex flex-col gap-4 rounded-lg border border-rule bg-surface p-4">
      <h3 className="text-base font-semibold">Shelf price and margins</h3>
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      {saved ? <FormAlert tone="success">Saved. The ladder below is worked out again.</FormAlert> : null}
      <fieldset disabled={readOnly || updateBom.isPending} className="grid gap-3 sm:grid-cols-3 lg:grid-cols-5">
        <TextField label={`Shelf price (${bom.reportingCurrency})`} inputMode="decimal" hint="Including VAT." error={errors.price?.message} {...register('price')} />
        <TextField label="VAT %" inputMode="decimal" error={errors.vatPct?.message} {...register('vatPct')} />
        <TextField label="Retailer margin %" inputMode="decimal" hint="On the retailer's selling price." error={errors.retailerMarginPct?.message} {...register('retailerMarginPct')} />
        <TextField label="Importer margin %" inputMode="decimal" hint="On your selling price." error={errors.importerMarginPct?.message} {...register('importerMarginPct')} />
        <TextField
          label={`Freight to store (${bom.reportingCurrency})`}
          inputMode="decimal"
          hint="Per unit."
          error={errors.freightToStorePerUnit?.message}
          {...register('freightToStorePerUnit')}
        />
      </fieldset>
      {readOnly ? null : (
        <div className="flex justify-end">
          <Button type="submit" pending={updateBom.isPending}>
            Save shelf price
          </Button>
        </div>
      )}
    </form>
  );
}
