import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router';
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
    <main className="flex min-h-screen items-start justify-center px-4 pt-16 md:items-center md:pt-0">
      <title>Sign in · Clearwood</title>
      <div className="w-full max-w-sm">
        <p className="text-lg font-bold tracking-wide">Clearwood</p>
        <h1 className="mt-6 text-xl font-bold">Sign in</h1>
        <p className="mb-6 mt-1 text-bark">Your sugarbush record, every tree and every season.</p>
        <SignInForm onSignedIn={() => navigate(next ?? paths.home.href(), { replace: true })} />
      </div>
    </main>
  );
}
