import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { resetRequestBody } from '../../../shared/schemas/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useRequestReset } from '../hooks';

type ResetRequest = z.infer<typeof resetRequestBody>;

export function ResetRequestForm() {
  const requestReset = useRequestReset();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ResetRequest>({ resolver: zodResolver(resetRequestBody), defaultValues: { email: '' } });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    requestReset.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email'])),
    });
  });

  // The server answers the same whether or not the address has an account, and so do we.
  if (requestReset.isSuccess) {
    return (
      <FormAlert tone="success">
        If an account uses that address, an e-mail with a link to choose a new password is on its way.
      </FormAlert>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="Email" type="email" autoComplete="email" error={errors.email?.message} {...register('email')} />
      <Button type="submit" pending={requestReset.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
