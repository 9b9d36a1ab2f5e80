import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { CurrencyField } from '../../../components/ui/currency-field';
import { FormAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { profileChoicesQueryOptions, type Bom } from '../api';
import { bomFormFields, bomFormSchema, bomFormValues, emptyBomForm, type BomFormOutput, type BomFormValues } from '../bom-form';
import { useCreateBom, useUpdateBom } from '../hooks';

/**
 * A new BOM (no `bom`), or the details of one: name, reporting currency, landed-cost
 * profile, planned quantity and target unit cost.
 */
export function BomForm({ bom, onDone, onCancel }: { bom?: Bom; onDone: (bom: Bom) => void; onCancel: () => void }) {
  const profiles = useQuery(profileChoicesQueryOptions());
  const createBom = useCreateBom();
  const updateBom = useUpdateBom(bom?.id ?? '');
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<BomFormValues, unknown, BomFormOutput>({
    resolver: zodResolver(bomFormSchema),
    defaultValues: bom ? bomFormValues(bom) : emptyBomForm,
  });
  const pending = createBom.isPending || updateBom.isPending;

  const profileOptions = [
    { value: '', label: profiles.isPending ? 'Loading profiles…' : 'No profile (goods only)' },
    ...(profiles.data ?? []).map((p) => ({ value: p.id, label: p.name })),
  ];

  const onSubmit = handleSubmit((body) => {
    setFormError(null);
    const onError = (error: unknown) =>
      setFormError(isStaleVersion(error) ? STALE_VERSION_MESSAGE : applyServerErrors(error, setError, bomFormFields));
    if (bom) updateBom.mutate({ ...body, version: bom.version }, { onSuccess: onDone, onError });
    else createBom.mutate({ ...body, stressPolicyId: null, ambientC: 25, shelf: { price: null, vatPct: '0', retailerMarginPct: '0', importerMarginPct: '0', freightToStorePerUnit: '0' }, notes: '' }, { onSuccess: onDone, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={bom ? `Details of ${bom.name}` : 'New BOM'} className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="Name" autoComplete="off" placeholder="Arc lighter USB-C" error={errors.name?.message} {...register('name')} />
      <div className="grid gap-3 sm:grid-cols-2">
        <CurrencyField
          label="Reporting currency"
          hint="Every cost of this BOM is rolled up in it."
          error={errors.reportingCurrency?.message}
          {...register('reportingCurrency')}
        />
        <SelectField label="Landed-cost profile" options={profileOptions} error={errors.profileId?.message} {...register('profileId')} />
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Planned quantity" inputMode="numeric" hint="Finished units per build." error={errors.plannedQty?.message} {...register('plannedQty')} />
        <TextField
          label="Target unit cost"
          inputMode="decimal"
          hint="Landed, per unit, in the reporting currency."
          error={errors.targetUnitCost?.message}
          {...register('targetUnitCost')}
        />
        <TextField
          label="Amortise one-time costs over"
          inputMode="numeric"
          hint="Units; empty means the build quantity."
          error={errors.amortisationQty?.message}
          {...register('amortisationQty')}
        />
      </div>
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Cancel
        </Button>
        <Button type="submit" pending={pending}>
          {bom ? 'Save details' : 'Create BOM'}
        </Button>
      </div>
    </form>
  );
}
