import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { MeResponse } from '@shared/schemas/auth';
import { FormSubmit } from '@/components/ui/form-submit';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { loginSchema, useLogin } from '../api/login';
import { accountErrorMessage } from './auth-messages';

const fallback = (error: unknown) =>
  accountErrorMessage(error, "We couldn't sign you in just now. Try again in a moment.");

export function SignInForm({ onSignedIn }: { onSignedIn: (me: MeResponse) => void }) {
  const form = useForm({
    resolver: zodResolver(loginSchema),
    defaultValues: { email: '', password: '' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const login = useLogin();

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    login.mutate(values, {
      onSuccess: onSignedIn,
      onError: (error) =>
        setFormError(applyServerErrors(error, form.setError, ['email', 'password'], fallback)),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      <TextField
        label="E-mail"
        error={errors.email?.message}
        {...form.register('email')}
        type="email"
        autoComplete="username"
        inputMode="email"
      />
      <TextField
        label="Password"
        error={errors.password?.message}
        {...form.register('password')}
        type="password"
        autoComplete="current-password"
      />
      <FormSubmit error={formError} pending={login.isPending} label="Sign in" />
    </form>
  );
}
