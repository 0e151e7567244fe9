import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { TreeAdvice } from '@shared/schemas/plan';
import { api } from './api-client';
import { treeDetailKeys } from './tree-detail-keys';

export const getTreeAdvice = (treeId: number, season: number, signal?: AbortSignal) =>
  api.get<TreeAdvice>(`/trees/${treeId}/advice`, { signal, query: { season } });

export const treeAdviceQueryOptions = (treeId: number, season: number) =>
  queryOptions({
    queryKey: treeDetailKeys.adviceSeason(treeId, season),
    queryFn: ({ signal }) => getTreeAdvice(treeId, season, signal),
    // Stepping through seasons keeps the last answer on screen until the next one arrives.
    placeholderData: keepPreviousData,
  });

/** The advice card and the taphole form read this one query, so the form fetches nothing extra. */
export const useTreeAdvice = (treeId: number, season: number) =>
  useQuery(treeAdviceQueryOptions(treeId, season));
