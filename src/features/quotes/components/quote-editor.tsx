import { useMemo, useState } from 'react';
import { useForm, useWatch, type UseFormRegister } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion } from '../../../lib/stale-version';
import { incotermOptions } from '../../../lib/trade-labels';
import { Button } from '../../../components/ui/button';
import { CurrencyField } from '../../../components/ui/currency-field';
import { FormAlert, StaleVersionAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextareaField } from '../../../components/ui/textarea-field';
import type { Quote } from '../api';
import { useCreateQuote, useUpdateQuote } from '../hooks';
import {
  emptyQuoteForm,
  quoteFormFields,
  quoteFormSchema,
  quoteFormValues,
  quotePatch,
  type QuoteFormOutput,
  type QuoteFormValues,
} from '../quote-form';
import { PriceBreakEditor } from './price-break-editor';

/** A supplier as the editor offers it; its currency and Incoterm prefill a new quote. */
export type SupplierChoice = { id: string; name: string; currency: string; defaultIncoterm: QuoteFormValues['incoterm']; active: boolean };
export type PartChoice = { id: string; label: string };

// A select of ten thousand options is slow to open and to scan: show the first matches.
const PART_OPTIONS_SHOWN = 200;

function PartPicker({
  parts,
  register,
  error,
}: {
  parts: readonly PartChoice[];
  register: UseFormRegister<QuoteFormValues>;
  error?: string;
}) {
  const [find, setFind] = useState('');
  const options = useMemo(() => {
    const wanted = find.trim().toLowerCase();
    const matches = wanted ? parts.filter((p) => p.label.toLowerCase().includes(wanted)) : parts;
    return [{ value: '', label: matches.length ? 'Choose a part' : 'No part matches' }, ...matches.slice(0, PART_OPTIONS_SHOWN).map((p) => ({ value: p.id, label: p.label }))];
  }, [find, parts]);
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <TextField label="Search the library" type="search" value={find} onChange={(event) => setFind(event.target.value)} hint="Our part number or the MPN." />
      <SelectField label="Part" options={options} error={error} {...register('partId')} />
    </div>
  );
}

/**
 * Adds or changes a quote: terms, validity and the price-break tiers. The part is fixed
 * when opened from a part's page, the supplier when opened from a supplier's page.
 */
export function QuoteEditor({
  quote,
  partId,
  partLabel,
  supplierId,
  suppliers,
  parts = [],
  onDone,
  onCancel,
}: {
  quote?: Quote;
  /** Fixes the part (a part's page). */
  partId?: string;
  partLabel?: string;
  /** Fixes the supplier (a supplier's page). */
  supplierId?: string;
  suppliers: readonly SupplierChoice[];
  /** Parts to choose from when the part is not fixed. */
  parts?: readonly PartChoice[];
  onDone: (quote: Quote) => void;
  onCancel: () => void;
}) {
  const createQuote = useCreateQuote();
  const updateQuote = useUpdateQuote(quote?.id ?? '');
  const [formError, setFormError] = useState<string | null>(null);
  const [stale, setStale] = useState(false);
  const [baseVersion, setBaseVersion] = useState(quote?.version ?? 0);
  const fixedSupplier = supplierId ? suppliers.find((s) => s.id === supplierId) : undefined;

  const {
    register,
    control,
    handleSubmit,
    setError,
    setValue,
    getValues,
    reset,
    formState: { errors, dirtyFields },
  } = useForm<QuoteFormValues, unknown, QuoteFormOutput>({
    resolver: zodResolver(quoteFormSchema),
    defaultValues: quote
      ? quoteFormValues(quote)
      : emptyQuoteForm({
          partId: partId ?? '',
          supplierId: supplierId ?? '',
          currency: fixedSupplier?.currency ?? '',
          incoterm: fixedSupplier?.defaultIncoterm ?? 'FOB',
        }),
  });
  const currency = useWatch({ control, name: 'currency' });
  const pending = createQuote.isPending || updateQuote.isPending;

  const supplierOptions = [
    { value: '', label: 'Choose a supplier' },
    ...suppliers.map((s) => ({ value: s.id, label: s.active ? s.name : `${s.name} (inactive)` })),
  ];
  const supplierField = register('supplierId');

  const onSubmit = handleSubmit((body) => {
    setFormError(null);
    setStale(false);
    const onError = (error: unknown) => {
      if (isStaleVersion(error)) setStale(true);
      else setFormError(applyServerErrors(error, setError, quoteFormFields));
    };
    if (quote) updateQuote.mutate(quotePatch(body, baseVersion), { onSuccess: onDone, onError });
    else createQuote.mutate(body, { onSuccess: onDone, onError });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={quote ? 'Edit quote' : 'Add quote'} className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      {stale && quote ? (
        <StaleVersionAlert
          onReload={() => {
            reset(quoteFormValues(quote));
            setBaseVersion(quote.version);
            setStale(false);
          }}
        />
      ) : null}

      {partId || quote ? (
        <p className="text-sm">
          <span className="text-muted">Part: </span>
          <span className="font-medium">{partLabel ?? parts.find((p) => p.id === (quote?.partId ?? partId))?.label ?? `#${quote?.partId ?? partId}`}</span>
        </p>
      ) : (
        <PartPicker parts={parts} register={register} error={errors.partId?.message} />
      )}

      <div className="grid gap-3 sm:grid-cols-3">
        {fixedSupplier && !quote ? (
          <p className="text-sm sm:col-span-3">
            <span className="text-muted">Supplier: </span>
            <span className="font-medium">{fixedSupplier.name}</span>
          </p>
        ) : (
          <SelectField
            label="Supplier"
            options={supplierOptions}
            error={errors.supplierId?.message}
            className="sm:col-span-3"
            {...supplierField}
            onChange={(event) => {
              void supplierField.onChange(event);
              // A new quote takes the supplier's usual terms unless they were typed already.
              const chosen = suppliers.find((s) => s.id === event.target.value);
              if (chosen && !quote) {
                if (!dirtyFields.currency) setValue('currency', chosen.currency);
                if (!dirtyFields.incoterm) setValue('incoterm', chosen.defaultIncoterm);
              }
            }}
          />
        )}
        <CurrencyField label="Currency" hint="ISO 4217, e.g. CNY." error={errors.currency?.message} {...register('currency')} />
        <SelectField label="Incoterm" options={incotermOptions} error={errors.incoterm?.message} className="sm:col-span-2" {...register('incoterm')} />
        <TextField label="MOQ (pcs)" inputMode="numeric" error={errors.moq?.message} {...register('moq')} />
        <TextField label="Order multiple (pcs)" inputMode="numeric" hint="Reel or pack size." error={errors.orderMultiple?.message} {...register('orderMultiple')} />
        <TextField label="Lead time (days)" inputMode="numeric" hint="Leave empty when not stated." error={errors.leadTimeDays?.message} {...register('leadTimeDays')} />
        <TextField label="Valid from" type="date" error={errors.validFrom?.message} {...register('validFrom')} />
        <TextField label="Valid until" type="date" hint="Empty: no end date." error={errors.validUntil?.message} {...register('validUntil')} />
      </div>

      <PriceBreakEditor control={control} register={register} getValues={getValues} errors={errors} currency={currency} />

      <TextareaField label="Note" rows={2} error={errors.note?.message} {...register('note')} />

      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Cancel
        </Button>
        <Button type="submit" pending={pending}>
          Save quote
        </Button>
      </div>
    </form>
  );
}
