/**
 * The stress statuses in Farthing's own visual language: each has a shape, a colour and
 * a word, and the word is always shown beside the shape, so neither colour nor shape
 * carries the meaning alone. Shared by the BOM list, the BOM page, the stress check,
 * the circuit helpers and the policies.
 */

export const STRESS_STATUSES = ['clear', 'close', 'beyond_policy', 'over_rating', 'needs_data'] as const;
export type StressStatusName = (typeof STRESS_STATUSES)[number];

export const stressStatusLabels: Record<StressStatusName, string> = {
  clear: 'Clear',
  close: 'Close',
  beyond_policy: 'Beyond policy',
  over_rating: 'Over rating',
  needs_data: 'Needs data',
};

/** The tally's field for each status, as the API names it. */
export const stressSummaryKeys = {
  clear: 'clear',
  close: 'close',
  beyond_policy: 'beyondPolicy',
  over_rating: 'overRating',
  needs_data: 'needsData',
} as const satisfies Record<StressStatusName, string>;

export type StressTallyCounts = { clear: number; close: number; beyondPolicy: number; overRating: number; needsData: number };

const VERDIGRIS = '#2E7D6F';
const OCHRE = '#C08A1E';
const BRICK = '#B23A26';
const GREY = '#5B6270';

// Word colours: ochre text is too faint on white to read, so Close keeps ink and lets its shape speak.
const wordClasses: Record<StressStatusName, string> = {
  clear: 'text-verdigris',
  close: 'text-ink',
  beyond_policy: 'text-brick',
  over_rating: 'text-brick font-semibold',
  needs_data: 'text-muted',
};

/** The shape alone; decorative, so whoever shows it also shows the word. */
export function StatusShape({ status, className = 'size-3' }: { status: StressStatusName; className?: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 12 12" className={`shrink-0 ${className}`} data-status-shape={status}>
      {status === 'clear' ? <circle cx="6" cy="6" r="5" fill={VERDIGRIS} /> : null}
      {status === 'close' ? (
        <>
          <circle cx="6" cy="6" r="4.75" fill="none" stroke={OCHRE} strokeWidth="1.5" />
          <path d="M6 1.25 A4.75 4.75 0 0 0 6 10.75 Z" fill={OCHRE} />
        </>
      ) : null}
      {status === 'beyond_policy' ? <path d="M6 1.4 11 10.6H1Z" fill="none" stroke={BRICK} strokeWidth="1.5" strokeLinejoin="round" /> : null}
      {status === 'over_rating' ? <rect x="1.25" y="1.25" width="9.5" height="9.5" fill={BRICK} /> : null}
      {status === 'needs_data' ? <circle cx="6" cy="6" r="4.75" fill="none" stroke={GREY} strokeWidth="1.5" /> : null}
    </svg>
  );
}

/** Shape and word, e.g. a triangle and "Beyond policy". */
export function StatusBadge({ status, className = '' }: { status: StressStatusName; className?: string }) {
  return (
    <span className={`inline-flex items-center gap-1.5 text-sm font-medium whitespace-nowrap ${wordClasses[status]} ${className}`}>
      <StatusShape status={status} />
      {stressStatusLabels[status]}
    </span>
  );
}

/**
 * The five counts of a stress check (lines, not checks). `inline` shows only the
 * statuses that occur, for a table cell; `list` shows all five in rows, for a panel.
 */
export function StressTally({ counts, layout = 'inline' }: { counts: StressTallyCounts; layout?: 'inline' | 'list' }) {
  const rows = STRESS_STATUSES.map((status) => ({ status, count: counts[stressSummaryKeys[status]] }));
  if (layout === 'list') {
    return (
      <ul className="flex flex-col gap-1">
        {rows.map(({ status, count }) => (
          <li key={status} className="flex items-center justify-between gap-2">
            <StatusBadge status={status} className={count === 0 ? 'opacity-70' : ''} />
            <span className={`tabular-nums ${count === 0 ? 'text-muted' : 'font-medium text-ink'}`}>{count}</span>
          </li>
        ))}
      </ul>
    );
  }
  const shown = rows.filter((r) => r.count > 0);
  if (shown.length === 0) return <span className="text-muted">No rated lines</span>;
  return (
    <span className="inline-flex flex-wrap items-center gap-x-3 gap-y-0.5">
      {shown.map(({ status, count }) => (
        <span key={status} className={`inline-flex items-center gap-1 text-xs whitespace-nowrap ${wordClasses[status]}`}>
          <StatusShape status={status} className="size-2.5" />
          <span className="tabular-nums">{count}</span>
          {stressStatusLabels[status]}
        </span>
      ))}
    </span>
  );
}
