import { useId } from 'react';
import { useWatch, type Control, type UseFormRegister } from 'react-hook-form';
import { dielectrics } from '../../../shared/schemas/parts';
import { SelectField } from '../../../components/ui/select-field';
import { fieldMessage } from '../../../lib/form-errors';
import type { PartFormOutput, PartFormValues } from '../part-form';
import { dielectricLabels, previewRating, type RatingDef } from '../ratings';

const dielectricOptions = [
  { value: '', label: 'Not stated' },
  ...dielectrics.map((value) => ({ value, label: dielectricLabels[value] })),
];

/**
 * One rating input. It takes the trade's notations and says beside it, as you type,
 * what the value reads as ("= 4.7 kΩ"), so "4K7" and "4.7M" cannot be confused unseen.
 */
export function RatingField({
  def,
  register,
  control,
  error,
}: {
  def: RatingDef;
  register: UseFormRegister<PartFormValues>;
  control: Control<PartFormValues, unknown, PartFormOutput>;
  error?: string;
}) {
  const name = `ratings.${def.key}` as const;
  const text = useWatch({ control, name }) ?? '';
  const inputId = useId();

  if (def.kind === 'dielectric') {
    return <SelectField label={def.label} options={dielectricOptions} error={error} {...register(name)} />;
  }

  const preview = previewRating(def, text);
  const previewId = `${inputId}-preview`;
  const errorId = `${inputId}-error`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className="text-sm font-medium text-ink">
        {def.label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={inputId}
          autoComplete="off"
          spellCheck={false}
          placeholder={def.placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={[previewId, error ? errorId : null].filter(Boolean).join(' ')}
          className={`h-9 w-32 rounded-md border bg-surface px-3 text-sm text-ink tabular-nums placeholder:text-muted/60 ${error ? 'border-brick' : 'border-rule hover:border-muted'}`}
          {...register(name)}
        />
        <output id={previewId} htmlFor={inputId} aria-live="polite" className="text-sm tabular-nums">
          {preview === null ? null : preview.ok ? (
            <span className="text-ink">= {preview.shown}</span>
          ) : (
            <span className="text-muted">not read yet</span>
          )}
        </output>
      </div>
      {error ? (
        <p id={errorId} className="text-xs font-medium text-brick">
          {fieldMessage(def.label, error)}
        </p>
      ) : null}
    </div>
  );
}
