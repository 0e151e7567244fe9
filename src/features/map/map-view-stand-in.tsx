import type { MapViewProps } from './components/map-view';

/**
 * Stands in for the Leaflet map in jsdom, which has no canvas: it lists the dots it is given as
 * buttons and offers the map's gestures (a click on the ground, a dropped marker) as buttons.
 */
export function MapView(props: MapViewProps) {
  return (
    <div data-testid="map-view" data-background={props.background.kind}>
      {props.trees.map((t) => (
        <button key={t.id} type="button" onClick={() => props.onSelect(t.id)}>
          Marker {t.tag}
        </button>
      ))}
      {props.onPick && (
        <button type="button" onClick={() => props.onPick?.({ lat: 44.3141, lng: -72.6402 })}>
          Click the ground
        </button>
      )}
      {props.moving && (
        <button type="button" onClick={() => props.moving?.onDrop({ lat: 44.3131, lng: -72.6411 })}>
          Drop the marker
        </button>
      )}
    </div>
  );
}
