import { useFieldArray, type Control, type FieldErrors, type UseFormGetValues, type UseFormRegister } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { fieldMessage } from '../../../lib/form-errors';
import { suggestNextMinQty } from '../price-breaks';
import type { QuoteFormOutput, QuoteFormValues } from '../quote-form';

const MAX_BREAKS = 50;

function CellError({ id, label, message }: { id: string; label: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="mt-1 text-xs font-medium text-brick">
      {fieldMessage(label, message)}
    </p>
  );
}

/**
 * The tiers of a quote: from a minimum quantity on, a unit price. Rows must ascend by
 * quantity; prices take up to 6 decimals (0.000810). Each cell has its own label and its
 * own error, so a screen reader hears "Unit price, break 2 must be greater than 0".
 */
export function PriceBreakEditor({
  control,
  register,
  getValues,
  errors,
  currency,
}: {
  control: Control<QuoteFormValues, unknown, QuoteFormOutput>;
  register: UseFormRegister<QuoteFormValues>;
  getValues: UseFormGetValues<QuoteFormValues>;
  errors: FieldErrors<QuoteFormValues>;
  currency: string;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'priceBreaks' });
  const rootMessage = errors.priceBreaks?.root?.message ?? errors.priceBreaks?.message;

  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-4">
      <legend className="px-1 text-sm font-semibold">Price breaks</legend>
      <p className="text-sm text-muted">
        One row per tier, smallest quantity first. The price applies from that quantity up to the next tier.
      </p>
      {rootMessage ? (
        <p role="alert" className="text-xs font-medium text-brick">
          {fieldMessage('Price breaks', rootMessage)}
        </p>
      ) : null}
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left text-xs font-semibold tracking-wide text-muted uppercase">
            <th scope="col" className="w-12 py-1 pr-2">
              Tier
            </th>
            <th scope="col" className="py-1 pr-2">
              From quantity (pcs)
            </th>
            <th scope="col" className="py-1 pr-2">
              Unit price{currency ? ` (${currency.toUpperCase()})` : ''}
            </th>
            <th scope="col" className="py-1">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {fields.map((field, index) => {
            const rowErrors = errors.priceBreaks?.[index];
            const qtyLabel = `From quantity, break ${index + 1}`;
            const priceLabel = `Unit price, break ${index + 1}`;
            const qtyId = `break-${field.id}-qty`;
            const priceId = `break-${field.id}-price`;
            return (
              <tr key={field.id} className="align-top">
                <td className="py-1 pr-2 text-muted tabular-nums">{index + 1}</td>
                <td className="py-1 pr-2">
                  <label htmlFor={qtyId} className="sr-only">
                    {qtyLabel}
                  </label>
                  <input
                    id={qtyId}
                    inputMode="numeric"
                    autoComplete="off"
                    aria-invalid={rowErrors?.minQty ? true : undefined}
                    aria-describedby={rowErrors?.minQty ? `${qtyId}-error` : undefined}
                    className={`h-9 w-full rounded-md border bg-surface px-3 text-right tabular-nums ${rowErrors?.minQty ? 'border-brick' : 'border-rule hover:border-muted'}`}
                    {...register(`priceBreaks.${index}.minQty`)}
                  />
                  <CellError id={`${qtyId}-error`} label={qtyLabel} message={rowErrors?.minQty?.message} />
                </td>
                <td className="py-1 pr-2">
                  <label htmlFor={priceId} className="sr-only">
                    {priceLabel}
                  </label>
                  <input
                    id={priceId}
                    inputMode="decimal"
                    autoComplete="off"
                    placeholder="0.000810"
                    aria-invalid={rowErrors?.unitPrice ? true : undefined}
                    aria-describedby={rowErrors?.unitPrice ? `${priceId}-error` : undefined}
                    className={`h-9 w-full rounded-md border bg-surface px-3 text-right tabular-nums placeholder:text-muted/50 ${rowErrors?.unitPrice ? 'border-brick' : 'border-rule hover:border-muted'}`}
                    {...register(`priceBreaks.${index}.unitPrice`)}
                  />
                  <CellError id={`${priceId}-error`} label={priceLabel} message={rowErrors?.unitPrice?.message} />
                </td>
                <td className="py-1 text-right">
                  <Button
                    variant="quiet"
                    size="sm"
                    className="mt-1"
                    aria-label={`Remove price break ${index + 1}`}
                    disabled={fields.length === 1}
                    onClick={() => remove(index)}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div>
        <Button
          variant="secondary"
          size="sm"
          disabled={fields.length >= MAX_BREAKS}
          onClick={() => append({ minQty: suggestNextMinQty(getValues('priceBreaks')), unitPrice: '' }, { shouldFocus: true, focusName: `priceBreaks.${fields.length}.unitPrice` })}
        >
          Add price break
        </Button>
      </div>
    </fieldset>
  );
}
