import L from 'leaflet';
import { TileLayer } from 'react-leaflet';
import { basemapTileUrl } from '../api/get-basemaps';
import { demoTileUrl } from '../api/get-demo-tiles';
import type { Basemap } from '@shared/schemas/map';
import type { DemoTiles } from '../api/get-demo-tiles';
import { GridLayer } from './grid-layer';

export type Background =
  { kind: 'plain' } | { kind: 'demo'; demo: DemoTiles } | { kind: 'basemap'; basemap: Basemap };

export const MAX_MAP_ZOOM = 22;

const toLatLngBounds = ([w, s, e, n]: readonly [number, number, number, number]) =>
  L.latLngBounds([s, w], [n, e]);

/** Under the trees: the drawn grid, or raster tiles from this server and nowhere else. */
export function BackgroundLayer({
  background,
  refLat,
}: {
  background: Background;
  refLat: number;
}) {
  if (background.kind === 'demo') {
    const { demo } = background;
    return (
      <TileLayer
        key="demo"
        url={demoTileUrl}
        bounds={toLatLngBounds(demo.bounds)}
        minZoom={Math.max(0, demo.minZoom - 3)}
        maxNativeZoom={demo.maxZoom}
        maxZoom={MAX_MAP_ZOOM}
        attribution={demo.attribution}
      />
    );
  }
  if (background.kind === 'basemap') {
    const { basemap } = background;
    return (
      <TileLayer
        key={`basemap-${basemap.id}`}
        url={basemapTileUrl(basemap.id)}
        bounds={toLatLngBounds(basemap.bounds)}
        minNativeZoom={basemap.minZoom}
        maxNativeZoom={basemap.maxZoom}
        maxZoom={MAX_MAP_ZOOM}
      />
    );
  }
  return <GridLayer refLat={refLat} />;
}
