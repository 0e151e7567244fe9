import { treeKeys } from '@/features/trees/api/tree-keys';

/**
 * A tree's advice sits under the tree's own detail key: whatever refreshes the tree (a new
 * measurement, a status change) refreshes its advice too, by prefix.
 */
export const adviceKeys = {
  tree: (treeId: number) => [...treeKeys.detail(treeId), 'advice'] as const,
  season: (treeId: number, season: number) => [...adviceKeys.tree(treeId), season] as const,
};
