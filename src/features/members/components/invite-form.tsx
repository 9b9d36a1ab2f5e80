import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { inviteBody, type InviteBody } from '../../../shared/schemas/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useSendInvite } from '../hooks';
import { roleOptions } from './role-options';

/** `blockedReason`: why the plan refuses another invitation now (the button is disabled and says why). */
export function InviteForm({ blockedReason = null }: { blockedReason?: string | null } = {}) {
  const sendInvite = useSendInvite();
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<InviteBody>({ resolver: zodResolver(inviteBody), defaultValues: { email: '', role: 'designer' } });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    setSentTo(null);
    sendInvite.mutate(values, {
      onSuccess: () => {
        setSentTo(values.email);
        reset({ email: '', role: values.role });
      },
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email', 'role'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Invite a member" className="flex flex-col gap-3">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      {sentTo ? <FormAlert tone="success">Invitation sent to {sentTo}.</FormAlert> : null}
      <div className="flex flex-wrap items-start gap-3">
        <TextField
          label="Email"
          type="email"
          autoComplete="off"
          className="min-w-64 flex-1"
          error={errors.email?.message}
          {...register('email')}
        />
        <SelectField label="Invite as" options={roleOptions} error={errors.role?.message} {...register('role')} />
        <Button
          type="submit"
          pending={sendInvite.isPending}
          disabled={Boolean(blockedReason)}
          aria-describedby={blockedReason ? 'invite-blocked' : undefined}
          className="mt-6"
        >
          Send invite
        </Button>
      </div>
      {blockedReason ? (
        <p id="invite-blocked" className="text-sm text-muted">
          {blockedReason}
        </p>
      ) : null}
    </form>
  );
}
