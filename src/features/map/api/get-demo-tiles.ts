import { queryOptions, useQuery } from '@tanstack/react-query';
import { mapKeys } from './map-keys';

/** The description shipped beside the demo stand's static tiles. */
export interface DemoTiles {
  name: string;
  minZoom: number;
  maxZoom: number;
  /** [west, south, east, north] */
  bounds: [number, number, number, number];
  attribution: string;
}

export const DEMO_TILES_BASE = '/tiles/owl-ledge';
export const demoTileUrl = `${DEMO_TILES_BASE}/{z}/{x}/{y}.png`;

const isBounds = (value: unknown): value is [number, number, number, number] =>
  Array.isArray(value) && value.length === 4 && value.every((n) => Number.isFinite(n));

/**
 * The demo stand's static tiles, described by a tiles.json shipped with the app. Null when the
 * file is missing or unreadable: then there are simply no demo tiles to offer.
 */
export async function getDemoTiles(signal?: AbortSignal): Promise<DemoTiles | null> {
  let response: Response;
  try {
    response = await fetch(`${DEMO_TILES_BASE}/tiles.json`, {
      signal,
      credentials: 'same-origin',
      headers: { Accept: 'application/json' },
    });
  } catch (error) {
    if ((error as { name?: string }).name === 'AbortError') throw error;
    return null;
  }
  if (!response.ok) return null;
  try {
    const body = (await response.json()) as Partial<DemoTiles>;
    if (!isBounds(body.bounds)) return null;
    return {
      name: typeof body.name === 'string' ? body.name : 'Demo tiles',
      minZoom: Number.isFinite(body.minZoom) ? Number(body.minZoom) : 0,
      maxZoom: Number.isFinite(body.maxZoom) ? Number(body.maxZoom) : 19,
      bounds: body.bounds,
      attribution: typeof body.attribution === 'string' ? body.attribution : '',
    };
  } catch {
    // An HTML fallback page or a broken file: no demo tiles.
    return null;
  }
}

export const demoTilesQueryOptions = () =>
  queryOptions({
    queryKey: mapKeys.demoTiles(),
    queryFn: ({ signal }) => getDemoTiles(signal),
    staleTime: Infinity,
  });

export const useDemoTiles = () => useQuery(demoTilesQueryOptions());
