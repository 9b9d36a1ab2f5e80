import type { ReactNode } from 'react';
import { formatValue } from '../../../shared/units';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { StatusBadge } from '../../../components/ui/stress-status';
import { TextField } from '../../../components/ui/text-field';
import type { ResistorStringResult } from '../api';
import { resistorStringForm, type ResistorStringFormValues } from '../inputs';
import { useHelperForm } from '../use-helper-form';
import { formatPercent } from '../../../lib/percent';
import { HelperResult } from './helper-parts';

export const emptyResistorString: ResistorStringFormValues = { totalV: '', resistanceOhm: '', powerW: '', levV: '', tolerancePct: '5', limit: '80' };

/**
 * The fewest equal resistors in series across a voltage so that each stays within the
 * policy's voltage limit, worst case with tolerance. `apply` adds what the BOM page
 * offers under the result (writing the per-resistor voltage into a line).
 */
export function ResistorStringHelper({
  defaults = emptyResistorString,
  apply,
}: {
  defaults?: ResistorStringFormValues;
  apply?: (result: ResistorStringResult) => ReactNode;
}) {
  const { form, helper, onSubmit, formError, errors } = useHelperForm('resistor-string', resistorStringForm, defaults);
  const { register } = form;
  const r = helper.data;
  return (
    <div className="flex flex-col gap-4">
      <form onSubmit={onSubmit} noValidate aria-label="Resistor string" className="flex flex-col gap-3">
        {formError ? <FormAlert>{formError}</FormAlert> : null}
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Voltage across the string" placeholder="760V" autoComplete="off" error={errors.totalV?.message} {...register('totalV')} />
          <TextField label="Resistance each" placeholder="22M" autoComplete="off" error={errors.resistanceOhm?.message} {...register('resistanceOhm')} />
          <TextField label="Rated power each" placeholder="250mW" autoComplete="off" error={errors.powerW?.message} {...register('powerW')} />
          <TextField
            label="Limiting element voltage (LEV)"
            placeholder="200V"
            autoComplete="off"
            hint="The maker's maximum working voltage."
            error={errors.levV?.message}
            {...register('levV')}
          />
          <TextField label="Tolerance (%)" placeholder="5" autoComplete="off" error={errors.tolerancePct?.message} {...register('tolerancePct')} />
          <TextField
            label="Voltage limit (% of rating)"
            placeholder="80"
            autoComplete="off"
            hint="The policy's resistor voltage limit."
            error={errors.limit?.message}
            {...register('limit')}
          />
        </div>
        <div>
          <Button type="submit" pending={helper.isPending}>
            Work out the string
          </Button>
        </div>
      </form>
      {r ? (
        <HelperResult
          label="Resistor string result"
          status={
            <>
              <span className="font-semibold">
                {r.count} resistor{r.count === 1 ? '' : 's'} in series
              </span>
              <StatusBadge status={r.status} />
            </>
          }
          figures={[
            { label: 'Rated voltage each, min(√(P·R), LEV)', value: formatValue(r.ratedEachV, 'voltage') },
            { label: 'Allowed each at the limit', value: formatValue(r.ratedEachV * r.limit, 'voltage') },
            { label: 'Nominal voltage each', value: formatValue(r.nominalEachV, 'voltage') },
            { label: 'Worst-case voltage each', value: formatValue(r.worstEachV, 'voltage') },
            { label: 'Ratio (worst case)', value: `${formatPercent(r.ratio)} of rating` },
            { label: 'Limit', value: formatPercent(r.limit) },
            { label: 'String current', value: formatValue(r.stringCurrentA, 'current') },
            { label: 'Worst-case power each', value: `${formatValue(r.worstPowerW, 'power')} (${formatPercent(r.worstPowerRatio)})` },
            { label: 'Critical resistance, LEV²/P', value: formatValue(r.criticalResistanceOhm, 'resistance'), hint: 'Above it the part is limited by its LEV, below it by its power.' },
          ]}
          formula={r.formula}
          caution={r.caution}
        >
          {apply?.(r)}
        </HelperResult>
      ) : null}
    </div>
  );
}
