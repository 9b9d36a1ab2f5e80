import { useState } from 'react';
import { Controller, useForm, useWatch, type Path, type UseFormSetError } from 'react-hook-form';
import type { QueryKey } from '@tanstack/react-query';
import { rfqCreateBody, type RfqCreateBody } from '../../../shared/schemas/rfqs';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextareaField } from '../../../components/ui/textarea-field';
import type { RfqDetail } from '../api';
import { useCreateRfq } from '../hooks';
import { todayIso } from '../reply-form';
import { PartPicker, type PartChoice, type PartSearch } from './part-picker';
import { QuantityChips } from './quantity-chips';
import { SupplierPicker, type SupplierChoice } from './supplier-picker';

/** What the form needs of a BOM revision. */
export type BomChoice = { id: string; name: string; revision: number; state: string; lineCount: number };

type Values = {
  title: string;
  source: 'bom' | 'parts';
  bomId: string;
  parts: PartChoice[];
  supplierIds: string[];
  quantities: number[];
  replyBy: string;
  message: string;
};

const fields: readonly Path<Values>[] = ['title', 'bomId', 'parts', 'supplierIds', 'quantities', 'replyBy', 'message'];

/** Two weeks from today: a usual time to answer an RFQ (common practice). */
function inTwoWeeks(): string {
  return new Date(Date.now() + 14 * 86_400_000).toISOString().slice(0, 10);
}

const stateWords: Record<string, string> = { draft: 'Draft', in_review: 'In review', released: 'Released' };

/** The body the server takes, from what the form holds. */
function toBody(values: Values) {
  return {
    title: values.title,
    bomId: values.source === 'bom' ? values.bomId || null : null,
    partIds: values.source === 'parts' ? values.parts.map((p) => p.id) : [],
    supplierIds: values.supplierIds,
    quantities: values.quantities,
    replyBy: values.replyBy,
    message: values.message,
  };
}

/**
 * A new request for quotation: a title, the parts (every part line of a BOM, or parts
 * picked from the library), the suppliers to ask, the quantities, the reply-by date and a
 * message. Checked with the schema the server uses; a plan without RFQs answers 402 and
 * its message (naming the plan that has them) shows above the form.
 */
export function RfqForm<T extends PartChoice, K extends QueryKey>({
  boms,
  suppliers,
  searchParts,
  onCancel,
  onDone,
}: {
  boms: BomChoice[];
  suppliers: SupplierChoice[];
  searchParts: PartSearch<T, K>;
  onCancel: () => void;
  onDone: (rfq: RfqDetail) => void;
}) {
  const create = useCreateRfq();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    control,
    handleSubmit,
    setError,
    clearErrors,
    formState: { errors },
  } = useForm<Values>({
    defaultValues: { title: '', source: boms.length ? 'bom' : 'parts', bomId: '', parts: [], supplierIds: [], quantities: [], replyBy: inTwoWeeks(), message: '' },
  });
  const source = useWatch({ control, name: 'source' });
  // The schema names a missing choice of parts "partIds"; show it where the choice is made.
  const partsField = (values: Values): Path<Values> => (values.source === 'bom' ? 'bomId' : 'parts');

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    clearErrors();
    const body = toBody(values);
    const parsed = rfqCreateBody.safeParse(body);
    const problems: { path: Path<Values>; message: string }[] = [];
    if (values.replyBy && values.replyBy < todayIso()) problems.push({ path: 'replyBy', message: 'must be today or later' });
    if (values.source === 'bom' && !values.bomId) problems.push({ path: 'bomId', message: 'choose a BOM' });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const top = String(issue.path[0] ?? '');
        const path = top === 'partIds' || top === 'bomId' ? partsField(values) : (top as Path<Values>);
        if (fields.includes(path) && !problems.some((p) => p.path === path)) problems.push({ path, message: issue.message });
      }
    }
    if (problems.length || !parsed.success) {
      problems.forEach((p, n) => setError(p.path, { type: 'client', message: p.message }, { shouldFocus: n === 0 }));
      return;
    }
    create.mutate(parsed.data satisfies RfqCreateBody, {
      onSuccess: onDone,
      onError: (error) => {
        // Server paths are the body's: partIds belongs to the parts (or BOM) choice here.
        const remap: UseFormSetError<Values> = (path, problem, options) => setError(String(path) === 'partIds' ? partsField(values) : path, problem, options);
        setFormError(applyServerErrors<Values>(error, remap, [...fields, 'partIds' as Path<Values>]));
      },
    });
  });

  const bomOptions = [
    { value: '', label: boms.length ? 'Choose a BOM' : 'No BOMs yet' },
    ...boms.map((b) => ({ value: b.id, label: `${b.name} · rev ${b.revision} · ${stateWords[b.state] ?? b.state} · ${b.lineCount} lines` })),
  ];

  return (
    <form onSubmit={onSubmit} noValidate aria-label="New RFQ" className="flex flex-col gap-6">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="Title" autoComplete="off" placeholder="Arc lighter HV parts, spring build" error={errors.title?.message} {...register('title')} />

      <fieldset className="flex flex-col gap-3">
        <legend className="text-sm font-medium text-ink">What to quote</legend>
        <div className="flex flex-wrap gap-4 text-sm">
          <label className="flex items-center gap-2">
            <input type="radio" value="bom" className="size-4 accent-copper" {...register('source')} />
            Every part line of a BOM
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="parts" className="size-4 accent-copper" {...register('source')} />
            Parts I choose
          </label>
        </div>
        {source === 'bom' ? (
          <SelectField label="BOM" options={bomOptions} error={errors.bomId?.message} className="max-w-xl" {...register('bomId')} />
        ) : (
          <Controller
            control={control}
            name="parts"
            render={({ field, fieldState }) => (
              <PartPicker search={searchParts} value={field.value} onChange={field.onChange} error={fieldState.error?.message} />
            )}
          />
        )}
        {source === 'bom' ? <p className="text-xs text-muted">Lines marked do-not-place and lines without a part are left out.</p> : null}
      </fieldset>

      <Controller
        control={control}
        name="supplierIds"
        render={({ field, fieldState }) => (
          <SupplierPicker suppliers={suppliers} value={field.value} onChange={field.onChange} error={fieldState.error?.message} />
        )}
      />

      <Controller
        control={control}
        name="quantities"
        render={({ field, fieldState }) => <QuantityChips value={field.value} onChange={field.onChange} error={fieldState.error?.message} />}
      />

      <TextField label="Reply by" type="date" min={todayIso()} className="w-52" error={errors.replyBy?.message} {...register('replyBy')} />
      <TextareaField
        label="Message to the suppliers"
        rows={4}
        maxLength={2000}
        hint="Shown in the e-mail and on their page: packing, certificates, anything they should know."
        error={errors.message?.message}
        {...register('message')}
      />

      <div className="flex justify-end gap-2 border-t border-rule pt-4">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" pending={create.isPending}>
          Send RFQ
        </Button>
      </div>
    </form>
  );
}
