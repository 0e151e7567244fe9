import { queryOptions, useQuery } from '@tanstack/react-query';
import type { QueryClient } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth';
import type { Role } from '@shared/schemas/enums';
import { permissions, type Permission as SharedPermission } from '@shared/schemas/permissions';
import { api, isApiError, resetCsrfToken } from './api-client';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

/** The signed-in user, or null when nobody is signed in (the API answers 401). */
export async function getMe(signal?: AbortSignal): Promise<MeResponse | null> {
  try {
    return await api.get<MeResponse>('/auth/me', { signal });
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());

/** Loaders call this: the signed-in user, or null. */
export const ensureMe = (queryClient: QueryClient) => queryClient.ensureQueryData(meQueryOptions());

/**
 * After anything that signs someone in (sign-in, a confirmed sign-up, an account made from an
 * invitation): the session is new, so its CSRF token and everything cached belong to the old one.
 * `keep` names the key prefixes the page still on screen reads while it moves on.
 */
export function adoptSession(
  queryClient: QueryClient,
  me: MeResponse,
  keep: readonly string[] = [],
): void {
  resetCsrfToken();
  const kept = new Set<unknown>([authKeys.all[0], ...keep]);
  queryClient.removeQueries({ predicate: (q) => !kept.has(q.queryKey[0]) });
  queryClient.setQueryData(authKeys.me(), me);
}

/** What a role may do: the shared table the API enforces, plus reading, which every member may. */
export type Permission = SharedPermission | 'read';

const everyone: readonly Role[] = ['owner', 'forester', 'tapper', 'consultant'];

export const rolesFor = (permission: Permission): readonly Role[] =>
  permission === 'read' ? everyone : permissions[permission];

export const can = (role: Role | undefined, permission: Permission): boolean =>
  role !== undefined && rolesFor(permission).includes(role);

export { roleLabels } from '@shared/schemas/enums';

/** The user's role in one sugarbush, or undefined while unknown or when not a member. */
export function useRole(sugarbushId: number | undefined): Role | undefined {
  const { data: me } = useMe();
  if (sugarbushId === undefined) return undefined;
  return me?.memberships.find((m) => m.sugarbushId === sugarbushId)?.role;
}
