import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { tokenBody } from '../../../shared/schemas/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import type { NewApiToken } from '../api';
import { useCreateToken } from '../hooks';

type TokenFields = z.infer<typeof tokenBody>;

/** `blockedReason`: why the plan refuses tokens (the button is disabled and says why). */
export function CreateTokenForm({ onCreated, blockedReason = null }: { onCreated: (token: NewApiToken) => void; blockedReason?: string | null }) {
  const createToken = useCreateToken();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<TokenFields>({ resolver: zodResolver(tokenBody), defaultValues: { name: '' } });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    createToken.mutate(values, {
      onSuccess: (created) => {
        reset({ name: '' });
        onCreated(created);
      },
      onError: (error) => setFormError(applyServerErrors(error, setError, ['name'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Create an API token" className="flex flex-col gap-3">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <div className="flex flex-wrap items-start gap-3">
        <TextField
          label="Token name"
          autoComplete="off"
          hint="Say what will use it, e.g. “Nightly quote import”."
          className="min-w-64 flex-1"
          error={errors.name?.message}
          {...register('name')}
        />
        <Button
          type="submit"
          pending={createToken.isPending}
          disabled={Boolean(blockedReason)}
          aria-describedby={blockedReason ? 'create-token-blocked' : undefined}
          className="mt-6"
        >
          Create token
        </Button>
      </div>
      {blockedReason ? (
        <p id="create-token-blocked" className="text-sm text-muted">
          {blockedReason}
        </p>
      ) : null}
    </form>
  );
}
