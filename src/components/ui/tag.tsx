import type { ReactNode } from 'react';

type Tone = 'neutral' | 'copper' | 'muted' | 'warning' | 'ok';

const tones: Record<Tone, string> = {
  neutral: 'border-rule bg-paper text-ink',
  copper: 'border-copper bg-copper/10 text-copper-dark',
  muted: 'border-rule bg-rule/40 text-muted',
  warning: 'border-brick/40 bg-brick/5 text-brick',
  ok: 'border-verdigris/40 bg-verdigris/5 text-verdigris',
};

/** A short word beside a value ("Expired", "Inactive", "Cheapest landed"): always text, never colour alone. */
export function Tag({ tone = 'neutral', children }: { tone?: Tone; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center rounded border px-1.5 py-0.5 text-xs font-medium whitespace-nowrap ${tones[tone]}`}>
      {children}
    </span>
  );
}
