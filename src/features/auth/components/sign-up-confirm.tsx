import { useEffect, useRef } from 'react';
import type { MeResponse } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { PublicPage } from '@/components/ui/public-page';
import { ActionLink, TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { registerConfirmSchema, useConfirmRegistration } from '../api/confirm-registration';
import { isDeadLink } from './auth-messages';

/**
 * The mailed sign-up link: sends its token once on opening, which makes the account and signs
 * its owner in; then `onConfirmed` moves on. A dead link says so and offers the ways forward.
 */
export function SignUpConfirm({
  token,
  onConfirmed,
}: {
  token: string;
  onConfirmed: (me: MeResponse) => void;
}) {
  const wellFormed = registerConfirmSchema.safeParse({ token }).success;
  const confirm = useConfirmRegistration();
  const { mutate } = confirm;
  // The token is single-use: send it once per page, even when effects run twice.
  const sent = useRef<string | null>(null);

  useEffect(() => {
    if (!wellFormed || sent.current === token) return;
    sent.current = token;
    mutate({ token }, { onSuccess: onConfirmed });
  }, [wellFormed, token, mutate, onConfirmed]);

  if (!wellFormed || isDeadLink(confirm.error)) {
    return (
      <PublicPage
        title="This sign-up link no longer works"
        lead="Sign-up links work once and only for a while."
      >
        <p>If you have already finished signing up, sign in. Otherwise, start again.</p>
        <ActionLink to={paths.signIn.href()}>Sign in</ActionLink>
        <TextLink to={paths.signUp.href()}>Start again</TextLink>
      </PublicPage>
    );
  }
  if (isApiError(confirm.error) && confirm.error.code === 'email-taken') {
    return (
      <PublicPage title="You already have an account" lead="An account uses this e-mail address.">
        <p>Sign in with it. If you don't remember the password, ask for a new one.</p>
        <ActionLink to={paths.signIn.href()}>Sign in</ActionLink>
        <TextLink to={paths.forgotPassword.href()}>Forgot your password?</TextLink>
      </PublicPage>
    );
  }
  if (confirm.isError) {
    return (
      <PublicPage title="We couldn't finish your sign-up" lead={confirm.error.message}>
        <Button
          variant="primary"
          className="w-full"
          onClick={() => mutate({ token }, { onSuccess: onConfirmed })}
        >
          Try again
        </Button>
      </PublicPage>
    );
  }
  return (
    <PublicPage title="Finishing your sign-up">
      <p role="status" className="text-bark">
        Making your account…
      </p>
    </PublicPage>
  );
}
