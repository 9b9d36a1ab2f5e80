import { useId } from 'react';
import { formatValue } from '../../../shared/units';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { StatusBadge } from '../../../components/ui/stress-status';
import { TextField } from '../../../components/ui/text-field';
import { formatPercent } from '../../../lib/percent';
import { SAFE_VOLTAGE_PRESETS } from '../api';
import { dischargeForm, type DischargeFormValues } from '../inputs';
import { formatSi } from '../format';
import { useHelperForm } from '../use-helper-form';
import { HelperResult } from './helper-parts';

const confidenceWords = { C: 'confirmed', M: 'from memory', P: 'common practice' } as const;

export const emptyDischarge: DischargeFormValues = { capacitanceF: '', resistanceOhm: '', v0V: '', safeV: '', deadlineS: '' };

/**
 * Bleeder discharge: time constant, time to a safe voltage and the largest resistor that
 * meets a deadline. The safe voltage is the user's choice: each preset names the
 * standard it comes from, and none is a universal "safe".
 */
export function DischargeHelper({ defaults = emptyDischarge }: { defaults?: DischargeFormValues }) {
  const { form, helper, onSubmit, formError, errors } = useHelperForm('discharge', dischargeForm, defaults);
  const { register, setValue, watch } = form;
  const presetId = useId();
  const r = helper.data;
  const safe = watch('safeV');
  const deadline = watch('deadlineS');
  const chosen = SAFE_VOLTAGE_PRESETS.find((p) => String(p.safeV) === safe.replace(/\s*V$/, '') && (p.deadlineS === null ? deadline === '' : String(p.deadlineS) === deadline.replace(/\s*s$/, '')));

  return (
    <div className="flex flex-col gap-4">
      <form onSubmit={onSubmit} noValidate aria-label="Bleeder discharge" className="flex flex-col gap-3">
        {formError ? <FormAlert>{formError}</FormAlert> : null}
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Capacitance" placeholder="2n2" autoComplete="off" error={errors.capacitanceF?.message} {...register('capacitanceF')} />
          <TextField label="Bleeder resistance" placeholder="44M" autoComplete="off" error={errors.resistanceOhm?.message} {...register('resistanceOhm')} />
          <TextField label="Starting voltage" placeholder="2.4kV" autoComplete="off" error={errors.v0V?.message} {...register('v0V')} />
        </div>
        <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-3">
          <legend className="px-1 text-sm font-medium">Safe voltage</legend>
          <div className="flex flex-col gap-1">
            <label htmlFor={presetId} className="text-sm text-muted">
              Start from a preset (pick the one that applies to the product)
            </label>
            <select
              id={presetId}
              className="h-9 max-w-md rounded-md border border-rule bg-surface px-2 text-sm hover:border-muted"
              value={chosen?.id ?? ''}
              onChange={(event) => {
                const preset = SAFE_VOLTAGE_PRESETS.find((p) => p.id === event.target.value);
                if (!preset) return;
                setValue('safeV', `${preset.safeV} V`, { shouldDirty: true });
                setValue('deadlineS', preset.deadlineS === null ? '' : `${preset.deadlineS} s`, { shouldDirty: true });
              }}
            >
              <option value="">My own values</option>
              {SAFE_VOLTAGE_PRESETS.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.label}
                </option>
              ))}
            </select>
            {chosen ? (
              <ul className="text-xs text-muted">
                {chosen.sources.map((s) => (
                  <li key={`${s.tag}-${s.clause}`}>
                    IEC {s.tag} {s.clause} ({confidenceWords[s.confidence]}): {s.says}
                  </li>
                ))}
              </ul>
            ) : null}
          </div>
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField label="Safe voltage" placeholder="60V" autoComplete="off" error={errors.safeV?.message} {...register('safeV')} />
            <TextField
              label="Deadline"
              placeholder="5 s"
              autoComplete="off"
              hint="Optional: the time allowed to get there."
              error={errors.deadlineS?.message}
              {...register('deadlineS')}
            />
          </div>
        </fieldset>
        <div>
          <Button type="submit" pending={helper.isPending}>
            Work out the discharge
          </Button>
        </div>
      </form>
      {r ? (
        <HelperResult
          label="Bleeder discharge result"
          status={
            r.deadline ? (
              <>
                <StatusBadge status={r.deadline.status} />
                <span className="text-muted">
                  {formatPercent(r.deadline.ratio)} of the {formatSi(r.deadline.deadlineS, 's')} deadline
                </span>
              </>
            ) : null
          }
          figures={[
            { label: 'Time constant τ = R·C', value: formatSi(r.tauS, 's') },
            { label: 'Time to the safe voltage', value: formatSi(r.timeToSafeS, 's') },
            { label: 'Bleeder power at the start', value: formatValue(r.bleederPowerW, 'power') },
            { label: 'Stored charge', value: formatSi(r.chargeC, 'C') },
            { label: 'Stored energy', value: formatSi(r.energyJ, 'J') },
            ...(r.deadline
              ? [
                  { label: 'Largest resistance for the deadline', value: formatValue(r.deadline.maxResistanceOhm, 'resistance') },
                  { label: 'Voltage at the deadline', value: r.deadline.voltageAtDeadlineV < 1e-3 ? 'below 1 mV' : formatValue(r.deadline.voltageAtDeadlineV, 'voltage') },
                ]
              : []),
          ]}
          formula={r.formula}
          caution={r.caution}
        />
      ) : null}
    </div>
  );
}
