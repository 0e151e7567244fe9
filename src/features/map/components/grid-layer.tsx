import L from 'leaflet';
import { useEffect } from 'react';
import { useMap } from 'react-leaflet';
import { colors } from '@/lib/theme';
import { gridLines, gridStepM } from '../lib/grid';

const PANE = 'cw-grid';

/**
 * The plain background: grid lines every 10, 50, 100 or 500 m as the zoom allows, every fifth
 * one heavier, drawn on a canvas of its own beneath the trees. No tiles are fetched.
 */
export function GridLayer({ refLat }: { refLat: number }) {
  const map = useMap();

  useEffect(() => {
    if (!map.getPane(PANE)) {
      const pane = map.createPane(PANE);
      pane.style.zIndex = '250';
      pane.style.pointerEvents = 'none';
    }
    const renderer = L.canvas({ pane: PANE, padding: 0.2 });
    const group = L.layerGroup().addTo(map);

    const draw = () => {
      group.clearLayers();
      const step = gridStepM(map.getZoom(), map.getCenter().lat);
      if (step === null) return;
      const b = map.getBounds().pad(0.2);
      const view = {
        west: b.getWest(),
        south: b.getSouth(),
        east: b.getEast(),
        north: b.getNorth(),
      };
      const { meridians, parallels } = gridLines(view, step, refLat);
      const line = (major: boolean): L.PolylineOptions => ({
        renderer,
        interactive: false,
        color: major ? colors.bark : colors.rule,
        opacity: major ? 0.35 : 0.9,
        weight: 1,
      });
      for (const m of meridians)
        group.addLayer(
          L.polyline(
            [
              [view.south, m.lng],
              [view.north, m.lng],
            ],
            line(m.major),
          ),
        );
      for (const p of parallels)
        group.addLayer(
          L.polyline(
            [
              [p.lat, view.west],
              [p.lat, view.east],
            ],
            line(p.major),
          ),
        );
    };

    draw();
    map.on('moveend', draw);
    return () => {
      map.off('moveend', draw);
      group.remove();
      renderer.remove();
    };
  }, [map, refLat]);

  return null;
}
