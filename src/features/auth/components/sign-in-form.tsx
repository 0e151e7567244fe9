import { useState, type FormEvent } from 'react';
import type { MeResponse } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Field, controlClass } from '@/components/ui/field';
import { isApiError } from '@/lib/api-client';
import { loginSchema, useLogin } from '../api/login';

type Errors = Partial<Record<'email' | 'password', string>>;

function messageFor(error: unknown): string {
  if (isApiError(error)) {
    if (error.code === 'invalid-credentials')
      return "That e-mail and password don't match an account. Check both and try again.";
    if (error.code === 'too-many-attempts')
      return 'Too many sign-in attempts. Wait a few minutes, then try again.';
    if (error.status === 0) return error.message;
  }
  return "We couldn't sign you in just now. Try again in a moment.";
}

export function SignInForm({ onSignedIn }: { onSignedIn: (me: MeResponse) => void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<Errors>({});
  const login = useLogin();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = loginSchema.safeParse({ email, password });
    if (!result.success) {
      const next: Errors = {};
      for (const issue of result.error.issues) {
        const key = issue.path[0];
        if (key === 'email' || key === 'password') next[key] ??= issue.message;
      }
      setErrors(next);
      return;
    }
    setErrors({});
    login.mutate(result.data, {
      onSuccess: onSignedIn,
      onError: (error) => {
        if (isApiError(error) && error.fields) {
          setErrors({ email: error.fields.email, password: error.fields.password });
        }
      },
    });
  };

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      <Field label="E-mail" error={errors.email}>
        {(control) => (
          <input
            {...control}
            type="email"
            autoComplete="username"
            inputMode="email"
            value={email}
            onChange={(e) => setEmail(e.target.value)}
            className={controlClass}
          />
        )}
      </Field>
      <Field label="Password" error={errors.password}>
        {(control) => (
          <input
            {...control}
            type="password"
            autoComplete="current-password"
            value={password}
            onChange={(e) => setPassword(e.target.value)}
            className={controlClass}
          />
        )}
      </Field>
      {login.isError && !(isApiError(login.error) && login.error.fields) && (
        <p role="alert" className="text-alert">
          {messageFor(login.error)}
        </p>
      )}
      <Button type="submit" variant="primary" className="w-full" disabled={login.isPending}>
        Sign in
      </Button>
    </form>
  );
}
