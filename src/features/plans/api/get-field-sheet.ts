import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { useEffect } from 'react';
import type { FieldSheetPage } from '@shared/schemas/issued-plan';
import { api } from '@/lib/api-client';
import { issuedPlanKeys } from './issued-plan-keys';
import type { PlanFilters } from './plan-keys';

/** Lines asked for at once: the sheet of a big stand arrives in steps the page can report. */
export const SHEET_PAGE_SIZE = 500;

export type SheetFilters = Pick<PlanFilters, 'season' | 'q' | 'verdict' | 'warning' | 'share'>;

export const getFieldSheetPage = (
  sugarbushId: number,
  filters: SheetFilters,
  page: number,
  signal?: AbortSignal,
) =>
  api.get<FieldSheetPage>(`/sugarbushes/${sugarbushId}/plan/field-sheet`, {
    signal,
    query: { ...filters, page, pageSize: SHEET_PAGE_SIZE },
  });

export const fieldSheetQueryOptions = (sugarbushId: number, filters: SheetFilters) =>
  infiniteQueryOptions({
    queryKey: issuedPlanKeys.sheet(sugarbushId, filters),
    queryFn: ({ pageParam, signal }) => getFieldSheetPage(sugarbushId, filters, pageParam, signal),
    initialPageParam: 1,
    getNextPageParam: (last) =>
      last.page * last.pageSize < last.total ? last.page + 1 : undefined,
  });

/** Every line of the sheet, page after page until the last; `loaded` of `total` meanwhile. */
export function useFieldSheet(sugarbushId: number, filters: SheetFilters) {
  const query = useInfiniteQuery(fieldSheetQueryOptions(sugarbushId, filters));
  const { hasNextPage, isFetchingNextPage, isError, fetchNextPage } = query;
  useEffect(() => {
    if (hasNextPage && !isFetchingNextPage && !isError) void fetchNextPage();
  }, [hasNextPage, isFetchingNextPage, isError, fetchNextPage]);
  const pages = query.data?.pages ?? [];
  const lines = pages.flatMap((p) => p.items);
  return {
    query,
    head: pages[0],
    lines,
    loaded: lines.length,
    total: pages[0]?.total ?? 0,
    complete: pages.length > 0 && !hasNextPage,
  };
}
