import { queryRoots } from '@/lib/query-roots';

export const measurementKeys = {
  all: queryRoots.measurements,
  lists: () => [...measurementKeys.all, 'list'] as const,
  list: (treeId: number) => [...measurementKeys.lists(), treeId] as const,
};
