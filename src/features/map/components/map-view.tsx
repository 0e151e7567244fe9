import '../lib/leaflet-setup';
import L from 'leaflet';
import { useMemo, type Ref } from 'react';
import { AttributionControl, MapContainer, ScaleControl } from 'react-leaflet';
import type { Boundary } from '@shared/schemas/sugarbush';
import { colors } from '@/lib/theme';
import type { MappedTree } from '../lib/map-stand';
import type { Position } from '@/lib/use-geolocation';
import { BackgroundLayer, MAX_MAP_ZOOM, type Background } from './background-layer';
import { BoundaryLayer } from './boundary-layer';
import { BackgroundClick, FocusController, PickPoint, type FocusRequest } from './map-events';
import { MoveMarker, type LatLng } from './move-marker';
import { DraftPoint, PositionLayer } from './position-layer';
import { TreeLayer } from './tree-layer';

export interface MapViewProps {
  mapRef: Ref<L.Map>;
  trees: readonly MappedTree[];
  selectedId: number | undefined;
  onSelect: (treeId: number) => void;
  onClear: () => void;
  boundary: Boundary | null;
  background: Background;
  /** [west, south, east, north] to open on; a wide default view without one. */
  initialBounds: readonly [number, number, number, number] | null;
  refLat: number;
  focus: FocusRequest | null;
  position: Position | null;
  /** A spot picked for a new tree, waiting for its tag. */
  draft: LatLng | null;
  moving: { start: LatLng; tag: string; onDrop: (at: LatLng) => void } | null;
  onPick: ((at: LatLng) => void) | null;
}

const DEFAULT_CENTER: L.LatLngTuple = [45, -72.5];

/** The Leaflet map: created once, with every layer drawn into it from props. */
export function MapView(props: MapViewProps) {
  const { initialBounds, background } = props;
  // The map's options apply when it is created; later changes go through its layers.
  const start = useMemo(
    () =>
      initialBounds
        ? {
            bounds: L.latLngBounds(
              [initialBounds[1], initialBounds[0]],
              [initialBounds[3], initialBounds[2]],
            ),
            boundsOptions: { padding: [24, 24] as L.PointTuple, maxZoom: 19 },
          }
        : { center: DEFAULT_CENTER, zoom: 6 },
    // eslint-disable-next-line react-hooks/exhaustive-deps -- only the first view matters
    [],
  );
  const renderer = useMemo(() => L.canvas({ tolerance: 6, padding: 0.3 }), []);

  return (
    <MapContainer
      ref={props.mapRef}
      {...start}
      preferCanvas
      renderer={renderer}
      keyboard={false}
      attributionControl={false}
      maxZoom={MAX_MAP_ZOOM}
      minZoom={3}
      className="h-full w-full"
      style={{ background: background.kind === 'plain' ? colors.paper : colors.frost }}
    >
      <BackgroundLayer background={background} refLat={props.refLat} />
      <ScaleControl position="bottomleft" metric imperial />
      <AttributionControl position="bottomright" prefix="Leaflet" />
      <BoundaryLayer boundary={props.boundary} />
      <TreeLayer trees={props.trees} selectedId={props.selectedId} onSelect={props.onSelect} />
      <PositionLayer position={props.position} />
      <DraftPoint at={props.draft} />
      {props.moving && (
        <MoveMarker
          start={props.moving.start}
          tag={props.moving.tag}
          onDrop={props.moving.onDrop}
        />
      )}
      <FocusController request={props.focus} />
      {props.onPick ? (
        <PickPoint onPick={props.onPick} />
      ) : (
        <BackgroundClick onClick={props.onClear} />
      )}
    </MapContainer>
  );
}
