import type { ReactNode } from 'react';
import { STALE_VERSION_MESSAGE } from '../../lib/stale-version';

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

/**
 * The 409 notice of an edit form: someone saved this record meanwhile. "Reload" puts the
 * saved values back in the form and takes their version, so the next save is not stale.
 */
export function StaleVersionAlert({ onReload }: { onReload: () => void }) {
  return (
    <FormAlert>
      {STALE_VERSION_MESSAGE}{' '}
      <button type="button" className="font-medium underline" onClick={onReload}>
        Reload
      </button>
    </FormAlert>
  );
}
