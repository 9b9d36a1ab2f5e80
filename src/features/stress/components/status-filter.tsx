import { STRESS_STATUSES, StatusShape, stressStatusLabels, stressSummaryKeys, type StressTallyCounts } from '../../../components/ui/stress-status';
import type { StressStatus } from '../api';

/**
 * Toggle buttons to show one status at a time, each with its count of lines; "All"
 * shows every line. The choice lives in the address (?status=), so it survives a reload.
 */
export function StatusFilter({ counts, value, onChange }: { counts: StressTallyCounts; value: StressStatus | null; onChange: (status: StressStatus | null) => void }) {
  const total = STRESS_STATUSES.reduce((n, s) => n + counts[stressSummaryKeys[s]], 0);
  const base = 'inline-flex h-8 items-center gap-1.5 rounded-md border px-2.5 text-sm whitespace-nowrap';
  const look = (pressed: boolean) => (pressed ? 'border-copper bg-copper/10 font-medium text-ink' : 'border-rule bg-surface text-muted hover:border-muted hover:text-ink');
  return (
    <div role="group" aria-label="Show lines by status" className="flex flex-wrap gap-1.5">
      <button type="button" aria-pressed={value === null} onClick={() => onChange(null)} className={`${base} ${look(value === null)}`}>
        All <span className="tabular-nums">{total}</span>
      </button>
      {STRESS_STATUSES.map((status) => {
        const count = counts[stressSummaryKeys[status]];
        return (
          <button key={status} type="button" aria-pressed={value === status} onClick={() => onChange(value === status ? null : status)} className={`${base} ${look(value === status)}`}>
            <StatusShape status={status} />
            {stressStatusLabels[status]} <span className="tabular-nums">{count}</span>
          </button>
        );
      })}
    </div>
  );
}
