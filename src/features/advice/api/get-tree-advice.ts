import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { TreeAdvice } from '@shared/schemas/plan';
import { api } from '@/lib/api-client';
import { adviceKeys } from './advice-keys';

export const getTreeAdvice = (treeId: number, season: number, signal?: AbortSignal) =>
  api.get<TreeAdvice>(`/trees/${treeId}/advice`, { signal, query: { season } });

export const treeAdviceQueryOptions = (treeId: number, season: number) =>
  queryOptions({
    queryKey: adviceKeys.season(treeId, season),
    queryFn: ({ signal }) => getTreeAdvice(treeId, season, signal),
    // Stepping through seasons keeps the last answer on screen until the next one arrives.
    placeholderData: keepPreviousData,
  });

export const useTreeAdvice = (treeId: number, season: number) =>
  useQuery(treeAdviceQueryOptions(treeId, season));
