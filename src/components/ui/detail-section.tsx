import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

/** A titled section of a record's page (part, supplier), with an optional action beside the title. */
export function DetailSection({ id, title, action, children }: { id: string; title: string; action?: ReactNode; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <div className="flex items-center justify-between gap-3">
        <h2 id={id} className="text-lg font-semibold">
          {title}
        </h2>
        {action}
      </div>
      {children}
    </section>
  );
}

/** "← All parts" under a record page's header: back to the list it came from. */
export function BackToList({ to, children }: { to: string; children: ReactNode }) {
  return (
    <p className="-mt-3 mb-6 text-sm">
      <Link to={to} className="text-muted underline-offset-2 hover:text-ink hover:underline">
        ← {children}
      </Link>
    </p>
  );
}
