import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { IssuedPlanResponse } from '@shared/schemas/issued-plan';
import { api, isApiError } from '@/lib/api-client';
import { issuedPlanKeys } from './issued-plan-keys';

export const CHANGES_PAGE_SIZE = 25;

/** The season's latest issued plan, or null when none was issued (the API's 404). */
export async function getIssuedPlan(
  sugarbushId: number,
  season: number,
  changesPage: number,
  signal?: AbortSignal,
): Promise<IssuedPlanResponse | null> {
  try {
    return await api.get<IssuedPlanResponse>(`/sugarbushes/${sugarbushId}/issued-plans/${season}`, {
      signal,
      // The page shows the changes; the frozen items are read by the field sheet.
      query: { pageSize: 1, changesPage, changesPageSize: CHANGES_PAGE_SIZE },
    });
  } catch (error) {
    if (isApiError(error) && error.status === 404 && error.code === 'not-found') return null;
    throw error;
  }
}

export const issuedPlanQueryOptions = (sugarbushId: number, season: number, changesPage: number) =>
  queryOptions({
    queryKey: issuedPlanKeys.detail(sugarbushId, season, 1, changesPage),
    queryFn: ({ signal }) => getIssuedPlan(sugarbushId, season, changesPage, signal),
    placeholderData: keepPreviousData,
  });

export const useIssuedPlan = (sugarbushId: number, season: number, changesPage: number) =>
  useQuery(issuedPlanQueryOptions(sugarbushId, season, changesPage));
