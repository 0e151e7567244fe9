import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { api } from './api-client';
import { sugarbushDetailKeys } from './sugarbush-detail-keys';

export const getSugarbush = (id: number, signal?: AbortSignal) =>
  api.get<Sugarbush>(`/sugarbushes/${id}`, { signal });

export const sugarbushQueryOptions = (id: number) =>
  queryOptions({
    queryKey: sugarbushDetailKeys.sugarbush(id),
    queryFn: ({ signal }) => getSugarbush(id, signal),
    staleTime: 5 * 60_000,
  });

export const useSugarbush = (id: number | undefined) =>
  useQuery({ ...sugarbushQueryOptions(id ?? 0), enabled: id !== undefined });
