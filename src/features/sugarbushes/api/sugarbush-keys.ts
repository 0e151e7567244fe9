import { queryRoots } from '@/lib/query-roots';
import { sugarbushDetailKeys } from '@/lib/sugarbush-detail-keys';

export const sugarbushKeys = {
  all: queryRoots.sugarbushes,
  lists: () => [...sugarbushKeys.all, 'list'] as const,
  list: () => [...sugarbushKeys.lists()] as const,
  details: sugarbushDetailKeys.all,
  detail: sugarbushDetailKeys.sugarbush,
};
