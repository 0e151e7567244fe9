import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import type { TreeRecordAnswer } from '@shared/schemas/round';
import { api } from '@/lib/api-client';
import { roundKeys } from './round-keys';

export const getTreeRecord = (treeId: number, signal?: AbortSignal) =>
  api.get<TreeRecordAnswer>(`/trees/${treeId}/record`, { signal });

/** A tree's record as the advisor reads it; kept on the device so advice works offline. */
export const treeRecordQueryOptions = (treeId: number) =>
  queryOptions({
    queryKey: roundKeys.record(treeId),
    queryFn: ({ signal }) => getTreeRecord(treeId, signal),
    staleTime: 5 * 60_000,
  });

export const useTreeRecord = (treeId: number | undefined) =>
  useQuery({ ...treeRecordQueryOptions(treeId ?? 0), enabled: treeId !== undefined });

/** Loads the records of the trees ahead on the route, while there is a network. */
export function prefetchTreeRecords(queryClient: QueryClient, treeIds: readonly number[]) {
  for (const id of treeIds) void queryClient.prefetchQuery(treeRecordQueryOptions(id));
}
