import type { CurvePoint } from '../api';
import { formatCount, formatPerUnit, formatTotal } from '../display';
import { GapFigure } from './gap-figure';

/** The volume curve's numbers: one row per build quantity. */
export function VolumeCurveTable({ points, currency, plannedQty }: { points: CurvePoint[]; currency: string; plannedQty: number }) {
  const th = 'border-b border-rule px-3 py-2 text-xs font-semibold tracking-wide text-muted uppercase';
  return (
    <div className="overflow-auto rounded-lg border border-rule bg-surface">
      <table aria-label="Volume curve" className="w-full border-collapse text-sm">
        <thead>
          <tr>
            <th scope="col" className={`${th} text-right`}>Build quantity</th>
            <th scope="col" className={`${th} text-right`}>Landed / unit ({currency})</th>
            <th scope="col" className={`${th} text-right`}>Without one-time</th>
            <th scope="col" className={`${th} text-right`}>Goods total</th>
            <th scope="col" className={`${th} text-right`}>Excess bought</th>
            <th scope="col" className={`${th} text-right`}>Landed total</th>
            <th scope="col" className={`${th} text-right`}>Gap to target</th>
            <th scope="col" className={`${th} text-right`}>Left out</th>
          </tr>
        </thead>
        <tbody>
          {points.map((p) => (
            <tr key={p.qty} className={`border-b border-rule/70 last:border-b-0 ${p.qty === plannedQty ? 'bg-copper/5 font-medium' : ''}`}>
              <th scope="row" className="num px-3 py-1.5 font-normal">
                {formatCount(p.qty)}
                {p.qty === plannedQty ? <span className="ml-1 text-xs text-muted">(planned)</span> : null}
              </th>
              <td className="num px-3 py-1.5 font-medium">{formatPerUnit(p.totals.landedPerUnit)}</td>
              <td className="num px-3 py-1.5">{formatPerUnit(p.totals.landedPerUnitExclOneTime)}</td>
              <td className="num px-3 py-1.5">{formatTotal(p.totals.goods, currency)}</td>
              <td className="num px-3 py-1.5">{formatTotal(p.totals.excessValue, currency)}</td>
              <td className="num px-3 py-1.5">{formatTotal(p.totals.landedTotal, currency)}</td>
              <td className="num px-3 py-1.5">
                {p.totals.targetUnitCost ? <GapFigure gap={p.totals.gapToTarget} /> : <span className="text-muted">—</span>}
              </td>
              <td className={`num px-3 py-1.5 ${p.leftOut.count ? 'font-medium text-brick' : 'text-muted'}`}>{p.leftOut.count}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
