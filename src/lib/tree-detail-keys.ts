import { queryRoots } from './query-roots';

/**
 * Keys of one tree's own reads: its record, and its advice per season nested under it, so
 * whatever refreshes the tree refreshes its advice too. Every feature that shows one tree (the
 * tree page, the map's card) reads under these, and shares what is already loaded.
 */
export const treeDetailKeys = {
  all: () => [...queryRoots.trees, 'detail'] as const,
  tree: (treeId: number) => [...treeDetailKeys.all(), treeId] as const,
  advice: (treeId: number) => [...treeDetailKeys.tree(treeId), 'advice'] as const,
  adviceSeason: (treeId: number, season: number) =>
    [...treeDetailKeys.advice(treeId), season] as const,
};
