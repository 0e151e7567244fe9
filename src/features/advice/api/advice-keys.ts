import { treeDetailKeys } from '@/lib/tree-detail-keys';

/**
 * A tree's advice sits under the tree's own detail key: whatever refreshes the tree (a new
 * measurement, a status change) refreshes its advice too, by prefix.
 */
export const adviceKeys = {
  tree: treeDetailKeys.advice,
  season: treeDetailKeys.adviceSeason,
};
