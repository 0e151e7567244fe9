import L from 'leaflet';
import { useEffect } from 'react';
import { useMap } from 'react-leaflet';
import type { Boundary } from '@shared/schemas/sugarbush';
import { colors } from '@/lib/theme';

export const BOUNDARY_PANE = 'cw-boundary';

/** Boundary outlines sit above the background and below the trees, drawn as SVG. */
export function boundaryRenderer(map: L.Map): L.Renderer {
  if (!map.getPane(BOUNDARY_PANE)) map.createPane(BOUNDARY_PANE).style.zIndex = '350';
  return L.svg({ pane: BOUNDARY_PANE, padding: 0.3 });
}

export const boundaryStyle = (renderer?: L.Renderer): L.PathOptions => ({
  renderer,
  color: colors.bark,
  weight: 2.5,
  opacity: 0.9,
  fillColor: colors.bark,
  fillOpacity: 0.04,
  interactive: false,
});

/** The stand's boundary as a bark-coloured outline. */
export function BoundaryLayer({ boundary }: { boundary: Boundary | null }) {
  const map = useMap();
  useEffect(() => {
    if (!boundary) return;
    const layer = L.geoJSON(boundary, { style: boundaryStyle(boundaryRenderer(map)) }).addTo(map);
    return () => {
      layer.remove();
    };
  }, [map, boundary]);
  return null;
}
