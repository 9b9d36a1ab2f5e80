import { useEffect, useId, useRef, type ReactNode } from 'react';

/**
 * A form that takes the place of a list while it is open (a new part, a new supplier,
 * an import): one task on screen, no second set of look-alike fields behind a modal.
 * The heading takes focus on opening, so keyboard and screen-reader users land in it.
 */
export function FormPanel({ title, description, children }: { title: string; description?: ReactNode; children: ReactNode }) {
  const headingId = useId();
  const headingRef = useRef<HTMLHeadingElement>(null);
  useEffect(() => headingRef.current?.focus(), []);
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4 rounded-lg border border-rule bg-surface p-6">
      <div>
        <h2 id={headingId} ref={headingRef} tabIndex={-1} className="text-lg font-semibold focus:outline-none">
          {title}
        </h2>
        {description ? <p className="mt-1 max-w-prose text-sm text-muted">{description}</p> : null}
      </div>
      {children}
    </section>
  );
}
