import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { CurvePoint } from '../api';
import { formatCount, formatPerUnit } from '../display';

const COPPER = '#B5652B';
const SLATE = '#3D5A80';
const INK = '#1E2430';
const MUTED = '#5B6270';
const RULE = '#E3DED4';

/**
 * Landed cost per unit against build quantity on a log scale, drawn as steps with a dot
 * at every quantity costed: a price break or an MOQ shows as a step down between two
 * dots. Values are drawn from the decimal text for display only.
 */
export function VolumeCurveChart({ points, currency, target }: { points: CurvePoint[]; currency: string; target: string | null }) {
  const data = points.map((p) => ({
    qty: p.qty,
    landed: Number(p.totals.landedPerUnit),
    exclOneTime: Number(p.totals.landedPerUnitExclOneTime),
    label: formatPerUnit(p.totals.landedPerUnit),
    exclLabel: formatPerUnit(p.totals.landedPerUnitExclOneTime),
  }));
  const summary = data.map((d) => `${formatCount(d.qty)} units: ${d.label}`).join('; ');
  return (
    <figure className="rounded-lg border border-rule bg-surface p-4">
      <figcaption className="mb-2 text-sm font-semibold">
        Landed cost per unit by build quantity <span className="font-normal text-muted">({currency}; quantity on a log scale)</span>
      </figcaption>
      <div className="h-80" role="img" aria-label={`Landed cost per unit by build quantity: ${summary}`}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 12, right: 24, bottom: 8, left: 8 }}>
            <CartesianGrid stroke={RULE} />
            <XAxis
              dataKey="qty"
              type="number"
              scale="log"
              domain={['dataMin', 'dataMax']}
              allowDataOverflow
              tick={{ fill: MUTED, fontSize: 11 }}
              stroke={RULE}
              tickFormatter={(v: number) => formatCount(v)}
            />
            <YAxis tick={{ fill: MUTED, fontSize: 11 }} stroke={RULE} width={64} tickFormatter={(v: number) => v.toFixed(4)} domain={['auto', 'auto']} />
            <Tooltip
              labelFormatter={(v) => `${formatCount(Number(v))} units`}
              formatter={(_value, name, item) => {
                const row = item.payload as { label: string; exclLabel: string };
                return name === 'Landed per unit' ? [`${row.label} ${currency}`, name] : [`${row.exclLabel} ${currency}`, name];
              }}
            />
            {target ? (
              <ReferenceLine y={Number(target)} stroke={INK} strokeDasharray="4 3" label={{ value: `Target ${formatPerUnit(target)}`, fill: INK, fontSize: 11, position: 'insideTopRight' }} />
            ) : null}
            <Line name="Without one-time costs" type="stepAfter" dataKey="exclOneTime" stroke={SLATE} strokeDasharray="5 3" dot={{ r: 2.5 }} isAnimationActive={false} />
            <Line name="Landed per unit" type="stepAfter" dataKey="landed" stroke={COPPER} strokeWidth={2} dot={{ r: 3.5, fill: COPPER }} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <p className="mt-2 flex flex-wrap gap-4 text-xs text-muted">
        <span className="inline-flex items-center gap-1">
          <svg aria-hidden="true" viewBox="0 0 20 6" className="h-1.5 w-5"><path d="M0 3h20" stroke={COPPER} strokeWidth="2" /></svg> Landed per unit (solid)
        </span>
        <span className="inline-flex items-center gap-1">
          <svg aria-hidden="true" viewBox="0 0 20 6" className="h-1.5 w-5"><path d="M0 3h20" stroke={SLATE} strokeWidth="2" strokeDasharray="5 3" /></svg> Without one-time costs (dashed)
        </span>
        {target ? <span>Target: thin dashed ink line</span> : null}
      </p>
    </figure>
  );
}
