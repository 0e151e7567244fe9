import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { mapKeys } from './map-keys';
import type { MapResponse } from '@shared/schemas/map';

export const getMapTrees = (sugarbushId: number, season?: number, signal?: AbortSignal) =>
  api.get<MapResponse>(`/sugarbushes/${sugarbushId}/map`, { signal, query: { season } });

export const mapTreesQueryOptions = (sugarbushId: number, season?: number) =>
  queryOptions({
    queryKey: mapKeys.trees(sugarbushId, season),
    queryFn: ({ signal }) => getMapTrees(sugarbushId, season, signal),
    staleTime: 60_000,
  });

export const useMapTrees = (sugarbushId: number, season?: number) =>
  useQuery(mapTreesQueryOptions(sugarbushId, season));
