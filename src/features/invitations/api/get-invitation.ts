import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationPreview } from '@shared/schemas/invitation';
import { api } from '@/lib/api-client';
import { invitationKeys } from './invitation-keys';

/** What an invitation link offers; anyone holding the link may read it, signed in or not. */
export const getInvitation = (token: string, signal?: AbortSignal) =>
  api.get<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`, { signal });

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: invitationKeys.detail(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    // Read afresh on every visit: the link may have been used or withdrawn since.
    staleTime: 0,
  });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
