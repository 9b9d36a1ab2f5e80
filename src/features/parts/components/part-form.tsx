import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { partCategories, mounts } from '../../../shared/schemas/trade';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { FormAlert, StaleVersionAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextareaField } from '../../../components/ui/textarea-field';
import type { Part } from '../api';
import { useCreatePart, useUpdatePart } from '../hooks';
import {
  categoryLabels,
  emptyPartForm,
  mountLabels,
  partFormFields,
  partFormSchema,
  partFormValues,
  type PartFormOutput,
  type PartFormValues,
} from '../part-form';
import { ratingFieldsFor } from '../ratings';
import { RatingField } from './rating-field';

const categoryOptions = partCategories.map((value) => ({ value, label: categoryLabels[value] }));
const mountOptions = mounts.map((value) => ({ value, label: mountLabels[value] }));

/** A problem with the ratings as a whole (a server message on `ratings`), not on one field. */
function ratingsMessage(error: unknown): string | undefined {
  const message = (error as { message?: unknown } | undefined)?.message;
  return typeof message === 'string' ? message : undefined;
}

/** Adds a part (no `part`) or changes one; the ratings follow the chosen category. */
export function PartForm({ part, onDone, onCancel }: { part?: Part; onDone: (part: Part) => void; onCancel: () => void }) {
  const createPart = useCreatePart();
  const updatePart = useUpdatePart(part?.id ?? '');
  const [formError, setFormError] = useState<string | null>(null);
  const [stale, setStale] = useState(false);
  // The version this form was filled from; a save names it, so a newer save by someone else is a 409.
  const [baseVersion, setBaseVersion] = useState(part?.version ?? 0);
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<PartFormValues, unknown, PartFormOutput>({
    resolver: zodResolver(partFormSchema),
    defaultValues: part ? partFormValues(part) : emptyPartForm,
  });
  const category = useWatch({ control, name: 'category' });
  const ratingDefs = ratingFieldsFor(category);
  const pending = createPart.isPending || updatePart.isPending;

  const onSubmit = handleSubmit((body) => {
    setFormError(null);
    setStale(false);
    const onError = (error: unknown) => {
      if (isStaleVersion(error)) {
        setStale(true);
        return;
      }
      setFormError(applyServerErrors(error, setError, [...partFormFields, ...ratingDefs.map((d) => `ratings.${d.key}` as const)]));
    };
    if (part) updatePart.mutate({ ...body, version: baseVersion }, { onSuccess: onDone, onError });
    else createPart.mutate(body, { onSuccess: onDone, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={part ? `Edit ${part.internalPn}` : 'New part'} className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      {stale && part ? (
        <StaleVersionAlert
          onReload={() => {
            reset(partFormValues(part));
            setBaseVersion(part.version);
            setStale(false);
          }}
        />
      ) : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Internal PN" autoComplete="off" error={errors.internalPn?.message} {...register('internalPn')} />
        <SelectField label="Category" options={categoryOptions} error={errors.category?.message} {...register('category')} />
        <TextField label="MPN" autoComplete="off" error={errors.mpn?.message} {...register('mpn')} />
        <TextField label="Maker" autoComplete="off" error={errors.manufacturer?.message} {...register('manufacturer')} />
        <TextField label="Package" autoComplete="off" placeholder="0603, SOT-23, TO-92" error={errors.package?.message} {...register('package')} />
        <div className="grid grid-cols-2 gap-3">
          <SelectField label="Mount" options={mountOptions} error={errors.mount?.message} {...register('mount')} />
          <TextField label="Pins" inputMode="numeric" error={errors.pins?.message} {...register('pins')} />
        </div>
        <TextField label="HS code" inputMode="numeric" placeholder="8533.21" hint="4 to 10 digits; dots are fine." error={errors.hsCode?.message} {...register('hsCode')} />
        <TextField label="Unit weight (g)" inputMode="decimal" error={errors.unitWeightG?.message} {...register('unitWeightG')} />
      </div>
      <TextareaField label="Description" rows={2} error={errors.description?.message} {...register('description')} />

      <fieldset className="flex flex-col gap-3 rounded-md border border-rule p-4">
        <legend className="px-1 text-sm font-semibold">Ratings</legend>
        {ratingDefs.length === 0 ? (
          <p className="text-sm text-muted">A {categoryLabels[category].toLowerCase()} part carries no electrical ratings here.</p>
        ) : (
          <>
            <p className="text-sm text-muted">Type values the way the datasheet writes them: 4K7, 2n2, 2kV, 1/4W, 700mA.</p>
            <div className="grid gap-3 sm:grid-cols-2">
              {ratingDefs.map((def) => (
                <RatingField
                  key={`${category}.${def.key}`}
                  def={def}
                  register={register}
                  control={control}
                  error={(errors.ratings as Record<string, { message?: string }> | undefined)?.[def.key]?.message}
                />
              ))}
            </div>
          </>
        )}
        {ratingsMessage(errors.ratings) ? <p className="text-xs font-medium text-brick">{ratingsMessage(errors.ratings)}</p> : null}
      </fieldset>

      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Cancel
        </Button>
        <Button type="submit" pending={pending}>
          Save part
        </Button>
      </div>
    </form>
  );
}
