import type { ReactNode } from 'react';

type Tone = 'error' | 'info' | 'success';

const tones: Record<Tone, string> = {
  error: 'border-brick/40 bg-brick/5 text-brick',
  info: 'border-slate-info/30 bg-slate-info/5 text-slate-info',
  success: 'border-verdigris/40 bg-verdigris/5 text-verdigris',
};

/**
 * A message above or below a form. Errors are announced at once (role="alert");
 * other notices politely (role="status").
 */
export function FormAlert({ tone = 'error', children }: { tone?: Tone; children: ReactNode }) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-md border px-3 py-2 text-sm ${tones[tone]}`}>
      {children}
    </div>
  );
}
