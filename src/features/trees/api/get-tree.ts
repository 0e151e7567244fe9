import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Tree } from '@shared/schemas/tree';
import { api } from '@/lib/api-client';
import { treeKeys } from './tree-keys';

export const getTree = (treeId: number, signal?: AbortSignal) =>
  api.get<Tree>(`/trees/${treeId}`, { signal });

export const treeQueryOptions = (treeId: number) =>
  queryOptions({
    queryKey: treeKeys.detail(treeId),
    queryFn: ({ signal }) => getTree(treeId, signal),
  });

export const useTree = (treeId: number | undefined) =>
  useQuery({ ...treeQueryOptions(treeId ?? 0), enabled: treeId !== undefined });
