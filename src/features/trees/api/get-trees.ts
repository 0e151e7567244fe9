import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import type { Tree } from '@shared/schemas/tree';
import { api } from '@/lib/api-client';
import { treeKeys, type TreeListFilters } from './tree-keys';

export const TREE_PAGE_SIZE = 50;

export const getTrees = (sugarbushId: number, filters: TreeListFilters, signal?: AbortSignal) =>
  api.get<Page<Tree>>(`/sugarbushes/${sugarbushId}/trees`, { signal, query: { ...filters } });

export const treesQueryOptions = (sugarbushId: number, filters: TreeListFilters) =>
  queryOptions({
    queryKey: treeKeys.list(sugarbushId, filters),
    queryFn: ({ signal }) => getTrees(sugarbushId, filters, signal),
    placeholderData: keepPreviousData,
  });

export const useTrees = (sugarbushId: number, filters: TreeListFilters) =>
  useQuery(treesQueryOptions(sugarbushId, filters));
