import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AttentionPage } from '@shared/schemas/attention';
import { api } from '@/lib/api-client';
import { noteKeys, type AttentionFilters } from './note-keys';

export const ATTENTION_PAGE_SIZE = 25;

export const getAttention = (
  sugarbushId: number,
  filters: AttentionFilters,
  signal?: AbortSignal,
) =>
  api.get<AttentionPage>(`/sugarbushes/${sugarbushId}/attention`, {
    signal,
    query: { ...filters },
  });

export const attentionQueryOptions = (sugarbushId: number, filters: AttentionFilters) =>
  queryOptions({
    queryKey: noteKeys.attentionPage(sugarbushId, filters),
    queryFn: ({ signal }) => getAttention(sugarbushId, filters, signal),
    placeholderData: keepPreviousData,
  });

/** The stand's trees that need a look this season. */
export const useAttention = (sugarbushId: number, filters: AttentionFilters) =>
  useQuery(attentionQueryOptions(sugarbushId, filters));
