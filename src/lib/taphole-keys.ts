import { queryRoots } from './query-roots';

export const tapholeKeys = {
  all: queryRoots.tapholes,
  lists: () => [...tapholeKeys.all, 'list'] as const,
  list: (treeId: number) => [...tapholeKeys.lists(), treeId] as const,
};
