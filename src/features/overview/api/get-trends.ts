import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TrendsResponse } from '@shared/schemas/trends';
import { api } from '@/lib/api-client';
import { overviewKeys } from './overview-keys';

export const getTrends = (sugarbushId: number, signal?: AbortSignal) =>
  api.get<TrendsResponse>(`/sugarbushes/${sugarbushId}/trends`, { signal });

export const trendsQueryOptions = (sugarbushId: number) =>
  queryOptions({
    queryKey: overviewKeys.trends(sugarbushId),
    queryFn: ({ signal }) => getTrends(sugarbushId, signal),
  });

export const useTrends = (sugarbushId: number) => useQuery(trendsQueryOptions(sugarbushId));
