import { Bar, BarChart, CartesianGrid, LabelList, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatPerUnit } from '../../display';

export type BreakdownRow = { name: string; landedPerUnit: string; lines: number };

// Palette: copper for categories, slate for suppliers, ink for the words.
const INK = '#1E2430';
const MUTED = '#5B6270';
const RULE = '#E3DED4';

/**
 * Landed cost per unit by category or by supplier as horizontal bars. The bar length is
 * drawn from the decimal text (display only); every bar carries its value in words, so
 * the colour is never the only signal.
 */
export function BreakdownChart({ title, rows, colour, currency }: { title: string; rows: BreakdownRow[]; colour: string; currency: string }) {
  const data = rows.map((row) => ({ ...row, value: Number(row.landedPerUnit), label: formatPerUnit(row.landedPerUnit) }));
  const height = Math.max(120, data.length * 34 + 40);
  return (
    <figure className="rounded-lg border border-rule bg-surface p-4">
      <figcaption className="mb-2 text-sm font-semibold">
        {title} <span className="font-normal text-muted">(landed cost per unit, {currency})</span>
      </figcaption>
      {data.length === 0 ? (
        <p className="text-sm text-muted">Nothing costed yet.</p>
      ) : (
        <div style={{ height }} role="img" aria-label={`${title}: ${data.map((d) => `${d.name} ${d.label}`).join('; ')}`}>
          <ResponsiveContainer width="100%" height="100%">
            <BarChart data={data} layout="vertical" margin={{ top: 4, right: 72, bottom: 4, left: 8 }}>
              <CartesianGrid horizontal={false} stroke={RULE} />
              <XAxis type="number" tick={{ fill: MUTED, fontSize: 11 }} stroke={RULE} tickFormatter={(v: number) => v.toFixed(4)} />
              <YAxis type="category" dataKey="name" width={200} tick={{ fill: INK, fontSize: 12 }} stroke={RULE} />
              <Tooltip
                formatter={(_value, _name, item) => [`${(item.payload as { label: string }).label} ${currency}`, 'Landed per unit']}
                cursor={{ fill: RULE, opacity: 0.4 }}
              />
              <Bar dataKey="value" fill={colour} isAnimationActive={false} barSize={18}>
                <LabelList dataKey="label" position="right" fill={INK} fontSize={12} />
              </Bar>
            </BarChart>
          </ResponsiveContainer>
        </div>
      )}
    </figure>
  );
}
