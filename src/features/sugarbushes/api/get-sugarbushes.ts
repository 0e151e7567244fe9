import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { api } from '@/lib/api-client';
import { sugarbushKeys } from './sugarbush-keys';

/** The stands the user belongs to, each with the user's role there. */
export const getSugarbushes = (signal?: AbortSignal) =>
  api.get<Page<Sugarbush>>('/sugarbushes', { signal, query: { pageSize: 500 } });

export const sugarbushesQueryOptions = () =>
  queryOptions({
    queryKey: sugarbushKeys.list(),
    queryFn: ({ signal }) => getSugarbushes(signal),
    staleTime: 5 * 60_000,
  });

export const useSugarbushes = () => useQuery(sugarbushesQueryOptions());
