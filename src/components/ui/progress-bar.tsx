/**
 * How far an upload has gone. With an unknown total it still says in words that
 * something is moving, so the bar is never the only signal.
 */
export function ProgressBar({ label, percent }: { label: string; percent: number | null }) {
  return (
    <div className="flex flex-col gap-1">
      <div className="flex justify-between text-sm">
        <span>{label}</span>
        <span className="tabular-nums text-muted">{percent === null ? 'Sending…' : `${percent}%`}</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent ?? undefined}
        className="h-2 overflow-hidden rounded-full bg-rule"
      >
        <div
          className={`h-full bg-copper transition-[width] ${percent === null ? 'w-1/3 animate-pulse motion-reduce:animate-none' : ''}`}
          style={percent === null ? undefined : { width: `${percent}%` }}
        />
      </div>
    </div>
  );
}
