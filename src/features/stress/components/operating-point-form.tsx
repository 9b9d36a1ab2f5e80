import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { formatValue, parseValue } from '../../../shared/units';
import { applyServerErrors } from '../../../lib/form-errors';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useWriteOperatingPoints, type OperatingPointValues } from '../hooks';
import { operatingQuantities, type LineRef, type OperatingField } from '../line-ref';

type Values = Record<OperatingField, string>;
const FIELDS = ['voltageV', 'currentA', 'powerW', 'ambientC'] as const satisfies readonly OperatingField[];

const labels: Record<OperatingField, string> = { voltageV: 'Voltage', currentA: 'Current', powerW: 'Power', ambientC: 'Ambient' };
const placeholders: Record<OperatingField, string> = { voltageV: '1.9kV', currentA: '700mA', powerW: '250mW', ambientC: '40°C' };

/** An empty box clears the value; anything else must read as the field's quantity. */
const field = (name: OperatingField) =>
  z.string().transform((text, ctx): number | null => {
    if (text.trim() === '') return null;
    const result = parseValue(text, operatingQuantities[name]);
    if (!result.ok) {
      ctx.addIssue({ code: 'custom', message: result.message });
      return z.NEVER;
    }
    if (result.value < 0 && name !== 'ambientC') {
      ctx.addIssue({ code: 'custom', message: 'must not be negative' });
      return z.NEVER;
    }
    return result.value;
  });

const schema = z.object({ voltageV: field('voltageV'), currentA: field('currentA'), powerW: field('powerW'), ambientC: field('ambientC') });

// Significant figures shown: enough that saving an untouched box would not move the value,
// though only boxes the designer changed are sent at all.
const shown = (value: number | null, name: OperatingField) => (value === null ? '' : formatValue(value, operatingQuantities[name], { digits: 6 }));

/**
 * The operating point of one line, in the trade's notations, saved with the line's
 * version. Only the boxes that were changed are sent, so a value is never rounded by
 * being shown and saved again. `needed` marks the values a check is waiting for.
 */
export function OperatingPointForm({
  bomId,
  line,
  bomAmbientC,
  needed,
  onDone,
  onCancel,
}: {
  bomId: string;
  line: LineRef;
  bomAmbientC: number;
  needed: OperatingField[];
  onDone: () => void;
  onCancel: () => void;
}) {
  const write = useWriteOperatingPoints(bomId);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, dirtyFields },
  } = useForm<Values, unknown, Record<OperatingField, number | null>>({
    resolver: zodResolver(schema),
    defaultValues: Object.fromEntries(FIELDS.map((f) => [f, shown(line.operatingPoint[f], f)])) as Values,
  });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    const changed: OperatingPointValues = {};
    for (const f of FIELDS) if (dirtyFields[f]) changed[f] = values[f];
    if (Object.keys(changed).length === 0) {
      onDone();
      return;
    }
    write.mutate([{ id: line.id, version: line.version, operatingPoint: changed }], {
      onSuccess: onDone,
      onError: (error) =>
        setFormError(isStaleVersion(error) ? STALE_VERSION_MESSAGE : applyServerErrors(error, setError, FIELDS.map((f) => f))),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Operating point of ${line.refDes || 'the line'}`} className="flex flex-col gap-3 rounded-md border border-rule bg-paper p-3">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <div className="grid gap-3 sm:grid-cols-4">
        {FIELDS.map((f) => (
          <TextField
            key={f}
            label={labels[f]}
            placeholder={placeholders[f]}
            autoComplete="off"
            hint={f === 'ambientC' ? `Empty: the BOM's ${bomAmbientC} °C.` : needed.includes(f) ? 'Needed by a check.' : undefined}
            error={errors[f]?.message}
            {...register(f)}
          />
        ))}
      </div>
      <p className="text-xs text-muted">Worst case: the highest voltage across the part (DC plus AC peak, start-up overshoot), the highest continuous current, its dissipation.</p>
      <div className="flex gap-2">
        <Button type="submit" size="sm" pending={write.isPending}>
          Save operating point
        </Button>
        <Button variant="secondary" size="sm" onClick={onCancel} disabled={write.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
