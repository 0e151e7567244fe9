import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormSubmit } from '@/components/ui/form-submit';
import { TextField } from '@/components/ui/text-field';
import { PublicPage } from '@/components/ui/public-page';
import { ActionLink, TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import {
  resetConfirmSchema,
  resetFormSchema,
  useConfirmPasswordReset,
} from '../api/confirm-password-reset';
import { accountErrorMessage, isDeadLink } from './auth-messages';

const fallback = (error: unknown) =>
  accountErrorMessage(error, "We couldn't change your password just now. Try again in a moment.");

function DeadLink() {
  return (
    <PublicPage
      title="This reset link no longer works"
      lead="It has already been used, has expired, or is incomplete. Reset links work once and only for a while."
    >
      <ActionLink to={paths.forgotPassword.href()}>Ask for a new link</ActionLink>
      <TextLink to={paths.signIn.href()}>Back to sign in</TextLink>
    </PublicPage>
  );
}

/** The mailed reset link: the new password twice, then sign in with it. */
export function ResetPasswordForm({ token }: { token: string }) {
  const wellFormed = resetConfirmSchema.shape.token.safeParse(token).success;
  const form = useForm({
    resolver: zodResolver(resetFormSchema),
    defaultValues: { password: '', passwordAgain: '' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const reset = useConfirmPasswordReset();

  const onSubmit = form.handleSubmit(({ password }) => {
    setFormError(null);
    reset.mutate(
      { token, password },
      {
        onError: (error) => {
          if (!isDeadLink(error))
            setFormError(applyServerErrors(error, form.setError, ['password'], fallback));
        },
      },
    );
  });

  if (!wellFormed || isDeadLink(reset.error)) return <DeadLink />;

  if (reset.isSuccess) {
    return (
      <PublicPage title="Your password is changed" lead="Sign in with your new password.">
        <ActionLink to={paths.signIn.href()}>Sign in</ActionLink>
      </PublicPage>
    );
  }

  return (
    <PublicPage title="Choose a new password">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        <TextField
          label="New password"
          hint="At least 10 characters."
          error={errors.password?.message}
          {...form.register('password')}
          type="password"
          autoComplete="new-password"
        />
        <TextField
          label="New password again"
          error={errors.passwordAgain?.message}
          {...form.register('passwordAgain')}
          type="password"
          autoComplete="new-password"
        />
        <FormSubmit error={formError} pending={reset.isPending} label="Save the new password" />
      </form>
    </PublicPage>
  );
}
