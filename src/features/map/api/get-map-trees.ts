import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MapColumns } from '@shared/schemas/map';
import { decodeMapStand } from '../lib/map-stand';
import { mapKeys } from './map-keys';

/** The stand's map as columns; the browser revalidates it by its ETag (a 304 when unchanged). */
export const getMapTrees = (sugarbushId: number, season?: number, signal?: AbortSignal) =>
  api.get<MapColumns>(`/sugarbushes/${sugarbushId}/map`, { signal, query: { season } });

/**
 * The cache holds the columns as sent; `select` decodes them once per new answer (an answer
 * equal to the last keeps the same data, so nothing downstream is rebuilt).
 */
export const mapTreesQueryOptions = (sugarbushId: number, season?: number) =>
  queryOptions({
    queryKey: mapKeys.trees(sugarbushId, season),
    queryFn: ({ signal }) => getMapTrees(sugarbushId, season, signal),
    select: decodeMapStand,
    staleTime: 60_000,
  });

export const useMapTrees = (sugarbushId: number, season?: number) =>
  useQuery(mapTreesQueryOptions(sugarbushId, season));
