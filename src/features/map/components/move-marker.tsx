import L from 'leaflet';
import { useEffect, useRef } from 'react';
import { useMap } from 'react-leaflet';

export interface LatLng {
  lat: number;
  lng: number;
}

// Drawn with classes, not an image: a sap-coloured ring with an ink centre.
const moveIcon = L.divIcon({
  className: 'cw-move-marker',
  html: '<span class="block size-7 rounded-full border-4 border-ink bg-sap/70 shadow"></span>',
  iconSize: [28, 28],
  iconAnchor: [14, 14],
});

/**
 * The one draggable marker on the map, for moving the selected tree. It reports where it was
 * dropped; nothing is saved until the user confirms.
 */
export function MoveMarker({
  start,
  tag,
  onDrop,
}: {
  start: LatLng;
  tag: string;
  onDrop: (at: LatLng) => void;
}) {
  const map = useMap();
  const onDropRef = useRef(onDrop);
  useEffect(() => {
    onDropRef.current = onDrop;
  }, [onDrop]);

  useEffect(() => {
    const marker = L.marker([start.lat, start.lng], {
      icon: moveIcon,
      draggable: true,
      autoPan: true,
      keyboard: true,
      title: `Drag to move tree ${tag}`,
      alt: `Tree ${tag}, movable`,
      zIndexOffset: 1000,
    }).addTo(map);
    marker.on('dragend', () => {
      const { lat, lng } = marker.getLatLng();
      onDropRef.current({ lat, lng });
    });
    return () => {
      marker.remove();
    };
  }, [map, start.lat, start.lng, tag]);
  return null;
}
