import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Tree } from '@shared/schemas/tree';
import { api } from './api-client';
import { treeDetailKeys } from './tree-detail-keys';

export const getTree = (treeId: number, signal?: AbortSignal) =>
  api.get<Tree>(`/trees/${treeId}`, { signal });

export const treeQueryOptions = (treeId: number) =>
  queryOptions({
    queryKey: treeDetailKeys.tree(treeId),
    queryFn: ({ signal }) => getTree(treeId, signal),
  });

export const useTree = (treeId: number | undefined) =>
  useQuery({ ...treeQueryOptions(treeId ?? 0), enabled: treeId !== undefined });
