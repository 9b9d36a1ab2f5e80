import type { CostRoll } from '../../api';
import { formatPerUnit, formatTotal, leftOutText, warningText } from '../../display';
import { GapFigure } from '../gap-figure';

const adders = [
  ['goods', 'Goods'],
  ['excessValue', 'of which bought beyond need (excess)'],
  ['origin', 'Origin handling'],
  ['freight', 'Freight'],
  ['insurance', 'Insurance'],
  ['duty', 'Duty'],
  ['fees', 'Fees'],
  ['destination', 'Destination handling'],
  ['assembly', 'Assembly'],
  ['oneTimeTotal', 'One-time costs (whole amount)'],
  ['landedTotal', 'Landed total'],
] as const;

/** The totals of a cost roll, the per-unit figures, the gap to target and the lines left out. */
export function CostTotals({ cost, refDesOf }: { cost: CostRoll; refDesOf: (lineId: string) => string | null }) {
  const t = cost.totals;
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <section aria-labelledby="totals-build" className="rounded-lg border border-rule bg-surface p-4">
        <h3 id="totals-build" className="text-sm font-semibold">
          For the build of {cost.qty.toLocaleString('en-GB')} units ({cost.currency})
        </h3>
        <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
          {adders.map(([key, label]) => (
            <div key={key} className={`contents ${key === 'landedTotal' ? 'font-semibold' : ''}`}>
              <dt className={key === 'excessValue' ? 'pl-3 text-muted' : key === 'landedTotal' ? 'border-t border-rule pt-1' : 'text-muted'}>{label}</dt>
              <dd className={`text-right tabular-nums ${key === 'landedTotal' ? 'border-t border-rule pt-1' : ''}`}>{formatTotal(t[key], cost.currency)}</dd>
            </div>
          ))}
        </dl>
      </section>
      <section aria-labelledby="totals-unit" className="rounded-lg border border-rule bg-surface p-4">
        <h3 id="totals-unit" className="text-sm font-semibold">
          Per finished unit ({cost.currency})
        </h3>
        <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
          <dt className="text-muted">Assembly per unit</dt>
          <dd className="text-right tabular-nums">{formatPerUnit(t.assemblyPerUnit)}</dd>
          <dt className="text-muted">Cost lines per unit</dt>
          <dd className="text-right tabular-nums">{formatPerUnit(t.costLinesPerUnit)}</dd>
          <dt className="text-muted">One-time costs per unit</dt>
          <dd className="text-right tabular-nums">{formatPerUnit(t.oneTimePerUnit)}</dd>
          <dt className="text-muted">Landed per unit without one-time costs</dt>
          <dd className="text-right tabular-nums">{formatPerUnit(t.landedPerUnitExclOneTime)}</dd>
          <dt className="border-t border-rule pt-1 font-semibold">Landed cost per unit</dt>
          <dd className="border-t border-rule pt-1 text-right text-lg font-semibold tabular-nums">{formatPerUnit(t.landedPerUnit)}</dd>
          <dt className="text-muted">Target</dt>
          <dd className="text-right tabular-nums">{t.targetUnitCost ? formatPerUnit(t.targetUnitCost) : '—'}</dd>
          <dt className="text-muted">Gap to target</dt>
          <dd className="text-right">
            <GapFigure gap={t.gapToTarget} currency={cost.currency} />
          </dd>
        </dl>
      </section>
      <section aria-labelledby="left-out" className="rounded-lg border border-rule bg-surface p-4 md:col-span-2">
        <h3 id="left-out" className="text-sm font-semibold">
          Lines left out of the totals: {cost.leftOut.count}
        </h3>
        {cost.leftOut.count === 0 ? (
          <p className="mt-1 text-sm text-muted">Every line that is bought is in the totals.</p>
        ) : (
          <>
            <p className="mt-1 text-sm text-muted">These lines add nothing to any total until the reason is fixed; the landed cost above is too low by their share.</p>
            <ul className="mt-2 flex flex-col gap-1 text-sm">
              {cost.leftOut.lines.map((line) => (
                <li key={line.lineId}>
                  <span className="font-medium">{line.refDes || refDesOf(line.lineId) || `Line ${line.lineId}`}</span>: {leftOutText(line.reason)}
                  {line.detail ? <span className="text-muted"> ({line.detail})</span> : null}
                </li>
              ))}
            </ul>
          </>
        )}
        {cost.warnings.filter((w) => w.code !== 'lines_left_out').length ? (
          <ul className="mt-3 flex flex-col gap-1 text-sm text-copper-dark">
            {cost.warnings
              .filter((w) => w.code !== 'lines_left_out')
              .map((w) => (
                <li key={`${w.code}-${w.detail ?? ''}`}>
                  {warningText(w.code)}
                  {w.detail ? <span className="text-muted"> ({w.detail})</span> : null}
                </li>
              ))}
          </ul>
        ) : null}
      </section>
    </div>
  );
}
