import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { signupBody, type SignupBody } from '../../../shared/schemas/auth';
import { applyServerErrors } from '../../../lib/form-errors';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { TextField } from '../../../components/ui/text-field';
import { useSignup } from '../hooks';

export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const signup = useSignup();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SignupBody>({
    resolver: zodResolver(signupBody),
    defaultValues: { name: '', email: '', password: '', workspaceName: '' },
  });

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    signup.mutate(values, {
      onSuccess: onSignedUp,
      onError: (error) =>
        setFormError(applyServerErrors(error, setError, ['name', 'email', 'password', 'workspaceName'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register('name')} />
      <TextField label="Email" type="email" autoComplete="email" error={errors.email?.message} {...register('email')} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField
        label="Workspace name"
        autoComplete="organization"
        hint="Usually your company's name. You can invite your team next."
        error={errors.workspaceName?.message}
        {...register('workspaceName')}
      />
      <Button type="submit" pending={signup.isPending} className="w-full">
        Create workspace
      </Button>
    </form>
  );
}
