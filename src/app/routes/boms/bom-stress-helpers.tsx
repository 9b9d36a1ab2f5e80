import { useId, useMemo, useState } from 'react';
import { formatValue } from '../../../shared/units';
import { CautionNotice } from '../../../components/ui/caution-notice';
import { SidePanel } from '../../../components/ui/side-panel';
import type { PartSummary } from '../../../features/boms/api';
import type { PolicyLimits } from '../../../features/policies/api';
import type { StressCheck } from '../../../features/stress/api';
import { MultiplierApply, type LineOption } from '../../../features/stress/components/multiplier-apply';
import { ResistorStringApply } from '../../../features/stress/components/resistor-string-apply';
import type { LineRef } from '../../../features/stress/line-ref';
import { HelperSection } from '../../../features/tools/components/helper-parts';
import { emptyMultiplier, MultiplierHelper } from '../../../features/tools/components/multiplier-helper';
import { emptyResistorString, ResistorStringHelper } from '../../../features/tools/components/resistor-string-helper';
import { fractionToPercentText, type ResistorStringFormValues } from '../../../features/tools/inputs';

type Helper = 'resistor-string' | 'multiplier';

const num = (value: unknown) => (typeof value === 'number' && Number.isFinite(value) ? value : null);

/** The resistor string's boxes filled from the chosen line's part and the BOM's policy. */
function resistorDefaults(part: PartSummary | undefined, limits: PolicyLimits | undefined): ResistorStringFormValues {
  const r = part?.ratings ?? {};
  const resistance = num(r.resistanceOhm);
  const power = num(r.powerW);
  const lev = num(r.levV);
  const tolerance = num(r.tolerancePct);
  return {
    ...emptyResistorString,
    resistanceOhm: resistance === null ? '' : formatValue(resistance, 'resistance', { digits: 6 }),
    powerW: power === null ? '' : formatValue(power, 'power', { digits: 6 }),
    levV: lev === null ? '' : formatValue(lev, 'voltage', { digits: 6 }),
    tolerancePct: tolerance === null ? emptyResistorString.tolerancePct : String(tolerance),
    limit: limits ? fractionToPercentText(limits.resistor.voltage.value) : emptyResistorString.limit,
  };
}

/**
 * The BOM page's circuit helpers: the resistor string and the multiplier, whose results
 * can be written into the operating points of this BOM's lines (designers and owners,
 * on a revision that is not released).
 */
export function StressHelpersPanel({
  open,
  onClose,
  bomId,
  stress,
  lineRefs,
  parts,
  limits,
  editable,
}: {
  open: boolean;
  onClose: () => void;
  bomId: string;
  stress: StressCheck;
  lineRefs: Map<string, LineRef>;
  parts: Map<string, PartSummary> | undefined;
  limits: PolicyLimits | undefined;
  editable: boolean;
}) {
  const [helper, setHelper] = useState<Helper>('resistor-string');
  const firstBeyond = stress.lines.find((l) => l.category === 'resistor' && l.status === 'beyond_policy');
  const [resistorLine, setResistorLine] = useState<string>(firstBeyond?.lineId ?? '');
  const pickId = useId();

  const options = useMemo(() => {
    const of = (category: string): LineOption[] =>
      stress.lines.filter((l) => l.category === category && lineRefs.has(l.lineId)).map((l) => ({ id: l.lineId, label: `${l.refDes || '(no designator)'} · ${l.internalPn ?? ''}` }));
    return { resistors: of('resistor'), capacitors: of('capacitor'), diodes: of('diode') };
  }, [stress.lines, lineRefs]);

  const chosen = stress.lines.find((l) => l.lineId === resistorLine);
  const defaults = resistorDefaults(chosen?.partId ? parts?.get(chosen.partId) : undefined, limits);
  const tab = (id: Helper, label: string) => (
    <button
      type="button"
      aria-pressed={helper === id}
      onClick={() => setHelper(id)}
      className={`rounded-md border px-3 py-1.5 text-sm ${helper === id ? 'border-copper bg-copper/10 font-medium' : 'border-rule bg-surface text-muted hover:text-ink'}`}
    >
      {label}
    </button>
  );

  return (
    <SidePanel
      open={open}
      onClose={onClose}
      title="Circuit helpers"
      description={editable ? 'Work a figure out, then write it into the operating points of this BOM’s lines.' : 'Work a figure out. This revision cannot be changed here, so results are not written into lines.'}
    >
      <CautionNotice>{stress.caution}</CautionNotice>
      <div role="group" aria-label="Helper" className="flex gap-2">
        {tab('resistor-string', 'Resistor string')}
        {tab('multiplier', 'Multiplier')}
      </div>
      {helper === 'resistor-string' ? (
        <HelperSection
          id="bom-resistor-string"
          title="Resistor string"
          intro="The fewest equal resistors in series across a voltage so that each stays within the policy's voltage limit, worst case with tolerance."
        >
          <div className="flex flex-col gap-1">
            <label htmlFor={pickId} className="text-sm font-medium">
              Resistor line
            </label>
            <select
              id={pickId}
              value={resistorLine}
              onChange={(event) => setResistorLine(event.target.value)}
              className="h-9 max-w-md rounded-md border border-rule bg-surface px-2 text-sm hover:border-muted"
            >
              <option value="">None: work it out only</option>
              {options.resistors.map((o) => (
                <option key={o.id} value={o.id}>
                  {o.label}
                </option>
              ))}
            </select>
            <p className="text-xs text-muted">Fills resistance, power, LEV and tolerance from the line&apos;s part, and the limit from the BOM&apos;s policy.</p>
          </div>
          <ResistorStringHelper
            key={resistorLine}
            defaults={defaults}
            apply={editable ? (result) => <ResistorStringApply bomId={bomId} result={result} line={lineRefs.get(resistorLine) ?? null} /> : undefined}
          />
        </HelperSection>
      ) : (
        <HelperSection
          id="bom-multiplier"
          title="Multiplier"
          intro="A half-wave Cockcroft-Walton (Greinacher) multiplier: the voltage each capacitor and diode sees, to write into their lines."
        >
          <MultiplierHelper
            defaults={{ ...emptyMultiplier, limit: limits ? fractionToPercentText(limits.capacitor.hv_ceramic.value) : '' }}
            apply={
              editable
                ? (result) => <MultiplierApply bomId={bomId} result={result} capacitors={options.capacitors} diodes={options.diodes} lineRefs={lineRefs} />
                : undefined
            }
          />
        </HelperSection>
      )}
    </SidePanel>
  );
}
