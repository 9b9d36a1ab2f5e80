import { compareDecimal, formatDecimal, trimDecimal } from '../../../lib/money';
import type { ShelfLadder } from '../api';
import { describeGap, formatCount, formatPerUnit, rungLabels, subtractDecimal } from '../display';

/** What each rung takes off the one above it, in words. */
function takenOffBy(ladder: ShelfLadder, name: string): string {
  const s = ladder.shelf;
  switch (name) {
    case 'net_of_vat':
      return `VAT at ${trimDecimal(s.vatPct)} %`;
    case 'retailer_buying_price':
      return `retailer margin of ${trimDecimal(s.retailerMarginPct)} %`;
    case 'importer_net':
      return `importer margin of ${trimDecimal(s.importerMarginPct)} %`;
    case 'allowed_landed':
      return 'freight to store per unit';
    default:
      return '';
  }
}

/**
 * From the shelf price down to the allowed landed cost, one rung at a time, each with
 * what it took off; then the allowed landed cost beside the computed one and the gap.
 * Bar lengths are for the eye only; every rung carries its value.
 */
export function ShelfLadderView({ ladder }: { ladder: ShelfLadder }) {
  const top = ladder.rungs[0]?.value ?? '0';
  const topNumber = Number(top) || 1;
  const gap = describeGap(ladder.gap);
  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_18rem]">
      <ol aria-label="Shelf-price ladder" className="flex flex-col gap-2 rounded-lg border border-rule bg-surface p-4">
        {ladder.rungs.map((rung, i) => {
          const previous = ladder.rungs[i - 1];
          const off = previous ? subtractDecimal(previous.value, rung.value) : null;
          const width = Math.max(2, Math.min(100, (Number(rung.value) / topNumber) * 100));
          const last = rung.name === 'allowed_landed';
          return (
            <li key={rung.name} className="flex flex-col gap-1">
              <div className="flex items-baseline justify-between gap-3 text-sm">
                <span className={last ? 'font-semibold' : ''}>{rungLabels[rung.name] ?? rung.name}</span>
                <span className={`tabular-nums ${last ? 'font-semibold' : ''}`}>
                  {formatPerUnit(rung.value)} {ladder.currency}
                </span>
              </div>
              <div className="h-3 rounded-sm bg-rule/60">
                <div className={`h-3 rounded-sm ${last ? 'bg-copper' : 'bg-slate-info/70'}`} style={{ width: `${compareDecimal(rung.value, '0') > 0 ? width : 0}%` }} />
              </div>
              {off ? (
                <p className="text-xs text-muted">
                  − {formatPerUnit(off)} {ladder.currency} taken off for the {takenOffBy(ladder, rung.name)}
                </p>
              ) : null}
            </li>
          );
        })}
      </ol>
      <section aria-label="Allowed against computed landed cost" className="flex flex-col gap-3 rounded-lg border border-rule bg-surface p-4 text-sm">
        <div>
          <p className="text-muted">Allowed landed cost</p>
          <p className="text-xl font-semibold tabular-nums">
            {formatPerUnit(ladder.allowedLandedCost)} {ladder.currency}
          </p>
          <p className="text-xs text-muted">{formatDecimal(ladder.allowedSharePct, 1)} % of the shelf price</p>
        </div>
        <div>
          <p className="text-muted">Computed landed cost per unit</p>
          <p className="text-xl font-semibold tabular-nums">
            {ladder.landedPerUnit ? `${formatPerUnit(ladder.landedPerUnit)} ${ladder.currency}` : '—'}
          </p>
          <p className="text-xs text-muted">at {formatCount(ladder.qty)} units</p>
        </div>
        <p className={`rounded-md border px-3 py-2 ${gap?.side === 'over' ? 'border-brick/40 bg-brick/5 text-brick' : 'border-verdigris/40 bg-verdigris/5 text-verdigris'}`}>
          {!gap
            ? 'No computed landed cost to compare yet.'
            : gap.side === 'on'
              ? 'The landed cost is exactly what the shelf price allows.'
              : gap.side === 'over'
                ? `Over the allowed landed cost by ${gap.amount} ${ladder.currency} per unit: the product costs too much for this shelf price.`
                : `Under the allowed landed cost by ${gap.amount} ${ladder.currency} per unit: there is room at this shelf price.`}
        </p>
        {ladder.leftOut > 0 ? (
          <p className="text-xs font-medium text-brick">
            {ladder.leftOut} line{ladder.leftOut === 1 ? ' is' : 's are'} left out of the computed landed cost, so it is too low.
          </p>
        ) : null}
      </section>
    </div>
  );
}
