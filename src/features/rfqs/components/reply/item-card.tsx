import { useId } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { CheckboxField } from '../../../../components/ui/checkbox-field';
import { CurrencyField } from '../../../../components/ui/currency-field';
import { SelectField } from '../../../../components/ui/select-field';
import { Tag } from '../../../../components/ui/tag';
import { TextField } from '../../../../components/ui/text-field';
import { TextareaField } from '../../../../components/ui/textarea-field';
import { incotermOptions } from '../../../../lib/trade-labels';
import type { ReplyItem } from '../../reply-api';
import { isAnswered, todayIso, type ReplyForm } from '../../reply-form';
import { BreakRows } from './break-rows';

function AnswerTag({ index }: { index: number }) {
  const item = useWatch<ReplyForm, `items.${number}`>({ name: `items.${index}` });
  if (!item) return null;
  if (item.declined) return <Tag tone="muted">Declined</Tag>;
  return isAnswered(item) ? <Tag tone="ok">Priced</Tag> : <Tag>Not answered yet</Tag>;
}

/**
 * One requested part: what the buyer asks for, then the supplier's offer (currency,
 * Incoterm, MOQ, order multiple, lead time, validity and price breaks) or a decline.
 */
export function ItemCard({ item, index }: { item: ReplyItem; index: number }) {
  const headingId = useId();
  const idPrefix = useId();
  const { register, control, formState } = useFormContext<ReplyForm>();
  const declined = useWatch({ control, name: `items.${index}.declined` });
  const errors = formState.errors.items?.[index];
  const detail = [item.manufacturer && `Maker ${item.manufacturer}`, item.package && `Package ${item.package}`].filter(Boolean).join(' · ');

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4 rounded-lg border border-rule bg-surface p-4 sm:p-5">
      <header className="flex flex-col gap-1">
        <div className="flex flex-wrap items-start justify-between gap-2">
          <h3 id={headingId} className="text-base font-semibold">
            {item.internalPn}
            {item.mpn ? <span className="font-normal text-muted"> · MPN {item.mpn}</span> : null}
          </h3>
          <AnswerTag index={index} />
        </div>
        {item.description ? <p className="text-sm">{item.description}</p> : null}
        {detail ? <p className="text-sm text-muted">{detail}</p> : null}
        {item.note ? <p className="rounded-md bg-paper px-3 py-2 text-sm text-muted">Buyer&apos;s note: {item.note}</p> : null}
      </header>

      <CheckboxField label="Decline this part" hint="You do not offer this part; the buyer is told so." {...register(`items.${index}.declined`)} />

      {declined ? null : (
        <div className="flex flex-col gap-4">
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
            <CurrencyField label="Currency" className="w-auto" error={errors?.currency?.message} {...register(`items.${index}.currency`)} />
            <SelectField label="Incoterm" options={incotermOptions} className="col-span-1 sm:col-span-2" error={errors?.incoterm?.message} {...register(`items.${index}.incoterm`)} />
            <TextField label="MOQ (pcs)" inputMode="numeric" autoComplete="off" error={errors?.moq?.message} {...register(`items.${index}.moq`)} />
            <TextField label="Order multiple (pcs)" inputMode="numeric" autoComplete="off" error={errors?.orderMultiple?.message} {...register(`items.${index}.orderMultiple`)} />
            <TextField label="Lead time (days)" inputMode="numeric" autoComplete="off" error={errors?.leadTimeDays?.message} {...register(`items.${index}.leadTimeDays`)} />
            <TextField label="Valid until" type="date" min={todayIso()} error={errors?.validUntil?.message} {...register(`items.${index}.validUntil`)} />
          </div>
          <BreakRows index={index} idPrefix={idPrefix} />
          <TextareaField label="Note to the buyer (optional)" rows={2} maxLength={500} error={errors?.note?.message} {...register(`items.${index}.note`)} />
        </div>
      )}
    </section>
  );
}
