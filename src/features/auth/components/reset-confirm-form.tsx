import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { resetConfirmBody } from '../../../shared/schemas/auth';
import { isApiError } from '../../../lib/api-client';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useConfirmReset } from '../hooks';

const passwordFields = resetConfirmBody.omit({ token: true });
type PasswordFields = z.infer<typeof passwordFields>;

export function ResetConfirmForm({ token, onDone }: { token: string; onDone: () => void }) {
  const confirmReset = useConfirmReset();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<PasswordFields>({ resolver: zodResolver(passwordFields), defaultValues: { password: '' } });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    confirmReset.mutate(
      { token, password: values.password },
      {
        onSuccess: onDone,
        onError: (error) => {
          // A bad or used token is the link's fault, not the person's: say so plainly.
          const badLink =
            isApiError(error) &&
            (error.status === 404 || error.status === 410 || error.details.some((detail) => detail.path === 'token'));
          setFormError(
            badLink
              ? 'This reset link is not valid any more. Ask for a new one below.'
              : applyServerErrors(error, setError, ['password']),
          );
        },
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={confirmReset.isPending} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
