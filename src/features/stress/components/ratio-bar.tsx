import { formatPercent } from '../../../lib/percent';
import type { StressStatus } from '../api';

/** The bar runs to 100 % of the rating; beyond it, a short overflow zone shows how far over. */
const SCALE = 1.2;
const at = (fraction: number) => `${(Math.max(0, Math.min(fraction, SCALE)) / SCALE) * 100}%`;

const fills: Record<StressStatus, string> = {
  clear: 'bg-verdigris',
  close: 'bg-ochre',
  beyond_policy: 'bg-brick/75',
  over_rating: 'bg-brick',
  needs_data: 'bg-rule',
};

/**
 * A check's ratio of its rating against the policy's limit: the fill is the ratio, the
 * ink tick the limit, the shaded band the last 10 % below the limit (where a check is
 * Close), the end of the track the rating itself; a ratio above the rating runs on into
 * a hatched overflow. The figures are in its accessible name and beside it in words.
 */
export function RatioBar({ ratio, limit, status }: { ratio: number | null; limit: number | null; status: StressStatus }) {
  if (ratio === null) {
    return (
      <div role="img" aria-label="No ratio: data missing" className="h-2.5 w-full rounded-sm border border-dashed border-muted/50" />
    );
  }
  const over = ratio > 1;
  const label = `${formatPercent(ratio)} of rating${limit !== null ? `; policy limit ${formatPercent(limit)}` : ''}${over ? '; over the rating' : ''}`;
  return (
    <div role="img" aria-label={label} title={label} className="relative h-4 w-full">
      {/* The track up to 100 % of the rating. */}
      <div className="absolute top-1 h-2 rounded-l-sm bg-paper ring-1 ring-rule ring-inset" style={{ left: 0, width: at(1) }} />
      {/* The overflow zone beyond the rating. */}
      <div
        className="absolute top-1 h-2 rounded-r-sm"
        style={{ left: at(1), width: `calc(100% - ${at(1)})`, backgroundImage: 'repeating-linear-gradient(135deg, #E3DED4 0 2px, transparent 2px 4px)' }}
      />
      {limit !== null ? (
        <div className="absolute top-1 h-2 bg-ochre/25" style={{ left: at(0.9 * limit), width: `calc(${at(limit)} - ${at(0.9 * limit)})` }} />
      ) : null}
      <div className={`absolute top-1 h-2 rounded-l-sm ${fills[status]}`} style={{ left: 0, width: at(Math.min(ratio, 1)) }} />
      {over ? (
        <div
          className="absolute top-1 h-2 rounded-r-sm"
          style={{ left: at(1), width: `calc(${at(ratio)} - ${at(1)})`, backgroundImage: 'repeating-linear-gradient(135deg, #B23A26 0 2px, #F3D9D3 2px 4px)' }}
        />
      ) : null}
      {/* The rating (100 %). */}
      <div className="absolute top-0.5 h-3 w-px bg-muted" style={{ left: at(1) }} />
      {limit !== null ? <div className="absolute top-0 h-4 w-0.5 -translate-x-1/2 bg-ink" style={{ left: at(limit) }} /> : null}
      {ratio > SCALE ? (
        <span aria-hidden="true" className="absolute -top-0.5 right-0 text-[10px] leading-none font-bold text-brick">
          »
        </span>
      ) : null}
    </div>
  );
}
