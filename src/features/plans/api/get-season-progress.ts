import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SeasonProgress } from '@shared/schemas/issued-plan';
import { api } from '@/lib/api-client';
import { issuedPlanKeys } from './issued-plan-keys';

export const getSeasonProgress = (sugarbushId: number, season: number, signal?: AbortSignal) =>
  api.get<SeasonProgress>(`/sugarbushes/${sugarbushId}/plan/progress`, {
    signal,
    query: { season },
  });

export const seasonProgressQueryOptions = (sugarbushId: number, season: number) =>
  queryOptions({
    queryKey: issuedPlanKeys.progress(sugarbushId, season),
    queryFn: ({ signal }) => getSeasonProgress(sugarbushId, season, signal),
  });

export const useSeasonProgress = (sugarbushId: number, season: number) =>
  useQuery(seasonProgressQueryOptions(sugarbushId, season));
