import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TreeAdvice } from '@shared/schemas/plan';
import { api } from '@/lib/api-client';
import { treeQueryOptions } from '@/lib/get-tree';
import { treeDetailKeys } from '@/lib/tree-detail-keys';

/**
 * What the tree card shows beyond the map's columns, asked for when a tree is chosen: the
 * tree's record and its advice for the map's season (where to drill). Under the tree's own
 * keys, so the tree page and the card share what either has loaded.
 */
export const getTreeSeasonAdvice = (treeId: number, season: number, signal?: AbortSignal) =>
  api.get<TreeAdvice>(`/trees/${treeId}/advice`, { signal, query: { season } });

export const treeSeasonAdviceQueryOptions = (treeId: number, season: number) =>
  queryOptions({
    queryKey: treeDetailKeys.adviceSeason(treeId, season),
    queryFn: ({ signal }) => getTreeSeasonAdvice(treeId, season, signal),
  });

export function useTreeDetails(treeId: number, season: number) {
  const record = useQuery(treeQueryOptions(treeId));
  const advice = useQuery(treeSeasonAdviceQueryOptions(treeId, season));
  return { record, advice };
}
