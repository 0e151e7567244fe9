import type { QueryClient } from '@tanstack/react-query';
import { queryRoots } from '@/lib/query-roots';

/**
 * The guideline and the sunny side feed every piece of advice: the season plan, the map's
 * colours, each tree's advice and the stand's own record all follow a change of either.
 */
export const refreshStandAdvice = (queryClient: QueryClient) =>
  Promise.all(
    [queryRoots.sugarbushes, queryRoots.plans, queryRoots.map, queryRoots.trees].map((queryKey) =>
      queryClient.invalidateQueries({ queryKey }),
    ),
  );
