import type { Species, TreeStatus } from '@shared/schemas/enums';
import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';

export type TreeSort =
  'tag' | '-tag' | 'dbh' | '-dbh' | 'status' | '-status' | 'species' | '-species';

/** One register page as the API is asked for it. */
export interface TreeListFilters {
  page: number;
  pageSize: number;
  sort: TreeSort;
  q?: string;
  status?: TreeStatus;
  species?: Species;
}

export const treeKeys = {
  all: queryRoots.trees,
  lists: () => [...treeKeys.all, 'list'] as const,
  list: (sugarbushId: number, filters: TreeListFilters) =>
    [...treeKeys.lists(), sugarbushId, filters] as const,
  details: treeDetailKeys.all,
  detail: treeDetailKeys.tree,
};
