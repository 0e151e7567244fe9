import type { Species, TreeStatus } from '@shared/schemas/enums';
import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';
import { treeListKeys } from '@/lib/tree-list-keys';

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
  /** A 5 % crown-dieback class: the latest rating's, or the rating of `diebackSeason`. */
  dieback?: number;
  diebackSeason?: number;
}

export const treeKeys = {
  all: queryRoots.trees,
  lists: treeListKeys.all,
  list: (sugarbushId: number, filters: TreeListFilters) =>
    [...treeKeys.lists(), sugarbushId, filters] as const,
  details: treeDetailKeys.all,
  detail: treeDetailKeys.tree,
};
