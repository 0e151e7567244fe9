import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { MeResponse } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Field, controlClass } from '@/components/ui/field';
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
      <Field label="E-mail" error={errors.email?.message}>
        {(control) => (
          <input
            {...control}
            {...form.register('email')}
            type="email"
            autoComplete="username"
            inputMode="email"
            className={controlClass}
          />
        )}
      </Field>
      <Field label="Password" error={errors.password?.message}>
        {(control) => (
          <input
            {...control}
            {...form.register('password')}
            type="password"
            autoComplete="current-password"
            className={controlClass}
          />
        )}
      </Field>
      {formError && (
        <p role="alert" className="text-alert">
          {formError}
        </p>
      )}
      <Button
        type="submit"
        variant="primary"
        className="w-full"
        disabled={login.isPending}
        aria-busy={login.isPending || undefined}
      >
        Sign in
      </Button>
    </form>
  );
}
