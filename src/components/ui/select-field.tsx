import { useId, type ComponentProps } from 'react';
import { fieldMessage } from '../../lib/form-errors';

export type SelectOption = { value: string; label: string };

export type SelectFieldProps = Omit<ComponentProps<'select'>, 'children'> & {
  label: string;
  options: readonly SelectOption[];
  error?: string;
  /** Keeps the label for screen readers only, for a select inside a table row. */
  hideLabel?: boolean;
};

export function SelectField({
  label,
  options,
  error,
  hideLabel = false,
  id,
  className = '',
  ...selectProps
}: SelectFieldProps) {
  const autoId = useId();
  const selectId = id ?? autoId;
  const errorId = `${selectId}-error`;

  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={selectId} className={hideLabel ? 'sr-only' : 'text-sm font-medium text-ink'}>
        {label}
      </label>
      <select
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        className={[
          'rounded-md border bg-surface text-sm text-ink disabled:opacity-60',
          hideLabel ? 'h-7 px-1.5' : 'h-9 px-2',
          error ? 'border-brick' : 'border-rule hover:border-muted',
        ].join(' ')}
        {...selectProps}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      {error ? (
        <p id={errorId} className="text-xs font-medium text-brick">
          {fieldMessage(label, error)}
        </p>
      ) : null}
    </div>
  );
}
