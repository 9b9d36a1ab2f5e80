import type { ReactNode } from 'react';
import { Wordmark } from '../ui/wordmark';

/** The frame of the signed-out screens: the wordmark and one card. */
export function AuthLayout({ title, intro, children, footer }: { title: string; intro?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 py-12">
      <title>{`${title} · Farthing`}</title>
      <Wordmark className="mb-8 text-xl" />
      <main className="w-full max-w-sm">
        <div className="rounded-lg border border-rule bg-surface p-6 shadow-[0_1px_2px_rgba(30,36,48,0.04)]">
          <h1 className="text-xl font-semibold tracking-tight">{title}</h1>
          {intro ? <div className="mt-1 text-sm text-muted">{intro}</div> : null}
          <div className="mt-5">{children}</div>
        </div>
        {footer ? <div className="mt-4 flex flex-col items-center gap-1 text-sm text-muted">{footer}</div> : null}
      </main>
    </div>
  );
}
