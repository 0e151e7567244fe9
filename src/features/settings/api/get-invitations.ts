import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Invitation } from '@shared/schemas/invitation';
import type { Page } from '@shared/schemas/list-query';
import { api } from '@/lib/api-client';
import { settingsKeys } from './settings-keys';

export const INVITATION_PAGE_SIZE = 50;

export const getInvitations = (sugarbushId: number, page: number, signal?: AbortSignal) =>
  api.get<Page<Invitation>>(`/sugarbushes/${sugarbushId}/invitations`, {
    signal,
    query: { page, pageSize: INVITATION_PAGE_SIZE },
  });

export const invitationsQueryOptions = (sugarbushId: number, page: number) =>
  queryOptions({
    queryKey: settingsKeys.invitationPage(sugarbushId, page),
    queryFn: ({ signal }) => getInvitations(sugarbushId, page, signal),
    placeholderData: keepPreviousData,
  });

/** Only the owner may list invitations: the page asks only for an owner. */
export const useInvitations = (sugarbushId: number, page: number) =>
  useQuery(invitationsQueryOptions(sugarbushId, page));
