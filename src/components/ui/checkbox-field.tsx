import { useId, type ComponentProps } from 'react';

/** A labelled checkbox for react-hook-form; the hint says what ticking it means. */
export function CheckboxField({ label, hint, id, className = '', ...props }: ComponentProps<'input'> & { label: string; hint?: string }) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = `${inputId}-hint`;
  return (
    <div className={`flex items-start gap-2 ${className}`}>
      <input
        id={inputId}
        type="checkbox"
        aria-describedby={hint ? hintId : undefined}
        className="mt-0.5 size-4 accent-copper"
        {...props}
      />
      <div className="flex flex-col">
        <label htmlFor={inputId} className="text-sm font-medium text-ink">
          {label}
        </label>
        {hint ? (
          <p id={hintId} className="text-xs text-muted">
            {hint}
          </p>
        ) : null}
      </div>
    </div>
  );
}
