import type { QueryClient } from '@tanstack/react-query';
import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';

/**
 * After a note changes: the notes lists and the queue, and — a hazard travels with the advice —
 * the tree's advice (the tree page, the map's card) and every plan page.
 */
export function refreshAfterNote(queryClient: QueryClient, treeId: number | null) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: queryRoots.notes }),
    queryClient.invalidateQueries({ queryKey: queryRoots.plans }),
    treeId === null
      ? undefined
      : queryClient.invalidateQueries({ queryKey: treeDetailKeys.tree(treeId) }),
  ]);
}
