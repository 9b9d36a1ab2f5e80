import type { ComponentProps } from 'react';
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { Button } from '../../../../components/ui/button';
import { fieldMessage } from '../../../../lib/form-errors';
import type { ReplyForm } from '../../reply-form';

function CellInput({ id, label, error, ...props }: ComponentProps<'input'> & { id: string; label: string; error?: string }) {
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={`h-10 w-full min-w-0 rounded-md border bg-surface px-3 text-sm text-ink tabular-nums placeholder:text-muted/60 ${
          error ? 'border-brick' : 'border-rule hover:border-muted'
        }`}
        {...props}
      />
      {error ? (
        <p id={`${id}-error`} className="text-xs font-medium text-brick">
          {fieldMessage(label, error)}
        </p>
      ) : null}
    </div>
  );
}

/**
 * The price breaks of one offer: a row per quantity tier (from this many pieces, this unit
 * price). Rows start at the buyer's quantities; a row left without a price is not sent.
 */
export function BreakRows({ index, idPrefix }: { index: number; idPrefix: string }) {
  const { control, register, formState } = useFormContext<ReplyForm>();
  const { fields, append, remove } = useFieldArray({ control, name: `items.${index}.priceBreaks` });
  const currency = useWatch({ control, name: `items.${index}.currency` });
  const errors = formState.errors.items?.[index]?.priceBreaks;
  const code = (currency || '').toUpperCase();

  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="text-sm font-medium text-ink">Price breaks</legend>
      <p className="text-xs text-muted">Unit price per piece from each quantity up, at most 6 decimals. Leave a price empty to skip that quantity.</p>
      <div aria-hidden="true" className="grid grid-cols-[1fr_1fr_2.25rem] gap-2 text-xs font-semibold tracking-wide text-muted uppercase">
        <span>From (pcs)</span>
        <span>Unit price{code ? ` (${code})` : ''}</span>
        <span />
      </div>
      <ol className="flex flex-col gap-2">
        {fields.map((field, r) => (
          <li key={field.id} className="grid grid-cols-[1fr_1fr_2.25rem] items-start gap-2">
            <CellInput
              id={`${idPrefix}-break-${r}-qty`}
              label={`Break ${r + 1} from quantity`}
              inputMode="numeric"
              autoComplete="off"
              error={errors?.[r]?.minQty?.message}
              {...register(`items.${index}.priceBreaks.${r}.minQty`)}
            />
            <CellInput
              id={`${idPrefix}-break-${r}-price`}
              label={`Break ${r + 1} unit price`}
              inputMode="decimal"
              autoComplete="off"
              placeholder="0.0000"
              error={errors?.[r]?.unitPrice?.message}
              {...register(`items.${index}.priceBreaks.${r}.unitPrice`)}
            />
            <Button
              variant="quiet"
              className="h-10 px-0 text-lg text-muted"
              aria-label={`Remove break ${r + 1}`}
              disabled={fields.length === 1}
              onClick={() => remove(r)}
            >
              <span aria-hidden="true">×</span>
            </Button>
          </li>
        ))}
      </ol>
      {errors?.message || errors?.root?.message ? (
        <p className="text-xs font-medium text-brick">{fieldMessage('Price breaks', errors.message ?? errors.root?.message)}</p>
      ) : null}
      <div>
        <Button variant="secondary" size="sm" onClick={() => append({ minQty: '', unitPrice: '' })}>
          Add a price break
        </Button>
      </div>
    </fieldset>
  );
}
