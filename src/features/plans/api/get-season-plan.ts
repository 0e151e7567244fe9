import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { StandPlanResponse } from '@shared/schemas/plan';
import { api } from '@/lib/api-client';
import { planKeys, type PlanFilters } from './plan-keys';

export const PLAN_PAGE_SIZE = 50;

export const getSeasonPlan = (sugarbushId: number, filters: PlanFilters, signal?: AbortSignal) =>
  api.get<StandPlanResponse>(`/sugarbushes/${sugarbushId}/plan`, {
    signal,
    query: { ...filters },
  });

export const seasonPlanQueryOptions = (sugarbushId: number, filters: PlanFilters) =>
  queryOptions({
    queryKey: planKeys.list(sugarbushId, filters),
    queryFn: ({ signal }) => getSeasonPlan(sugarbushId, filters, signal),
    placeholderData: keepPreviousData,
  });

export const useSeasonPlan = (sugarbushId: number, filters: PlanFilters) =>
  useQuery(seasonPlanQueryOptions(sugarbushId, filters));
