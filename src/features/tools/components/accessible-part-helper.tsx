import { formatValue } from '../../../shared/units';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { StatusBadge } from '../../../components/ui/stress-status';
import { TextField } from '../../../components/ui/text-field';
import { formatPercent } from '../../../lib/percent';
import type { AccessiblePartResult } from '../api';
import { accessiblePartForm, type AccessiblePartFormValues } from '../inputs';
import { formatSi } from '../format';
import { useHelperForm } from '../use-helper-form';
import { HelperResult } from './helper-parts';

const confidenceWords = { C: 'confirmed', M: 'from memory', P: 'common practice' } as const;

function bandLimit(band: AccessiblePartResult['band']): string {
  if (band.unit === 'V') return formatValue(band.limit, 'voltage');
  if (band.unit === 'F') return formatValue(band.limit, 'capacitance');
  return formatSi(band.limit, band.unit);
}

function applied(r: AccessiblePartResult): string {
  if (r.band.unit === 'V') return formatValue(r.applied, 'voltage');
  if (r.band.unit === 'F') return formatValue(r.applied, 'capacitance');
  return formatSi(r.applied, r.band.unit);
}

/** Charge and energy of a part a user can touch, against the household-appliance limits. */
export function AccessiblePartHelper({ defaults = { capacitanceF: '', voltageV: '' } }: { defaults?: AccessiblePartFormValues }) {
  const { form, helper, onSubmit, formError, errors } = useHelperForm('accessible-part', accessiblePartForm, defaults);
  const { register } = form;
  const r = helper.data;
  return (
    <div className="flex flex-col gap-4">
      <form onSubmit={onSubmit} noValidate aria-label="Accessible high-voltage part" className="flex flex-col gap-3">
        {formError ? <FormAlert>{formError}</FormAlert> : null}
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Capacitance" placeholder="2n2" autoComplete="off" error={errors.capacitanceF?.message} {...register('capacitanceF')} />
          <TextField label="Peak voltage" placeholder="2.4kV" autoComplete="off" error={errors.voltageV?.message} {...register('voltageV')} />
        </div>
        <div>
          <Button type="submit" pending={helper.isPending}>
            Check the part
          </Button>
        </div>
      </form>
      {r ? (
        <HelperResult
          label="Accessible part result"
          status={
            <>
              <StatusBadge status={r.status} />
              <span className="text-muted">
                {r.band.text} (IEC {r.source.tag} cl. {r.source.clause}, {confidenceWords[r.source.confidence]})
              </span>
            </>
          }
          figures={[
            { label: 'Charge Q = C·V', value: formatSi(r.chargeC, 'C') },
            { label: 'Energy E = ½·C·V²', value: formatSi(r.energyJ, 'J') },
            { label: 'Against the limit', value: `${applied(r)} of ${bandLimit(r.band)}` },
            { label: 'Ratio', value: formatPercent(r.ratio) },
          ]}
          formula={r.formula}
          caution={r.caution}
        />
      ) : null}
    </div>
  );
}
