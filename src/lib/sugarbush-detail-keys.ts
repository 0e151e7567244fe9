import { queryRoots } from './query-roots';

/**
 * Keys of one stand's own record. The map sets it from a boundary change's answer, and every page
 * about the stand (its map, a tree's drilling form) reads it under these.
 */
export const sugarbushDetailKeys = {
  all: () => [...queryRoots.sugarbushes, 'detail'] as const,
  sugarbush: (sugarbushId: number) => [...sugarbushDetailKeys.all(), sugarbushId] as const,
};
