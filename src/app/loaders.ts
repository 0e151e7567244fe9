import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import type { MeResponse } from '@shared/schemas/auth';
import { paths } from '@/config/paths';
import { ensureMe } from '@/lib/auth';

/** The signed-in user, or a redirect to sign-in that comes back to the requested page. */
export async function requireMe(queryClient: QueryClient, request: Request): Promise<MeResponse> {
  const me = await ensureMe(queryClient);
  if (!me) {
    const url = new URL(request.url);
    throw redirect(paths.signIn.href(url.pathname + url.search));
  }
  return me;
}
