import type { ReactNode } from 'react';
import { CautionNotice } from '../../../components/ui/caution-notice';

/** One helper: its heading, what it works out, the form and, once worked out, the result. */
export function HelperSection({ id, title, intro, children }: { id?: string; title: string; intro: ReactNode; children: ReactNode }) {
  const headingId = `${id ?? title.toLowerCase().replace(/\W+/g, '-')}-title`;
  return (
    <section id={id} aria-labelledby={headingId} className="flex scroll-mt-6 flex-col gap-4 rounded-lg border border-rule bg-surface p-5">
      <div>
        <h2 id={headingId} className="text-lg font-semibold">
          {title}
        </h2>
        <p className="mt-1 max-w-prose text-sm text-muted">{intro}</p>
      </div>
      {children}
    </section>
  );
}

export type Figure = { label: string; value: ReactNode; hint?: string };

/** A result's figures as a definition list, numbers in tabular figures. */
export function Figures({ figures }: { figures: Figure[] }) {
  return (
    <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 gap-y-1.5 text-sm sm:grid-cols-[minmax(0,14rem)_auto_minmax(0,14rem)_auto]">
      {figures.map((f) => (
        <div key={f.label} className="contents">
          <dt className="text-muted" title={f.hint}>
            {f.label}
          </dt>
          <dd className="text-right font-medium text-ink tabular-nums">{f.value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The formula the server used, step by step, as it sent it. */
export function FormulaText({ formula }: { formula: string }) {
  return (
    <div>
      <h3 className="text-xs font-semibold tracking-wide text-muted uppercase">How it was worked out</h3>
      <pre className="mt-1 overflow-x-auto rounded-md border border-rule bg-paper px-3 py-2 font-sans text-xs leading-relaxed whitespace-pre-wrap text-ink tabular-nums">
        {formula}
      </pre>
    </div>
  );
}

/** The result block: figures, any warnings, the formula, the caution, and what the caller adds (writing into lines). */
export function HelperResult({
  label,
  figures,
  status,
  warnings = [],
  formula,
  caution,
  children,
}: {
  label: string;
  figures: Figure[];
  status?: ReactNode;
  warnings?: string[];
  formula: string;
  caution: string;
  children?: ReactNode;
}) {
  return (
    <div role="region" aria-label={label} className="flex flex-col gap-3 border-t border-rule pt-4">
      {status ? <div className="flex flex-wrap items-center gap-2 text-sm">{status}</div> : null}
      <Figures figures={figures} />
      {warnings.map((w) => (
        <p key={w} className="rounded-md border border-brick/40 bg-brick/5 px-3 py-2 text-sm text-brick">
          {w}
        </p>
      ))}
      {children}
      <FormulaText formula={formula} />
      <CautionNotice>{caution}</CautionNotice>
    </div>
  );
}
