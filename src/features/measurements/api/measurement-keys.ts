export const measurementKeys = {
  all: ['measurements'] as const,
  lists: () => [...measurementKeys.all, 'list'] as const,
  list: (treeId: number) => [...measurementKeys.lists(), treeId] as const,
};
