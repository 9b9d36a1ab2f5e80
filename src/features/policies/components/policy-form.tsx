import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { ApiError, isApiError } from '../../../lib/api-client';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { TextareaField } from '../../../components/ui/textarea-field';
import type { StressPolicy } from '../api';
import { useUpdatePolicy } from '../hooks';
import { confidenceWords, LIMIT_ROWS } from '../limit-rows';
import { policyFormSchema, policyFormValues, type PolicyFormOutput, type PolicyFormValues } from '../policy-form';

const confidenceOptions = [
  { value: '', label: 'Not given' },
  ...(['C', 'M', 'P'] as const).map((c) => ({ value: c, label: confidenceWords[c] })),
];

/** The server names a limit "limits.capacitor.c0g.value"; the form names it "limits.capacitor-c0g.pct". */
function serverPathToField(path: string): string {
  const tj = /^limits\.transistor\.junctionTemp\.(marginC|capC)$/.exec(path);
  if (tj) return `tj.${tj[1]}`;
  const m = /^limits\.(\w+)\.(\w+)\.value$/.exec(path);
  return m ? `limits.${m[1]}-${m[2]}.pct` : path;
}

/**
 * Edits a policy's name, notes and limits. Limits are typed as percentages of the rating
 * and stored as fractions; each keeps its source and confidence, which the designer
 * should change with the figure ("from memory" where the figure is recalled).
 */
export function PolicyForm({ policy, onDone, onCancel }: { policy: StressPolicy; onDone: () => void; onCancel: () => void }) {
  const update = useUpdatePolicy(policy.id);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<PolicyFormValues, unknown, PolicyFormOutput>({ resolver: zodResolver(policyFormSchema), defaultValues: policyFormValues(policy) });

  const onSubmit = handleSubmit((body) => {
    setFormError(null);
    update.mutate(
      { ...body, version: policy.version },
      {
        onSuccess: onDone,
        onError: (error) => {
          if (isStaleVersion(error)) return setFormError(STALE_VERSION_MESSAGE);
          const mapped = isApiError(error) ? new ApiError(error.status, error.code, error.message, error.details.map((d) => ({ ...d, path: serverPathToField(d.path) }))) : error;
          setFormError(applyServerErrors(mapped, setError, ['name', 'notes', ...LIMIT_ROWS.map((r) => `limits.${r.id}.pct` as const), 'tj.marginC', 'tj.capC']));
        },
      },
    );
  });

  const selectClass = 'h-8 rounded-md border border-rule bg-surface px-1.5 text-sm hover:border-muted';
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Limits of ${policy.name}`} className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
        <TextareaField label="Notes" rows={2} error={errors.notes?.message} {...register('notes')} />
      </div>
      <div className="relative overflow-x-auto rounded-md border border-rule">
        <table className="w-full text-sm">
          <thead className="text-xs font-semibold tracking-wide text-muted uppercase">
            <tr className="border-b border-rule">
              <th scope="col" className="px-3 py-2 text-left">
                Limit
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                % of rating
              </th>
              <th scope="col" className="px-3 py-2 text-left">
                Source
              </th>
              <th scope="col" className="px-3 py-2 text-left">
                Confidence
              </th>
            </tr>
          </thead>
          <tbody>
            {LIMIT_ROWS.map((r) => {
              const error = errors.limits?.[r.id]?.pct?.message;
              const name = `${r.groupLabel}: ${r.label}`;
              return (
                <tr key={r.id} className="border-t border-rule/60 align-top">
                  <th scope="row" className="px-3 py-1.5 text-left font-normal">
                    <span className="text-muted">{r.groupLabel}: </span>
                    {r.label}
                  </th>
                  <td className="px-3 py-1.5 text-right">
                    <input
                      aria-label={`${name}, % of rating`}
                      aria-invalid={error ? true : undefined}
                      inputMode="decimal"
                      autoComplete="off"
                      className={`h-8 w-20 rounded-md border bg-surface px-2 text-right text-sm tabular-nums ${error ? 'border-brick' : 'border-rule hover:border-muted'}`}
                      {...register(`limits.${r.id}.pct`)}
                    />
                    {error ? <p className="mt-0.5 text-xs font-medium text-brick">{error}</p> : null}
                  </td>
                  <td className="px-3 py-1.5">
                    <input aria-label={`${name}, source`} autoComplete="off" className="h-8 w-full min-w-48 rounded-md border border-rule bg-surface px-2 text-sm hover:border-muted" {...register(`limits.${r.id}.source`)} />
                  </td>
                  <td className="px-3 py-1.5">
                    <select aria-label={`${name}, confidence`} className={selectClass} {...register(`limits.${r.id}.confidence`)}>
                      {confidenceOptions.map((o) => (
                        <option key={o.value} value={o.value}>
                          {o.label}
                        </option>
                      ))}
                    </select>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <fieldset className="flex flex-col gap-3 rounded-md border border-rule p-4">
        <legend className="px-1 text-sm font-semibold">Junction temperature allowed</legend>
        <p className="text-sm text-muted">Tj max less a margin, and never above the cap when one is set.</p>
        <div className="grid gap-3 sm:grid-cols-4">
          <TextField label="Margin below Tj max (°C)" inputMode="decimal" autoComplete="off" error={errors.tj?.marginC?.message} {...register('tj.marginC')} />
          <TextField label="Cap (°C)" inputMode="decimal" autoComplete="off" hint="Empty: no cap." error={errors.tj?.capC?.message} {...register('tj.capC')} />
          <TextField label="Source" autoComplete="off" {...register('tj.source')} />
          <div className="flex flex-col gap-1">
            <label htmlFor={`tj-confidence-${policy.id}`} className="text-sm font-medium">
              Confidence
            </label>
            <select id={`tj-confidence-${policy.id}`} className={`${selectClass} h-9`} {...register('tj.confidence')}>
              {confidenceOptions.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </select>
          </div>
        </div>
      </fieldset>
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={update.isPending}>
          Cancel
        </Button>
        <Button type="submit" pending={update.isPending}>
          Save limits
        </Button>
      </div>
    </form>
  );
}
