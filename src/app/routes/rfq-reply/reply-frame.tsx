import type { ReactNode } from 'react';
import { Wordmark } from '../../../components/ui/wordmark';

/**
 * The frame of the supplier's page: outside the signed-in app, no navigation, narrow
 * enough to read on a phone. The supplier has no account; the link is the key.
 */
export function ReplyFrame({ title, children, footer }: { title: string; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <title>{`${title} · Farthing`}</title>
      <header className="border-b border-rule bg-surface">
        <div className="mx-auto flex w-full max-w-3xl items-center justify-between gap-3 px-4 py-3">
          <Wordmark />
          <span className="text-xs font-medium tracking-wide text-muted uppercase">Request for quotation</span>
        </div>
      </header>
      <main className="mx-auto flex w-full max-w-3xl flex-1 flex-col gap-6 px-4 py-6">{children}</main>
      <footer className="mx-auto w-full max-w-3xl px-4 pt-2 pb-8 text-xs text-muted">
        {footer ?? 'Farthing carries requests for quotation between buyers and their suppliers. No account is needed to answer.'}
      </footer>
    </div>
  );
}
