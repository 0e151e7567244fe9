import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormSubmit } from '@/components/ui/form-submit';
import { TextField } from '@/components/ui/text-field';
import { PublicPage } from '@/components/ui/public-page';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import { resetRequestSchema, useRequestPasswordReset } from '../api/request-password-reset';
import { accountErrorMessage } from './auth-messages';

const fallback = (error: unknown) =>
  accountErrorMessage(error, "We couldn't send a reset link just now. Try again in a moment.");

/** One e-mail field; the answer reads the same for every address, known or not. */
export function ForgotPasswordForm() {
  const form = useForm({
    resolver: zodResolver(resetRequestSchema),
    defaultValues: { email: '' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const request = useRequestPasswordReset();

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    request.mutate(values, {
      onSuccess: () => setSentTo(values.email),
      onError: (error) =>
        setFormError(applyServerErrors(error, form.setError, ['email'], fallback)),
    });
  });

  if (sentTo) {
    return (
      <PublicPage title="Check your inbox">
        <p>
          If an account uses {sentTo}, we've sent it a link to choose a new password. The link works
          once. If nothing arrives in a few minutes, look in your spam folder.
        </p>
        <TextLink to={paths.signIn.href()}>Back to sign in</TextLink>
      </PublicPage>
    );
  }

  return (
    <PublicPage
      title="Forgot your password?"
      lead="Enter the e-mail you sign in with and we'll send you a link to choose a new password."
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        <TextField
          label="E-mail"
          error={errors.email?.message}
          {...form.register('email')}
          type="email"
          autoComplete="username"
          inputMode="email"
        />
        <FormSubmit error={formError} pending={request.isPending} label="Send the link" />
      </form>
      <TextLink to={paths.signIn.href()}>Back to sign in</TextLink>
    </PublicPage>
  );
}
