import { useState, type ReactNode } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { partCategories, type PartCategory } from '../../../shared/schemas/trade';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { CurrencyField } from '../../../components/ui/currency-field';
import { FormAlert, StaleVersionAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { fieldMessage } from '../../../lib/form-errors';
import type { Profile } from '../api';
import { useCreateProfile, useUpdateProfile } from '../hooks';
import {
  emptyProfileForm,
  profileFormFields,
  profileFormSchema,
  profileFormValues,
  type ProfileFormOutput,
  type ProfileFormValues,
} from '../profile-form';

// Category names as the parts library shows them; repeated here because areas do not import each other.
const categoryNames: Record<PartCategory, string> = {
  resistor: 'Resistor', capacitor: 'Capacitor', bjt: 'Bipolar transistor', mosfet: 'MOSFET', diode: 'Diode', led: 'LED',
  inductor: 'Inductor', transformer: 'Transformer', switch: 'Switch', battery: 'Battery', pcb: 'PCB', enclosure: 'Enclosure',
  wire: 'Wire', packaging: 'Packaging', other: 'Other',
};

const dutyBasisOptions = [
  { value: 'CIF', label: 'CIF — goods, freight and insurance (EU, UK, most countries)' },
  { value: 'FOB', label: 'FOB — goods at the port of export (e.g. USA, Canada, Australia)' },
];
const freightBasisOptions = [
  { value: 'value', label: 'By goods value' },
  { value: 'weight', label: 'By weight (needs each part’s unit weight)' },
];

function Section({ title, description, children }: { title: string; description?: ReactNode; children: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-rule p-4">
      <legend className="px-1 text-sm font-semibold">{title}</legend>
      {description ? <p className="max-w-prose text-sm text-muted">{description}</p> : null}
      {children}
    </fieldset>
  );
}

type Errors = ReturnType<typeof useForm<ProfileFormValues, unknown, ProfileFormOutput>>['formState']['errors'];

function DutyRates({
  control,
  register,
  errors,
}: {
  control: ReturnType<typeof useForm<ProfileFormValues, unknown, ProfileFormOutput>>['control'];
  register: ReturnType<typeof useForm<ProfileFormValues, unknown, ProfileFormOutput>>['register'];
  errors: Errors;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'dutyRates' });
  return (
    <div className="flex flex-col gap-2">
      <h4 className="text-sm font-medium">Duty rates by HS code</h4>
      <p className="text-sm text-muted">The longest prefix matching a part&apos;s HS code wins; parts that match none pay the default rate.</p>
      {fields.length === 0 ? (
        <p className="text-sm text-muted">No rates by HS code: every part pays the default rate.</p>
      ) : (
        <table className="w-full max-w-lg text-sm">
          <thead>
            <tr className="text-left text-xs font-semibold tracking-wide text-muted uppercase">
              <th scope="col" className="py-1 pr-2">
                HS prefix
              </th>
              <th scope="col" className="py-1 pr-2">
                Duty rate (%)
              </th>
              <th scope="col">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {fields.map((field, index) => {
              const rowErrors = errors.dutyRates?.[index];
              const prefixLabel = `HS prefix, row ${index + 1}`;
              const rateLabel = `Duty rate (%), row ${index + 1}`;
              return (
                <tr key={field.id} className="align-top">
                  <td className="py-1 pr-2">
                    <label className="sr-only" htmlFor={`duty-${field.id}-prefix`}>
                      {prefixLabel}
                    </label>
                    <input
                      id={`duty-${field.id}-prefix`}
                      inputMode="numeric"
                      placeholder="8533.21"
                      aria-invalid={rowErrors?.hsPrefix ? true : undefined}
                      className={`h-9 w-full rounded-md border bg-surface px-3 tabular-nums ${rowErrors?.hsPrefix ? 'border-brick' : 'border-rule'}`}
                      {...register(`dutyRates.${index}.hsPrefix`)}
                    />
                    {rowErrors?.hsPrefix ? <p className="mt-1 text-xs font-medium text-brick">{fieldMessage(prefixLabel, rowErrors.hsPrefix.message)}</p> : null}
                  </td>
                  <td className="py-1 pr-2">
                    <label className="sr-only" htmlFor={`duty-${field.id}-rate`}>
                      {rateLabel}
                    </label>
                    <input
                      id={`duty-${field.id}-rate`}
                      inputMode="decimal"
                      placeholder="3.7"
                      aria-invalid={rowErrors?.ratePct ? true : undefined}
                      className={`h-9 w-full rounded-md border bg-surface px-3 text-right tabular-nums ${rowErrors?.ratePct ? 'border-brick' : 'border-rule'}`}
                      {...register(`dutyRates.${index}.ratePct`)}
                    />
                    {rowErrors?.ratePct ? <p className="mt-1 text-xs font-medium text-brick">{fieldMessage(rateLabel, rowErrors.ratePct.message)}</p> : null}
                  </td>
                  <td className="py-1 text-right">
                    <Button variant="quiet" size="sm" className="mt-1" aria-label={`Remove duty rate row ${index + 1}`} onClick={() => remove(index)}>
                      Remove
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      <div>
        <Button variant="secondary" size="sm" onClick={() => append({ hsPrefix: '', ratePct: '' }, { shouldFocus: true })}>
          Add duty rate
        </Button>
      </div>
    </div>
  );
}

/**
 * Every field of a landed-cost profile: the adders of the costing rules, duty basis and
 * rates, the lead-time limit, attrition by category and assembly rates. `readOnly` for
 * roles that may read but not change profiles.
 */
export function ProfileForm({
  profile,
  readOnly = false,
  onDone,
  onCancel,
}: {
  profile?: Profile;
  readOnly?: boolean;
  onDone: (profile: Profile) => void;
  onCancel: () => void;
}) {
  const createProfile = useCreateProfile();
  const updateProfile = useUpdateProfile(profile?.id ?? '');
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [stale, setStale] = useState(false);
  const [baseVersion, setBaseVersion] = useState(profile?.version ?? 0);
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<ProfileFormValues, unknown, ProfileFormOutput>({
    resolver: zodResolver(profileFormSchema),
    defaultValues: profile ? profileFormValues(profile) : emptyProfileForm(),
  });
  const pending = createProfile.isPending || updateProfile.isPending;

  const onSubmit = handleSubmit((body) => {
    setFormError(null);
    setStale(false);
    setSaved(false);
    const onError = (error: unknown) => {
      if (isStaleVersion(error)) setStale(true);
      else setFormError(applyServerErrors(error, setError, profileFormFields));
    };
    const onSuccess = (next: Profile) => {
      setSaved(true);
      setBaseVersion(next.version);
      reset(profileFormValues(next));
      onDone(next);
    };
    if (profile) updateProfile.mutate({ ...body, version: baseVersion }, { onSuccess, onError });
    else createProfile.mutate(body, { onSuccess, onError });
  });

  const decimalField = (name: keyof ProfileFormValues & string, label: string, hint?: string) => (
    <TextField
      label={label}
      inputMode="decimal"
      hint={hint}
      readOnly={readOnly}
      error={(errors[name as keyof typeof errors] as { message?: string } | undefined)?.message}
      {...register(name as 'originPct')}
    />
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label={profile ? `Edit ${profile.name}` : 'New profile'} className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      {saved ? <FormAlert tone="success">Profile saved.</FormAlert> : null}
      {stale && profile ? (
        <StaleVersionAlert
          onReload={() => {
            reset(profileFormValues(profile));
            setBaseVersion(profile.version);
            setStale(false);
          }}
        />
      ) : null}
      <fieldset disabled={readOnly} className="flex flex-col gap-4">
        <div className="grid gap-3 sm:grid-cols-[1fr_auto]">
          <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
          <CurrencyField label="Currency" hint="Amounts below are in this currency." error={errors.currency?.message} {...register('currency')} />
        </div>

        <Section title="Adders" description="Percentages of the goods value, in percent (3.7 means 3.7 %). An adder a quote's Incoterm already covers is not added.">
          <div className="grid gap-3 sm:grid-cols-3">
            {decimalField('originPct', 'Origin handling (%)', 'Export handling at origin.')}
            {decimalField('freightPct', 'Main freight (%)')}
            {decimalField('insurancePct', 'Insurance (%)', 'On 110 % of goods, origin and freight.')}
            {decimalField('destinationPct', 'Destination handling (%)', 'Port handling and delivery to the warehouse.')}
          </div>
          <div className="grid gap-3 sm:grid-cols-4">
            {decimalField('freightPerShipment', 'Freight per shipment')}
            <CurrencyField label="Freight charged in" hint="Empty: the profile's currency." error={errors.freightCurrency?.message} {...register('freightCurrency')} />
            <TextField label="Shipments per build" inputMode="numeric" error={errors.shipments?.message} {...register('shipments')} />
            {decimalField('feesPerShipment', 'Fees per shipment', 'Brokerage and clearance.')}
          </div>
          <SelectField label="Share per-shipment freight" options={freightBasisOptions} error={errors.freightBasis?.message} className="max-w-sm" {...register('freightBasis')} />
          <p className="text-xs text-muted">Per-shipment amounts are shared out over a BOM&apos;s lines; the quote board of one part leaves them out.</p>
        </Section>

        <Section title="Duty">
          <div className="flex flex-col gap-1">
            <SelectField label="Duty basis" options={dutyBasisOptions} error={errors.dutyBasis?.message} className="max-w-lg" {...register('dutyBasis')} />
            <p className="max-w-prose text-xs text-muted">
              With the FOB basis a C- or D-term price already holds the carriage, so the customs value is overstated when freight is stated separately on the
              invoice.
            </p>
          </div>
          <div className="max-w-xs">{decimalField('defaultDutyPct', 'Default duty rate (%)')}</div>
          <DutyRates control={control} register={register} errors={errors} />
          {errors.dutyRates?.message ? <p className="text-xs font-medium text-brick">{errors.dutyRates.message}</p> : null}
        </Section>

        <Section title="Lead time">
          <TextField
            label="Maximum lead time (days)"
            inputMode="numeric"
            hint="Quotes with a longer lead time are not chosen. Empty: no limit."
            className="max-w-xs"
            error={errors.maxLeadTimeDays?.message}
            {...register('maxLeadTimeDays')}
          />
        </Section>

        <Section title="Attrition by category" description="Extra parts bought to cover losses in assembly, in percent of the required quantity. A BOM line's own value wins; empty means none.">
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
            {partCategories.map((category) => (
              <TextField
                key={category}
                label={`${categoryNames[category]} (%)`}
                inputMode="decimal"
                error={errors.attritionPct?.[category]?.message}
                {...register(`attritionPct.${category}`)}
              />
            ))}
          </div>
        </Section>

        <Section title="Assembly rates" description="In the profile's currency, per finished unit.">
          <div className="grid gap-3 sm:grid-cols-3">
            {decimalField('smtRatePerPlacement', 'SMT, per placement')}
            {decimalField('thtRatePerJoint', 'THT, per soldered joint')}
            {decimalField('handRatePerOp', 'Hand assembly, per operation')}
          </div>
        </Section>

        <TextareaField label="Notes" rows={2} error={errors.notes?.message} {...register('notes')} />
      </fieldset>

      {readOnly ? null : (
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={onCancel} disabled={pending}>
            Cancel
          </Button>
          <Button type="submit" pending={pending}>
            Save profile
          </Button>
        </div>
      )}
    </form>
  );
}
