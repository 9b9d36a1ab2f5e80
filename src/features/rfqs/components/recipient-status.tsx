import type { RecipientStatus } from '../api';

const looks: Record<RecipientStatus, { label: string; className: string; shape: 'dot' | 'ring' | 'check' | 'dash' | 'triangle' }> = {
  sent: { label: 'Sent', className: 'border-slate-info/30 bg-slate-info/5 text-slate-info', shape: 'ring' },
  opened: { label: 'Opened', className: 'border-slate-info/40 bg-slate-info/10 text-slate-info', shape: 'dot' },
  answered: { label: 'Answered', className: 'border-verdigris/40 bg-verdigris/5 text-verdigris', shape: 'check' },
  declined: { label: 'Declined', className: 'border-rule bg-rule/40 text-muted', shape: 'dash' },
  overdue: { label: 'Overdue', className: 'border-brick/40 bg-brick/5 text-brick', shape: 'triangle' },
};

function Shape({ shape }: { shape: (typeof looks)[RecipientStatus]['shape'] }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3 shrink-0">
      {shape === 'ring' ? <circle cx="6" cy="6" r="4.2" fill="none" stroke="currentColor" strokeWidth="1.5" /> : null}
      {shape === 'dot' ? <circle cx="6" cy="6" r="4.5" fill="currentColor" /> : null}
      {shape === 'check' ? <path d="M2 6.5 5 9l5-6" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" /> : null}
      {shape === 'dash' ? <path d="M2.5 6h7" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" /> : null}
      {shape === 'triangle' ? <path d="M6 1.5 11 10.5H1z" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinejoin="round" /> : null}
    </svg>
  );
}

/** A supplier's progress on a request: a shape and the word, never colour alone. */
export function RecipientStatusBadge({ status }: { status: RecipientStatus }) {
  const look = looks[status];
  return (
    <span className={`inline-flex items-center gap-1.5 rounded border px-1.5 py-0.5 text-xs font-medium whitespace-nowrap ${look.className}`}>
      <Shape shape={look.shape} />
      {look.label}
    </span>
  );
}
