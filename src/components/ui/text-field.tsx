import { useId, type ComponentProps } from 'react';
import { fieldMessage } from '../../lib/form-errors';

export type TextFieldProps = ComponentProps<'input'> & {
  label: string;
  /** The field's error message, e.g. `formState.errors.email?.message`. */
  error?: string;
  hint?: string;
};

/**
 * A labelled input for react-hook-form: spread `register('name')` into it. The error is
 * tied to the input (aria-describedby) so a screen reader hears it with the field.
 */
export function TextField({ label, error, hint, id, className = '', ...inputProps }: TextFieldProps) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;

  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="text-sm font-medium text-ink">
        {label}
      </label>
      <input
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={[
          'h-9 rounded-md border bg-surface px-3 text-sm text-ink placeholder:text-muted/70',
          'read-only:bg-paper',
          error ? 'border-brick' : 'border-rule hover:border-muted',
        ].join(' ')}
        {...inputProps}
      />
      {hint ? (
        <p id={hintId} className="text-xs text-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} className="text-xs font-medium text-brick">
          {fieldMessage(label, error)}
        </p>
      ) : null}
    </div>
  );
}
