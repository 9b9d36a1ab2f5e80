import { formatValue } from '../../../shared/units';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { StatusBadge } from '../../../components/ui/stress-status';
import { TextField } from '../../../components/ui/text-field';
import { formatPercent } from '../../../lib/percent';
import { junctionTempForm, type JunctionTempFormValues } from '../inputs';
import { useHelperForm } from '../use-helper-form';
import { HelperResult } from './helper-parts';

export const emptyJunctionTemp: JunctionTempFormValues = { ambientC: '', powerW: '', rthJaCPerW: '', tjMaxC: '', tjLimitC: '' };

/** Tj = Ta + P·Rth(j-a), and the dissipation allowed at an ambient. */
export function JunctionTempHelper({ defaults = emptyJunctionTemp }: { defaults?: JunctionTempFormValues }) {
  const { form, helper, onSubmit, formError, errors } = useHelperForm('junction-temp', junctionTempForm, defaults);
  const { register } = form;
  const r = helper.data;
  return (
    <div className="flex flex-col gap-4">
      <form onSubmit={onSubmit} noValidate aria-label="Junction temperature" className="flex flex-col gap-3">
        {formError ? <FormAlert>{formError}</FormAlert> : null}
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Ambient" placeholder="40°C" autoComplete="off" error={errors.ambientC?.message} {...register('ambientC')} />
          <TextField label="Dissipation" placeholder="250mW" autoComplete="off" error={errors.powerW?.message} {...register('powerW')} />
          <TextField
            label="Rth(j-a) (°C/W)"
            placeholder="250"
            autoComplete="off"
            hint="The maker's test-board figure; a small board in a sealed case is worse."
            error={errors.rthJaCPerW?.message}
            {...register('rthJaCPerW')}
          />
          <TextField label="Tj max" placeholder="150°C" autoComplete="off" error={errors.tjMaxC?.message} {...register('tjMaxC')} />
          <TextField
            label="Tj limit"
            placeholder="125°C"
            autoComplete="off"
            hint="Optional: the policy's allowed junction temperature."
            error={errors.tjLimitC?.message}
            {...register('tjLimitC')}
          />
        </div>
        <div>
          <Button type="submit" pending={helper.isPending}>
            Work out Tj
          </Button>
        </div>
      </form>
      {r ? (
        <HelperResult
          label="Junction temperature result"
          status={<StatusBadge status={r.status} />}
          figures={[
            { label: 'Junction temperature Tj', value: formatValue(r.tjC, 'temperature', { digits: 4 }) },
            { label: 'Rise above ambient', value: `${Number(r.riseC.toPrecision(3))} °C` },
            { label: 'Allowed dissipation at Tj max', value: formatValue(r.allowedPowerW, 'power') },
            { label: 'Allowed dissipation at Tj limit', value: r.allowedPowerAtLimitW === null ? '—' : formatValue(r.allowedPowerAtLimitW, 'power') },
            { label: 'Ratio (Tj − Ta) ÷ (Tj max − Ta)', value: formatPercent(r.ratio) },
            { label: 'Limit', value: formatPercent(r.limit) },
          ]}
          formula={r.formula}
          caution={r.caution}
        />
      ) : null}
    </div>
  );
}
