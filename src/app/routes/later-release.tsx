import type { ReactNode } from 'react';
import { PageHeader } from '../../components/ui/page-header';

/** An area of the product whose screens are not in this release yet: its name and one plain sentence. */
export function LaterReleasePage({ title, children }: { title: string; children: ReactNode }) {
  return (
    <>
      <PageHeader title={title} />
      <p className="max-w-prose rounded-lg border border-rule bg-surface px-5 py-4 text-sm text-muted">{children}</p>
    </>
  );
}
