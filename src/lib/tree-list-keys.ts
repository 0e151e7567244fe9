import { queryRoots } from './query-roots';

/**
 * The prefix of every page of a stand's tree register. A write that changes what a row shows (a
 * new tree, a DBH, a place on the map) refreshes every page by it, wherever the write is made.
 */
export const treeListKeys = {
  all: () => [...queryRoots.trees, 'list'] as const,
};
