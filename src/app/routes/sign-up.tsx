import type { QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import type { MeResponse } from '@shared/schemas/auth';
import { paths } from '@/config/paths';
import { SignUpConfirm } from '@/features/auth/components/sign-up-confirm';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { ensureMe } from '@/lib/auth';

/** Someone signed in has an account already; a mailed link (`?token=`) is always followed. */
export const signUpLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    if (new URL(request.url).searchParams.has('token')) return null;
    if (await ensureMe(queryClient)) throw redirect(paths.home.href());
    return null;
  };

export function SignUpRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');
  // A new account has no stand yet: it starts one, or waits for an invitation at home.
  const onConfirmed = useCallback(
    (me: MeResponse) =>
      navigate(me.memberships.length === 0 ? paths.newSugarbush.href() : paths.home.href(), {
        replace: true,
      }),
    [navigate],
  );
  if (token !== null) return <SignUpConfirm token={token} onConfirmed={onConfirmed} />;
  return <SignUpForm />;
}
