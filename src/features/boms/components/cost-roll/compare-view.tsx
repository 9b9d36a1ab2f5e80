import { useQuery } from '@tanstack/react-query';
import { ErrorState } from '../../../../components/ui/error-state';
import { LoadingState } from '../../../../components/ui/loading-state';
import { Tag } from '../../../../components/ui/tag';
import { compareQueryOptions, type CostCompare } from '../../api';
import { describeGap, formatPerUnit, formatTotal, perUnitTotals, totalLabels } from '../../display';

const changeWords: Record<CostCompare['lines'][number]['change'], string> = {
  added: 'Added',
  removed: 'Removed',
  part_changed: 'Part changed',
  cost_changed: 'Cost changed',
  same: 'Same',
};

const changeTones = { added: 'ok', removed: 'warning', part_changed: 'copper', cost_changed: 'neutral', same: 'muted' } as const;

/** A signed change as words: "+0.0123" reads "0.0123 more", never a sign alone. */
function Change({ value, perUnit, currency }: { value: string | null; perUnit: boolean; currency: string }) {
  const gap = describeGap(value, perUnit ? 4 : 2);
  if (!gap) return <span className="text-muted">—</span>;
  if (gap.side === 'on') return <span className="text-muted">no change</span>;
  const amount = perUnit ? gap.amount : formatTotal(value!.replace(/^-/, ''), currency);
  return (
    <span className={gap.side === 'over' ? 'text-brick' : 'text-verdigris'}>
      {amount} {gap.side === 'over' ? 'more' : 'less'}
    </span>
  );
}

/** Two cost rolls side by side: every total and every line that changed. */
export function CompareView({ left, right, qty }: { left: string; right: string; qty: number }) {
  const compare = useQuery(compareQueryOptions(left, right, qty));
  if (compare.isPending) return <LoadingState label="Comparing…" />;
  if (compare.isError) return <ErrorState title="The comparison could not be made" error={compare.error} onRetry={() => void compare.refetch()} />;
  const c = compare.data;
  const changed = c.lines.filter((line) => line.change !== 'same');
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm">
        <span className="font-medium">{c.left.label}</span> ({c.left.qty.toLocaleString('en-GB')} units, {c.left.date}) against{' '}
        <span className="font-medium">{c.right.label}</span> ({c.right.qty.toLocaleString('en-GB')} units, {c.right.date}), in {c.currency}.
      </p>
      <table aria-label="Totals compared" className="w-full border-collapse text-sm">
        <thead>
          <tr className="text-xs text-muted uppercase">
            <th scope="col" className="border-b border-rule py-1 text-left font-semibold">Total</th>
            <th scope="col" className="border-b border-rule py-1 text-right font-semibold">{c.left.label}</th>
            <th scope="col" className="border-b border-rule py-1 text-right font-semibold">{c.right.label}</th>
            <th scope="col" className="border-b border-rule py-1 text-right font-semibold">Change</th>
          </tr>
        </thead>
        <tbody>
          {c.totals.map((t) => {
            const perUnit = perUnitTotals.has(t.name);
            const show = (v: string | null) => (perUnit ? formatPerUnit(v) : formatTotal(v, c.currency));
            return (
              <tr key={t.name} className={`border-b border-rule/60 ${t.name === 'landedPerUnit' ? 'font-semibold' : ''}`}>
                <th scope="row" className="py-1 text-left font-normal">
                  {totalLabels[t.name] ?? t.name}
                </th>
                <td className="num py-1">{show(t.left)}</td>
                <td className="num py-1">{show(t.right)}</td>
                <td className="num py-1">
                  <Change value={t.change} perUnit={perUnit} currency={c.currency} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <table aria-label="Lines compared" className="w-full border-collapse text-sm">
        <caption className="mb-1 text-left text-sm text-muted">
          {changed.length} of {c.lines.length} lines differ.
        </caption>
        <thead>
          <tr className="text-xs text-muted uppercase">
            <th scope="col" className="border-b border-rule py-1 text-left font-semibold">Ref des</th>
            <th scope="col" className="border-b border-rule py-1 text-left font-semibold">Part</th>
            <th scope="col" className="border-b border-rule py-1 text-left font-semibold">Change</th>
            <th scope="col" className="border-b border-rule py-1 text-right font-semibold">Landed / unit before</th>
            <th scope="col" className="border-b border-rule py-1 text-right font-semibold">After</th>
            <th scope="col" className="border-b border-rule py-1 text-right font-semibold">Difference</th>
          </tr>
        </thead>
        <tbody>
          {c.lines.map((line) => (
            <tr key={line.key} className={`border-b border-rule/60 ${line.change === 'same' ? 'text-muted' : ''}`}>
              <td className="py-1">{line.refDes ?? '—'}</td>
              <td className="py-1">
                {line.left && line.right && line.left.internalPn !== line.right.internalPn
                  ? `${line.left.internalPn ?? '—'} → ${line.right.internalPn ?? '—'}`
                  : (line.internalPn ?? '—')}
              </td>
              <td className="py-1">
                <Tag tone={changeTones[line.change]}>{changeWords[line.change]}</Tag>
              </td>
              <td className="num py-1">{line.left ? formatPerUnit(line.left.landedPerUnit) : '—'}</td>
              <td className="num py-1">{line.right ? formatPerUnit(line.right.landedPerUnit) : '—'}</td>
              <td className="num py-1">
                <Change value={line.landedPerUnitChange} perUnit currency={c.currency} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
