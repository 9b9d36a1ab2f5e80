import { useState } from 'react';
import { Link } from 'react-router-dom';
import { formatValue, type Quantity } from '../../../shared/units';
import { formatDateTime } from '../../../lib/format';
import { formatPercent } from '../../../lib/percent';
import { Button } from '../../../components/ui/button';
import { StatusBadge } from '../../../components/ui/stress-status';
import type { CheckResult, StressLine, StressUnit } from '../api';
import type { LineRef, OperatingField } from '../line-ref';
import { checkLabel, describeMissing, isPassing } from '../words';
import { FormulaPopover } from './formula-popover';
import { OperatingPointForm } from './operating-point-form';
import { RatioBar } from './ratio-bar';

const unitQuantity: Record<StressUnit, Quantity> = { V: 'voltage', A: 'current', W: 'power', '°C': 'temperature' };

// Temperatures to four figures: a junction at 144.25 °C should not read as 144 °C beside a 150 °C maximum.
const show = (value: number | null, unit: StressUnit) => (value === null ? '—' : formatValue(value, unitQuantity[unit], { digits: unit === '°C' ? 4 : 3 }));

const categoryWords: Record<string, string> = { resistor: 'Resistor', capacitor: 'Capacitor', bjt: 'Bipolar transistor', mosfet: 'MOSFET', diode: 'Diode', led: 'LED' };

export type StressTableActions = {
  onWaive: (line: StressLine) => void;
  onAlternatives: (line: StressLine) => void;
};

function CheckRow({ line, check }: { line: StressLine; check: CheckResult }) {
  const name = checkLabel(check.check);
  return (
    <tr className="border-t border-rule/60">
      <th scope="row" className="py-1.5 pr-3 pl-6 text-left font-normal">
        <span className="flex items-center gap-2">
          {name}
          {check.status !== line.status || line.checks.length > 1 ? <StatusBadge status={check.status} className="text-xs" /> : null}
        </span>
      </th>
      <td className="num px-3 py-1.5">{show(check.applied, check.unit)}</td>
      <td className="num px-3 py-1.5">{show(check.rated, check.unit)}</td>
      <td className={`num px-3 py-1.5 ${check.status === 'beyond_policy' || check.status === 'over_rating' ? 'font-semibold text-brick' : ''}`}>{formatPercent(check.ratio)}</td>
      <td className="num px-3 py-1.5 text-muted">{formatPercent(check.limit)}</td>
      <td className="px-3 py-1.5">
        <RatioBar ratio={check.ratio} limit={check.limit} status={check.status} />
      </td>
      <td className="px-2 py-1.5 text-right">
        <FormulaPopover label={`${name} of ${line.refDes || line.internalPn || 'this line'}`} formula={check.formula} />
      </td>
    </tr>
  );
}

function MissingNote({ line, canEditPoint, onEditPoint }: { line: StressLine; canEditPoint: boolean; onEditPoint: () => void }) {
  const items = [...new Set(line.checks.flatMap((c) => c.missing))].map(describeMissing);
  if (items.length === 0) return null;
  const operating = [...new Set(items.filter((i) => i.where === 'operating').map((i) => i.text))];
  const ratings = [...new Set(items.filter((i) => i.where !== 'operating').map((i) => i.text))];
  return (
    <p className="mt-1.5 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-muted">
      {operating.length ? <span>Operating point needs: {operating.join(', ')}.</span> : null}
      {operating.length && canEditPoint ? (
        <Button variant="secondary" size="sm" onClick={onEditPoint}>
          Set operating point<span className="sr-only"> of {line.refDes}</span>
        </Button>
      ) : null}
      {ratings.length ? (
        <span>
          Part rating needs: {ratings.join(', ')}.{' '}
          {line.partId ? (
            <Link to={`/parts/${line.partId}`} className="text-copper-dark underline underline-offset-2 hover:text-copper">
              Open the part
            </Link>
          ) : null}
        </span>
      ) : null}
    </p>
  );
}

/**
 * The stress check, one group of rows per rated line: a heading row with the line's
 * designators, part, worst status, waiver and actions, then a row per check with the
 * applied value and rating, ratio and limit, the bar and the formula.
 */
