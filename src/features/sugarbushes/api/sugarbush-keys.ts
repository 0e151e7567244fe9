import { queryRoots } from '@/lib/query-roots';

export const sugarbushKeys = {
  all: queryRoots.sugarbushes,
  lists: () => [...sugarbushKeys.all, 'list'] as const,
  list: () => [...sugarbushKeys.lists()] as const,
  details: () => [...sugarbushKeys.all, 'detail'] as const,
  detail: (id: number) => [...sugarbushKeys.details(), id] as const,
};
