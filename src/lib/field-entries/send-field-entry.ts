import type { QueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';
import { treeListKeys } from '@/lib/tree-list-keys';
import { fieldEntryKeys, type FieldEntry, type FieldEntryResult } from './field-entry';

export function sendFieldEntry(entry: FieldEntry): Promise<FieldEntryResult> {
  const body = { ...entry.input, clientId: entry.clientId };
  return entry.kind === 'measurement'
    ? api.post(`/trees/${entry.treeId}/measurements`, body)
    : api.post(`/trees/${entry.treeId}/tapholes`, body);
}

/** What a stored entry moves: the tree's record and advice, the register, the plan, the map. */
export function refreshAfterFieldEntry(queryClient: QueryClient, entry: FieldEntry) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: treeDetailKeys.tree(entry.treeId) }),
    queryClient.invalidateQueries({
      queryKey: entry.kind === 'measurement' ? queryRoots.measurements : queryRoots.tapholes,
    }),
    queryClient.invalidateQueries({ queryKey: treeListKeys.all() }),
    queryClient.invalidateQueries({ queryKey: queryRoots.plans }),
    queryClient.invalidateQueries({ queryKey: queryRoots.map }),
  ]);
}

/**
 * Registered once on the app's query client, so a mutation restored after a reload knows how to
 * send itself (a restored mutation has its variables but not the component's function).
 */
export function registerFieldEntryDefaults(queryClient: QueryClient): void {
  queryClient.setMutationDefaults(fieldEntryKeys.all, {
    mutationFn: (entry: FieldEntry) => sendFieldEntry(entry),
    onSuccess: (_result: unknown, entry: FieldEntry) => refreshAfterFieldEntry(queryClient, entry),
  });
}
