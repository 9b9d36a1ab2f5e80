import type { ReactNode } from 'react';

/**
 * The safety caution shown beside every stress result and circuit helper: a calm
 * notice (slate, not an alarm) with a warning shape and the word "Caution", so it
 * reads as guidance that always applies rather than as an error of this screen.
 */
export function CautionNotice({ children, className = '' }: { children: ReactNode; className?: string }) {
  return (
    <aside aria-label="Caution" className={`flex items-start gap-3 rounded-md border border-rule border-l-4 border-l-slate-info bg-surface px-3 py-2 text-sm text-ink ${className}`}>
      <svg aria-hidden="true" viewBox="0 0 16 16" className="mt-0.5 size-4 shrink-0">
        <path d="M8 1.5 15 14.5H1Z" fill="#3D5A80" stroke="#3D5A80" strokeWidth="1" strokeLinejoin="round" />
        <path d="M8 6v4" stroke="#FFFFFF" strokeWidth="1.6" strokeLinecap="round" />
        <circle cx="8" cy="12.2" r="0.9" fill="#FFFFFF" />
      </svg>
      <p>
        <span className="font-semibold text-slate-info">Caution. </span>
        {children}
      </p>
    </aside>
  );
}
