import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AdviceStatus } from '@shared/schemas/advice-status';
import { api } from './api-client';
import { queryRoots } from './query-roots';

export const adviceStatusKeys = {
  all: [...queryRoots.sugarbushes, 'advice-status'] as const,
  of: (sugarbushId: number, season: number | undefined) =>
    [...adviceStatusKeys.all, sugarbushId, season ?? 'upcoming'] as const,
};

export const getAdviceStatus = (sugarbushId: number, season?: number, signal?: AbortSignal) =>
  api.get<AdviceStatus>(`/sugarbushes/${sugarbushId}/advice-status`, {
    query: { season },
    signal,
  });

/** Whether the stand's stored advice is current; asked every second while it is being updated. */
export const adviceStatusQueryOptions = (sugarbushId: number, season?: number) =>
  queryOptions({
    queryKey: adviceStatusKeys.of(sugarbushId, season),
    queryFn: ({ signal }) => getAdviceStatus(sugarbushId, season, signal),
    refetchInterval: (query) => (query.state.data?.state === 'updating' ? 1000 : false),
  });

/** Asked only while `waiting` (a plan or map answer is still on its way). */
export const useAdviceStatus = (
  sugarbushId: number,
  season: number | undefined,
  waiting: boolean,
) => useQuery({ ...adviceStatusQueryOptions(sugarbushId, season), enabled: waiting });
