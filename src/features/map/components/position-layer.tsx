import L from 'leaflet';
import { useEffect } from 'react';
import { useMap } from 'react-leaflet';
import { colors } from '@/lib/theme';
import type { Position } from '@/lib/use-geolocation';
import type { LatLng } from './move-marker';

/** Where the device is: a dot, and a circle as wide as the fix is uncertain. */
export function PositionLayer({ position }: { position: Position | null }) {
  const map = useMap();
  useEffect(() => {
    if (!position) return;
    const at: L.LatLngExpression = [position.lat, position.lng];
    const group = L.layerGroup([
      L.circle(at, {
        radius: position.accuracyM,
        color: colors.moss,
        weight: 1,
        fillColor: colors.moss,
        fillOpacity: 0.12,
        interactive: false,
      }),
      L.circleMarker(at, {
        radius: 7,
        color: colors.paper,
        weight: 3,
        fillColor: colors.moss,
        fillOpacity: 1,
        interactive: false,
      }),
    ]).addTo(map);
    return () => {
      group.remove();
    };
  }, [map, position]);
  return null;
}

/** Where a new tree will go, until its form is sent or cancelled. */
export function DraftPoint({ at }: { at: LatLng | null }) {
  const map = useMap();
  useEffect(() => {
    if (!at) return;
    const marker = L.circleMarker([at.lat, at.lng], {
      radius: 9,
      color: colors.ink,
      weight: 2,
      dashArray: '3 3',
      fillColor: colors.sap,
      fillOpacity: 0.6,
      interactive: false,
    }).addTo(map);
    return () => {
      marker.remove();
    };
  }, [map, at]);
  return null;
}
