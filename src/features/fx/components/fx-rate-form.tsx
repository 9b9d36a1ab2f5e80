import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { fxRateBody } from '../../../shared/schemas/fx';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { CurrencyField } from '../../../components/ui/currency-field';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useAddFxRate } from '../hooks';

type FxRateInput = z.input<typeof fxRateBody>;
type FxRateOutput = z.output<typeof fxRateBody>;

const today = () => new Date().toISOString().slice(0, 10);

/** One rate by hand: 1 base = rate quote on the date. */
export function FxRateForm() {
  const addRate = useAddFxRate();
  const [formError, setFormError] = useState<string | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<FxRateInput, unknown, FxRateOutput>({
    resolver: zodResolver(fxRateBody),
    defaultValues: { date: today(), base: 'EUR', quote: '', rate: '' },
  });

  const onSubmit = handleSubmit((body) => {
    setFormError(null);
    setAdded(null);
    addRate.mutate(body, {
      onSuccess: (rate) => {
        setAdded(`Added 1 ${rate.base} = ${rate.rate} ${rate.quote} on ${rate.date}.`);
        reset({ date: body.date, base: body.base, quote: '', rate: '' });
      },
      onError: (error) => setFormError(applyServerErrors(error, setError, ['date', 'base', 'quote', 'rate'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Enter a rate" className="flex flex-col gap-3">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      {added ? <FormAlert tone="success">{added}</FormAlert> : null}
      <div className="flex flex-wrap items-start gap-3">
        <TextField label="Date" type="date" error={errors.date?.message} {...register('date')} />
        <CurrencyField label="Base" hint="1 of this…" error={errors.base?.message} {...register('base')} />
        <TextField
          label="Rate"
          inputMode="decimal"
          autoComplete="off"
          placeholder="1.0705"
          hint="…is this many of the quote currency."
          className="w-40"
          error={errors.rate?.message}
          {...register('rate')}
        />
        <CurrencyField label="Quote" error={errors.quote?.message} {...register('quote')} />
        <Button type="submit" pending={addRate.isPending} className="mt-6">
          Add rate
        </Button>
      </div>
    </form>
  );
}
