export const tapholeKeys = {
  all: ['tapholes'] as const,
  lists: () => [...tapholeKeys.all, 'list'] as const,
  list: (treeId: number) => [...tapholeKeys.lists(), treeId] as const,
};
