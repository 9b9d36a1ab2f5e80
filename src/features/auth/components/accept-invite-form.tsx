import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { acceptInviteBody } from '../../../shared/schemas/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useAcceptInvite } from '../hooks';

// The token comes from the link, not from the person: the form asks for the rest.
const acceptFields = acceptInviteBody.omit({ token: true });
type AcceptFields = z.infer<typeof acceptFields>;

export function AcceptInviteForm({ token, onAccepted }: { token: string; onAccepted: () => void }) {
  const accept = useAcceptInvite();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<AcceptFields>({ resolver: zodResolver(acceptFields), defaultValues: { name: '', password: '' } });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    accept.mutate(
      { ...values, token },
      {
        onSuccess: onAccepted,
        onError: (error) => setFormError(applyServerErrors(error, setError, ['name', 'password'])),
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register('name')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={accept.isPending} className="w-full">
        Accept invite
      </Button>
    </form>
  );
}
