import { describeGap } from '../display';

/**
 * A gap to a target or an allowed cost: the amount and "over" or "under" in words, so
 * neither a minus sign nor a colour carries the meaning alone.
 */
export function GapFigure({ gap, currency, what = 'target' }: { gap: string | null | undefined; currency?: string; what?: string }) {
  const described = describeGap(gap);
  if (!described) return <span className="text-muted">No {what}</span>;
  if (described.side === 'on') return <span className="text-ink">On {what}</span>;
  const over = described.side === 'over';
  return (
    <span className={`whitespace-nowrap ${over ? 'font-medium text-brick' : 'text-verdigris'}`}>
      <span className="tabular-nums">{described.amount}</span>
      {currency ? ` ${currency}` : ''} {over ? 'over' : 'under'}
      <span className="sr-only"> {what}</span>
    </span>
  );
}
