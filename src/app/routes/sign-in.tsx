import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { PublicPage } from '@/components/ui/public-page';
import { TextLink } from '@/components/ui/text-link';
import { paths, safeNext } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { ensureMe } from '@/lib/auth';

/** Someone already signed in goes straight on. */
export const signInLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await ensureMe(queryClient);
    if (me)
      throw redirect(safeNext(new URL(request.url).searchParams.get('next')) ?? paths.home.href());
    return null;
  };

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params.get('next'));

  return (
    <PublicPage title="Sign in" lead="Your sugarbush record, every tree and every season.">
      <SignInForm onSignedIn={() => navigate(next ?? paths.home.href(), { replace: true })} />
      <nav aria-label="Account" className="flex flex-col gap-1 md:gap-2">
        <TextLink to={paths.forgotPassword.href()}>Forgot your password?</TextLink>
        <TextLink to={paths.signUp.href()}>Create an account</TextLink>
      </nav>
    </PublicPage>
  );
}
