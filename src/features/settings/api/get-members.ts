import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import type { Member } from '@shared/schemas/members';
import { api } from '@/lib/api-client';
import { settingsKeys } from './settings-keys';

export const MEMBER_PAGE_SIZE = 50;

export const getMembers = (sugarbushId: number, page: number, signal?: AbortSignal) =>
  api.get<Page<Member>>(`/sugarbushes/${sugarbushId}/members`, {
    signal,
    query: { page, pageSize: MEMBER_PAGE_SIZE },
  });

export const membersQueryOptions = (sugarbushId: number, page: number) =>
  queryOptions({
    queryKey: settingsKeys.memberPage(sugarbushId, page),
    queryFn: ({ signal }) => getMembers(sugarbushId, page, signal),
    placeholderData: keepPreviousData,
  });

export const useMembers = (sugarbushId: number, page: number) =>
  useQuery(membersQueryOptions(sugarbushId, page));
