import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FormSubmit } from '@/components/ui/form-submit';
import { TextField } from '@/components/ui/text-field';
import { PublicPage } from '@/components/ui/public-page';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import { registerSchema, useRegister } from '../api/register';
import { accountErrorMessage } from './auth-messages';

const fallback = (error: unknown) =>
  accountErrorMessage(error, "We couldn't send your sign-up link just now. Try again in a moment.");

/**
 * Name, e-mail and password; then "check your inbox". The answer never says whether the address
 * already has an account: that news goes to the inbox, where only its owner reads it.
 */
export function SignUpForm() {
  const form = useForm({
    resolver: zodResolver(registerSchema),
    defaultValues: { name: '', email: '', password: '' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const registration = useRegister();

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    registration.mutate(values, {
      onSuccess: () => setSentTo(values.email),
      onError: (error) =>
        setFormError(
          applyServerErrors(error, form.setError, ['name', 'email', 'password'], fallback),
        ),
    });
  });

  if (sentTo) {
    return (
      <PublicPage title="Check your inbox" lead={`We've sent a message to ${sentTo}.`}>
        <p>
          Open the link in it to finish making your account. The link works once. If nothing arrives
          in a few minutes, look in your spam folder.
        </p>
        <Button
          variant="quiet"
          className="self-start px-0"
          onClick={() => {
            registration.reset();
            setSentTo(null);
          }}
        >
          Use a different address
        </Button>
        <TextLink to={paths.signIn.href()}>Back to sign in</TextLink>
      </PublicPage>
    );
  }

  return (
    <PublicPage
      title="Create an account"
      lead="Keep a record of every tree you tap, season after season."
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        <TextField
          label="Your name"
          error={errors.name?.message}
          {...form.register('name')}
          type="text"
          autoComplete="name"
        />
        <TextField
          label="E-mail"
          error={errors.email?.message}
          {...form.register('email')}
          type="email"
          autoComplete="email"
          inputMode="email"
        />
        <TextField
          label="Password"
          hint="At least 10 characters."
          error={errors.password?.message}
          {...form.register('password')}
          type="password"
          autoComplete="new-password"
        />
        <FormSubmit error={formError} pending={registration.isPending} label="Create account" />
      </form>
      <TextLink to={paths.signIn.href()}>Already have an account? Sign in</TextLink>
    </PublicPage>
  );
}
