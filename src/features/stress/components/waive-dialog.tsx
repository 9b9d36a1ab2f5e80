import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { waiverBody } from '../../../shared/schemas/stress';
import { applyServerErrors } from '../../../lib/form-errors';
import { formatPercent } from '../../../lib/percent';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextareaField } from '../../../components/ui/textarea-field';
import type { StressLine } from '../api';
import { useWaiveLine } from '../hooks';
import { checkLabel } from '../words';

type Values = { reason: string };

function WaiverForm({ bomId, line, onDone, onCancel }: { bomId: string; line: StressLine; onDone: () => void; onCancel: () => void }) {
  const waive = useWaiveLine(bomId);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<Values>({ resolver: zodResolver(waiverBody), defaultValues: { reason: '' } });
  const beyond = line.checks.filter((c) => c.status === 'beyond_policy');

  const onSubmit = handleSubmit(({ reason }) => {
    setFormError(null);
    waive.mutate({ lineId: line.lineId, reason }, { onSuccess: onDone, onError: (error) => setFormError(applyServerErrors(error, setError, ['reason'])) });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <ul className="list-disc pl-5 text-sm">
        {beyond.map((c) => (
          <li key={c.check}>
            {checkLabel(c.check)} at {formatPercent(c.ratio)} of rating, over the policy&apos;s {formatPercent(c.limit)}
          </li>
        ))}
      </ul>
      <TextareaField
        label="Why is this acceptable?"
        rows={4}
        hint="At least 10 characters. Your name and the time are recorded with it, and it stays in the audit log."
        error={errors.reason?.message}
        {...register('reason')}
      />
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={waive.isPending}>
          Cancel
        </Button>
        <Button type="submit" pending={waive.isPending}>
          Record waiver
        </Button>
      </div>
    </form>
  );
}

/** A written waiver for a line beyond the policy (never for one over its rating). */
export function WaiveDialog({ bomId, line, onClose }: { bomId: string; line: StressLine | null; onClose: () => void }) {
  return (
    <Dialog
      open={line !== null}
      title={`Waive ${line?.refDes || line?.internalPn || 'line'} beyond policy`}
      description="A waiver accepts this line beyond the stress policy for release. It does not change the part or the check."
      onClose={onClose}
    >
      {line ? <WaiverForm bomId={bomId} line={line} onDone={onClose} onCancel={onClose} /> : <span />}
    </Dialog>
  );
}