export function StressTable({
  bomId,
  ambientC,
  lines,
  lineRefs,
  mayWrite,
  released,
  actions,
}: {
  bomId: string;
  ambientC: number;
  lines: StressLine[];
  lineRefs: Map<string, LineRef>;
  mayWrite: boolean;
  released: boolean;
  actions: StressTableActions;
}) {
  const [editing, setEditing] = useState<string | null>(null);
  return (
    <div className="relative overflow-x-auto rounded-lg border border-rule bg-surface">
      <table aria-label="Stress check" className="w-full border-collapse text-sm">
        <colgroup>
          <col />
          <col className="w-[5.5rem]" />
          <col className="w-[5.5rem]" />
          <col className="w-[4.5rem]" />
          <col className="w-[4.5rem]" />
          <col className="w-[9rem]" />
          <col className="w-[3.5rem]" />
        </colgroup>
        <thead className="text-xs font-semibold tracking-wide text-muted uppercase">
          <tr className="border-b border-rule">
            <th scope="col" className="px-3 py-2 text-left">
              Line and check
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Applied
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Rating
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Ratio
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Limit
            </th>
            <th scope="col" className="px-3 py-2 text-left">
              Against the limit
            </th>
            <th scope="col" className="px-2 py-2">
              <span className="sr-only">Formula</span>
            </th>
          </tr>
        </thead>
        {lines.map((line) => {
          const ref = lineRefs.get(line.lineId);
          const headingId = `stress-line-${line.lineId}`;
          const passing = isPassing(line.status);
          const canWaive = mayWrite && !released && line.status === 'beyond_policy' && !line.waiver;
          const missingOperating = line.checks.flatMap((c) => c.missing.map(describeMissing)).some((m) => m.where === 'operating');
          const needed = [...new Set(line.checks.flatMap((c) => c.missing).filter((p) => p.startsWith('operatingPoint.')).map((p) => p.split('.')[1].split(' ')[0]))] as OperatingField[];
          const who = line.refDes || line.internalPn || 'this line';
          return (
            <tbody key={line.lineId} aria-labelledby={headingId} className="border-b-4 border-paper last:border-b-0">
              <tr className="bg-paper/50">
                <th scope="rowgroup" colSpan={7} className="px-3 py-2 text-left font-normal">
                  <div className="flex flex-wrap items-center justify-between gap-x-3 gap-y-2">
                    <div className="flex min-w-0 flex-wrap items-center gap-x-2.5 gap-y-1">
                      <span id={headingId} className="font-semibold text-ink">
                        {line.refDes || '(no designator)'}
                      </span>
                      {line.partId ? (
                        <Link
                          to={`/parts/${line.partId}`}
                          title={categoryWords[line.category] ?? line.category}
                          className="text-ink underline-offset-2 hover:text-copper-dark hover:underline"
                        >
                          {line.internalPn}
                          {line.mpn ? <span className="text-xs text-muted"> · {line.mpn}</span> : null}
                        </Link>
                      ) : null}
                      <StatusBadge status={line.status} />
                    </div>
                    <div className="ml-auto flex flex-wrap items-center gap-1.5">
                      {!missingOperating && mayWrite && !released && ref && editing !== line.lineId ? (
                        <Button variant="quiet" size="sm" className="font-normal text-muted" onClick={() => setEditing(line.lineId)}>
                          Operating point<span className="sr-only"> of {who}</span>
                        </Button>
                      ) : null}
                      {canWaive ? (
                        <Button variant="secondary" size="sm" onClick={() => actions.onWaive(line)}>
                          Waive…<span className="sr-only"> {who}</span>
                        </Button>
                      ) : null}
                      {line.status !== 'needs_data' && line.partId ? (
                        <Button variant="secondary" size="sm" onClick={() => actions.onAlternatives(line)}>
                          {passing ? 'Cheaper parts that pass' : 'Parts that pass'}
                          <span className="sr-only"> for {who}</span>
                        </Button>
                      ) : null}
                    </div>
                  </div>
                  {line.waiver ? (
                    <p className="mt-1.5 text-sm text-muted">
                      <span className="font-medium text-ink">Waiver on record</span> — {line.waiver.waivedBy ?? 'a former member'}, {formatDateTime(line.waiver.createdAt)}: “{line.waiver.reason}”
                    </p>
                  ) : null}
                  {line.status === 'over_rating' ? (
                    <p className="mt-1.5 text-sm text-brick">Over the part&apos;s absolute rating: this cannot be waived. Change the part or the circuit before release.</p>
                  ) : null}
                  {line.status === 'beyond_policy' && !line.waiver ? (
                    <p className="mt-1.5 text-sm text-muted">Beyond the policy but inside the rating: release needs a written waiver, or a part that passes.</p>
                  ) : null}
                  <MissingNote line={line} canEditPoint={mayWrite && !released && Boolean(ref)} onEditPoint={() => setEditing(line.lineId)} />
                </th>
              </tr>
              {editing === line.lineId && ref ? (
                <tr>
                  <td colSpan={7} className="px-3 py-2">
                    <OperatingPointForm bomId={bomId} line={ref} bomAmbientC={ambientC} needed={needed} onDone={() => setEditing(null)} onCancel={() => setEditing(null)} />
                  </td>
                </tr>
              ) : null}
              {line.checks.map((check) => (
                <CheckRow key={check.check} line={line} check={check} />
              ))}
            </tbody>
          );
        })}
      </table>
    </div>
  );
}
