import type { ReactNode } from 'react';
import { formatValue } from '../../../shared/units';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import type { MultiplierResult } from '../api';
import { multiplierForm, type MultiplierFormValues } from '../inputs';
import { useHelperForm } from '../use-helper-form';
import { HelperResult } from './helper-parts';

export const emptyMultiplier: MultiplierFormValues = { stages: '3', vPeakV: '', loadCurrentA: '', frequencyHz: '', capacitanceF: '', limit: '' };

/** The voltage each capacitor and diode of the multiplier sees, position by position. */
function PositionsTable({ result }: { result: MultiplierResult }) {
  const withRating = result.positions.some((p) => p.minRatedV !== undefined);
  const capacitors = result.positions.filter((p) => p.kind === 'capacitor').length;
  const diodes = result.positions.length - capacitors;
  return (
    <details className="rounded-md border border-rule">
      <summary className="cursor-pointer px-3 py-2 text-sm font-medium">
        Each position ({capacitors} capacitors, {diodes} diodes)
      </summary>
      <div className="max-h-72 overflow-auto border-t border-rule">
        <table aria-label="Multiplier positions" className="w-full text-sm">
          <thead className="sticky top-0 bg-surface text-xs font-semibold tracking-wide text-muted uppercase">
            <tr>
              <th scope="col" className="px-3 py-1.5 text-left">
                Position
              </th>
              <th scope="col" className="px-3 py-1.5 text-left">
                Stage
              </th>
              <th scope="col" className="px-3 py-1.5 text-right">
                Voltage
              </th>
              <th scope="col" className="px-3 py-1.5 text-right">
                Average current
              </th>
              {withRating ? (
                <th scope="col" className="px-3 py-1.5 text-right">
                  Rating at least
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {result.positions.map((p) => (
              <tr key={p.position} className="border-t border-rule/70">
                <th scope="row" className="px-3 py-1 text-left font-medium">
                  {p.position}
                </th>
                <td className="px-3 py-1 text-muted">
                  {p.stage}
                  {p.column ? `, ${p.column}` : ''}
                </td>
                <td className="num px-3 py-1">{formatValue(p.operatingPoint.voltageV, 'voltage')}</td>
                <td className="num px-3 py-1">{p.operatingPoint.currentA !== undefined ? formatValue(p.operatingPoint.currentA, 'current') : '—'}</td>
                {withRating ? <td className="num px-3 py-1">{p.minRatedV !== undefined ? formatValue(p.minRatedV, 'voltage') : '—'}</td> : null}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}

/**
 * A half-wave Cockcroft-Walton (Greinacher) multiplier: output, ripple, drop, and the
 * voltage each capacitor and diode sees. `apply` adds what the BOM page offers under
 * the result (writing those voltages into lines).
 */
export function MultiplierHelper({ defaults = emptyMultiplier, apply }: { defaults?: MultiplierFormValues; apply?: (result: MultiplierResult) => ReactNode }) {
  const { form, helper, onSubmit, formError, errors } = useHelperForm('multiplier', multiplierForm, defaults);
  const { register } = form;
  const r = helper.data;
  return (
    <div className="flex flex-col gap-4">
      <form onSubmit={onSubmit} noValidate aria-label="Multiplier" className="flex flex-col gap-3">
        {formError ? <FormAlert>{formError}</FormAlert> : null}
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Stages" inputMode="numeric" autoComplete="off" error={errors.stages?.message} {...register('stages')} />
          <TextField
            label="Peak input voltage"
            placeholder="1.2kV"
            autoComplete="off"
            hint="Zero to peak (√2 × RMS for a sine)."
            error={errors.vPeakV?.message}
            {...register('vPeakV')}
          />
          <TextField label="Load current" placeholder="100uA" autoComplete="off" error={errors.loadCurrentA?.message} {...register('loadCurrentA')} />
          <TextField label="Drive frequency" placeholder="50kHz" autoComplete="off" error={errors.frequencyHz?.message} {...register('frequencyHz')} />
          <TextField label="Capacitance each" placeholder="1n" autoComplete="off" error={errors.capacitanceF?.message} {...register('capacitanceF')} />
          <TextField
            label="Voltage limit (% of rating)"
            placeholder="70"
            autoComplete="off"
            hint="Optional: gives the least rating per position."
            error={errors.limit?.message}
            {...register('limit')}
          />
        </div>
        <div>
          <Button type="submit" pending={helper.isPending}>
            Work out the multiplier
          </Button>
        </div>
      </form>
      {r ? (
        <HelperResult
          label="Multiplier result"
          figures={[
            { label: 'No-load output, 2·n·Vpk', value: formatValue(r.noLoadV, 'voltage') },
            { label: 'Loaded output', value: formatValue(r.loadedV, 'voltage') },
            { label: 'Drop under load', value: formatValue(r.dropV, 'voltage') },
            { label: 'Ripple, peak to peak', value: formatValue(r.ripplePeakToPeakV, 'voltage') },
            { label: 'I/(f·C)', value: formatValue(r.loadUnitV, 'voltage') },
            {
              label: 'Optimum stages',
              value: r.optimumStages === null ? 'none with no load' : `≈ ${r.optimumStages.toFixed(1)} (best whole: ${r.bestWholeStages})`,
            },
            { label: 'Capacitors see at most', value: formatValue(Math.max(...r.positions.filter((p) => p.kind === 'capacitor').map((p) => p.operatingPoint.voltageV)), 'voltage') },
            { label: 'Diodes see (reverse)', value: formatValue(Math.max(...r.positions.filter((p) => p.kind === 'diode').map((p) => p.operatingPoint.voltageV)), 'voltage') },
          ]}
          warnings={r.warnings}
          formula={r.formula}
          caution={r.caution}
        >
          <PositionsTable result={r} />
          {apply?.(r)}
        </HelperResult>
      ) : null}
    </div>
  );
}
