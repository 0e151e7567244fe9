import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import { env } from '@/config/env';
import { api } from '@/lib/api-client';
import { mapKeys } from './map-keys';
import type { Basemap } from '@shared/schemas/map';

export const getBasemaps = (sugarbushId: number, signal?: AbortSignal) =>
  api.get<Page<Basemap>>(`/sugarbushes/${sugarbushId}/basemaps`, {
    signal,
    query: { pageSize: 100 },
  });

export const basemapsQueryOptions = (sugarbushId: number) =>
  queryOptions({
    queryKey: mapKeys.basemaps(sugarbushId),
    queryFn: ({ signal }) => getBasemaps(sugarbushId, signal),
    staleTime: 5 * 60_000,
  });

export const useBasemaps = (sugarbushId: number) => useQuery(basemapsQueryOptions(sugarbushId));

/** The tile URL template Leaflet fills in (XYZ numbering, as the server serves it). */
export const basemapTileUrl = (basemapId: number) =>
  `${env.apiBaseUrl}/basemaps/${basemapId}/{z}/{x}/{y}`;
