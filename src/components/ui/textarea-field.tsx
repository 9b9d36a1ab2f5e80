import { useId, type ComponentProps } from 'react';
import { fieldMessage } from '../../lib/form-errors';

export type TextareaFieldProps = ComponentProps<'textarea'> & { label: string; error?: string; hint?: string };

/** A labelled multi-line input for react-hook-form, like TextField. */
export function TextareaField({ label, error, hint, id, className = '', rows = 3, ...props }: TextareaFieldProps) {
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
      <textarea
        id={inputId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={[
          'rounded-md border bg-surface px-3 py-2 text-sm text-ink placeholder:text-muted/70',
          error ? 'border-brick' : 'border-rule hover:border-muted',
        ].join(' ')}
        {...props}
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
