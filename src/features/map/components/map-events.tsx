import L from 'leaflet';
import { useEffect } from 'react';
import { useMap, useMapEvents } from 'react-leaflet';

export interface FocusRequest {
  lat: number;
  lng: number;
  /** Changes with every request, so asking for the same place twice still pans. */
  seq: number;
  zoom?: number;
  /** Set the point in the upper part of the map, clear of a card sheet over the lower part. */
  upper?: boolean;
}

/** Pans to a tree found by tag or stepped to, zooming in when the map is far out. */
export function FocusController({ request }: { request: FocusRequest | null }) {
  const map = useMap();
  useEffect(() => {
    if (!request) return;
    const at = L.latLng(request.lat, request.lng);
    const zoom = Math.max(map.getZoom(), request.zoom ?? 0);
    if (request.upper) {
      const shift = L.point(0, map.getSize().y * 0.25);
      map.setView(map.unproject(map.project(at, zoom).add(shift), zoom), zoom);
    } else if (zoom !== map.getZoom()) map.setView(at, zoom);
    else if (!map.getBounds().pad(-0.15).contains(at)) map.panTo(at);
  }, [map, request]);
  return null;
}

/** While picking a spot for a new tree, the next click on the map is that spot. */
export function PickPoint({ onPick }: { onPick: (at: { lat: number; lng: number }) => void }) {
  const map = useMapEvents({
    click: (event) => onPick({ lat: event.latlng.lat, lng: event.latlng.lng }),
  });
  useEffect(() => {
    const container = map.getContainer();
    container.style.cursor = 'crosshair';
    return () => {
      container.style.cursor = '';
    };
  }, [map]);
  return null;
}

/** Clicking empty ground closes the card, as Esc does. */
export function BackgroundClick({ onClick }: { onClick: () => void }) {
  useMapEvents({ click: () => onClick() });
  return null;
}
