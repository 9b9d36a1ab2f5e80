import type { ReactNode } from 'react';

/** What a page or table shows when there is nothing in it yet: plain words, no fake rows. */
export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-rule bg-surface px-6 py-10 text-center">
      <p className="text-base font-medium text-ink">{title}</p>
      {children ? <div className="mx-auto mt-1 max-w-prose text-sm text-muted">{children}</div> : null}
      {action ? <div className="mt-4 flex justify-center">{action}</div> : null}
    </div>
  );
}
