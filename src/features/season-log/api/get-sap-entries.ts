import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { SapList } from '@shared/schemas/sap';
import { api } from '@/lib/api-client';
import { seasonLogKeys, type SapEntriesQuery } from './season-log-keys';

/** One page of a season's sap entries, sorted and filtered by collection. */
export const getSapEntries = (sugarbushId: number, query: SapEntriesQuery, signal?: AbortSignal) =>
  api.get<SapList>(`/sugarbushes/${sugarbushId}/sap`, { signal, query });

export const sapEntriesQueryOptions = (sugarbushId: number, query: SapEntriesQuery) =>
  queryOptions({
    queryKey: seasonLogKeys.sapList(sugarbushId, query),
    queryFn: ({ signal }) => getSapEntries(sugarbushId, query, signal),
    placeholderData: keepPreviousData,
  });

export const useSapEntries = (sugarbushId: number, query: SapEntriesQuery) =>
  useQuery(sapEntriesQueryOptions(sugarbushId, query));
