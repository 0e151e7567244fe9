import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';

export const roundKeys = {
  all: queryRoots.round,
  stand: (sugarbushId: number) => [...roundKeys.all, sugarbushId] as const,
  /** A tree's advisor record nests under its detail key: a stored entry refreshes it. */
  record: (treeId: number) => [...treeDetailKeys.tree(treeId), 'record'] as const,
};
