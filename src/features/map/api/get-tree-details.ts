import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TreeAdvice } from '@shared/schemas/plan';
import type { Tree } from '@shared/schemas/tree';
import { api } from '@/lib/api-client';
import { treeDetailKeys } from '@/lib/tree-detail-keys';

/**
 * What the tree card shows beyond the map's columns, asked for when a tree is chosen: the
 * tree's record and its advice for the map's season (where to drill). Under the tree's own
 * keys, so the tree page and the card share what either has loaded.
 */
export const getTreeRecord = (treeId: number, signal?: AbortSignal) =>
  api.get<Tree>(`/trees/${treeId}`, { signal });

export const getTreeSeasonAdvice = (treeId: number, season: number, signal?: AbortSignal) =>
  api.get<TreeAdvice>(`/trees/${treeId}/advice`, { signal, query: { season } });

export const treeRecordQueryOptions = (treeId: number) =>
  queryOptions({
    queryKey: treeDetailKeys.tree(treeId),
    queryFn: ({ signal }) => getTreeRecord(treeId, signal),
  });

export const treeSeasonAdviceQueryOptions = (treeId: number, season: number) =>
  queryOptions({
    queryKey: treeDetailKeys.adviceSeason(treeId, season),
    queryFn: ({ signal }) => getTreeSeasonAdvice(treeId, season, signal),
  });

export function useTreeDetails(treeId: number, season: number) {
  const record = useQuery(treeRecordQueryOptions(treeId));
  const advice = useQuery(treeSeasonAdviceQueryOptions(treeId, season));
  return { record, advice };
}
