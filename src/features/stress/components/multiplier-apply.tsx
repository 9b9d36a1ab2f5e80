import { useState } from 'react';
import { formatValue } from '../../../shared/units';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import type { MultiplierResult } from '../../../../server/derating';
import { useWriteOperatingPoints } from '../hooks';
import { multiplierWrites, type MultiplierChoice } from '../helper-writes';
import type { LineRef } from '../line-ref';

export type LineOption = { id: string; label: string };

function LineChecks({ legend, options, chosen, onChange }: { legend: string; options: LineOption[]; chosen: string[]; onChange: (ids: string[]) => void }) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-medium">{legend}</legend>
      {options.length === 0 ? <p className="text-sm text-muted">None in this BOM.</p> : null}
      {options.map((o) => (
        <label key={o.id} className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            className="size-4 accent-copper"
            checked={chosen.includes(o.id)}
            onChange={(event) => onChange(event.target.checked ? [...chosen, o.id] : chosen.filter((id) => id !== o.id))}
          />
          {o.label}
        </label>
      ))}
    </fieldset>
  );
}

/**
 * Writes a multiplier's voltages into the operating points of chosen lines: the highest
 * stress to every chosen capacitor and diode line, or position by position.
 */
export function MultiplierApply({
  bomId,
  result,
  capacitors,
  diodes,
  lineRefs,
}: {
  bomId: string;
  result: MultiplierResult;
  capacitors: LineOption[];
  diodes: LineOption[];
  lineRefs: Map<string, LineRef>;
}) {
  const write = useWriteOperatingPoints(bomId);
  const [mode, setMode] = useState<MultiplierChoice['mode']>('highest');
  const [capacitorLines, setCapacitorLines] = useState<string[]>([]);
  const [diodeLines, setDiodeLines] = useState<string[]>([]);
  const [byPosition, setByPosition] = useState<Record<string, string | null>>({});
  const [done, setDone] = useState<string | null>(null);

  const choice: MultiplierChoice = mode === 'highest' ? { mode, capacitorLines, diodeLines } : { mode, byPosition };
  const writes = multiplierWrites(result, choice, lineRefs);
  const name = (id: string) => lineRefs.get(id)?.refDes || 'a line';

  const apply = () => {
    setDone(null);
    write.mutate(writes, {
      onSuccess: () =>
        setDone(
          `Written: ${writes
            .map((w) => `${name(w.id)} ${formatValue(Number(w.operatingPoint.voltageV), 'voltage')}${w.operatingPoint.currentA !== undefined ? `, ${formatValue(Number(w.operatingPoint.currentA), 'current')}` : ''}`)
            .join('; ')}.`,
        ),
    });
  };

  return (
    <section aria-label="Write into lines" className="flex flex-col gap-3 rounded-md border border-copper/40 bg-copper/5 p-3">
      <h3 className="text-sm font-semibold">Write into this BOM&apos;s operating points</h3>
      <div role="radiogroup" aria-label="How to choose lines" className="flex flex-wrap gap-4 text-sm">
        <label className="flex items-center gap-2">
          <input type="radio" name="multiplier-mode" className="accent-copper" checked={mode === 'highest'} onChange={() => setMode('highest')} />
          The highest stress to all chosen lines
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" name="multiplier-mode" className="accent-copper" checked={mode === 'positions'} onChange={() => setMode('positions')} />
          Position by position
        </label>
      </div>
      {mode === 'highest' ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <LineChecks legend="Capacitor lines" options={capacitors} chosen={capacitorLines} onChange={setCapacitorLines} />
          <LineChecks legend="Diode lines" options={diodes} chosen={diodeLines} onChange={setDiodeLines} />
        </div>
      ) : (
        <div className="grid max-h-64 gap-x-4 gap-y-1.5 overflow-y-auto sm:grid-cols-2">
          {result.positions.map((p) => {
            const options = p.kind === 'capacitor' ? capacitors : diodes;
            return (
              <label key={p.position} className="flex items-center justify-between gap-2 text-sm">
                <span>
                  <span className="font-medium">{p.position}</span> <span className="text-muted tabular-nums">{formatValue(p.operatingPoint.voltageV, 'voltage')}</span>
                </span>
                <select
                  value={byPosition[p.position] ?? ''}
                  onChange={(event) => setByPosition((prev) => ({ ...prev, [p.position]: event.target.value || null }))}
                  className="h-7 w-36 rounded-md border border-rule bg-surface px-1.5 text-sm"
                >
                  <option value="">Not written</option>
                  {options.map((o) => (
                    <option key={o.id} value={o.id}>
                      {o.label}
                    </option>
                  ))}
                </select>
              </label>
            );
          })}
        </div>
      )}
      {write.error ? <FormAlert>{isStaleVersion(write.error) ? STALE_VERSION_MESSAGE : describeError(write.error)}</FormAlert> : null}
      {done ? <FormAlert tone="success">{done}</FormAlert> : null}
      <div>
        <Button size="sm" disabled={writes.length === 0} pending={write.isPending} onClick={apply}>
          Write into {writes.length} line{writes.length === 1 ? '' : 's'}
        </Button>
      </div>
    </section>
  );
}
