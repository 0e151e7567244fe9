import type L from 'leaflet';
import { lazy, Suspense, useCallback, useMemo, useRef, useState } from 'react';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import type { Tree } from '@shared/schemas/tree';
import { EmptyState } from '@/components/ui/empty-state';
import { can, useRole } from '@/lib/auth';
import { useUnitSystem } from '@/lib/units';
import { initialView } from '../lib/initial-view';
import { countLegend } from '../lib/legend-counts';
import { findByTag, hasFilters, stepFrom, visibleTrees } from '../lib/map-filters';
import { isMapped, type MapStand } from '../lib/map-stand';
import { useGeolocation } from '@/lib/use-geolocation';
import { useMapParams } from '../lib/use-map-params';
import { AddTreeForm } from './add-tree-form';
import { MapBackgrounds, useBackground } from './map-backgrounds';
import { FieldTools } from './field-tools';
import { Legend } from './legend';
import type { FocusRequest } from './map-events';
import { MapToolbar } from './map-toolbar';
import type { LatLng } from './move-marker';
import { StandFigures } from './stand-figures';
import { TreeCard } from './tree-card';
import { useMapKeys } from './use-map-keys';
import { useTreeMove } from './use-tree-move';

// Leaflet and the drawing tools load beside the page, so the page itself opens at once.
const MapView = lazy(() => import('./map-view').then((m) => ({ default: m.MapView })));
const BoundaryTools = lazy(() =>
  import('./boundary-tools').then((m) => ({ default: m.BoundaryTools })),
);

const FIND_ZOOM = 18;

/** Below the lg breakpoint the card is a sheet over the lower part of the screen. */
const cardIsSheet = () => window.matchMedia?.('(max-width: 1023px)').matches ?? false;

function MapLoading() {
  return (
    <div role="status" className="grid h-full place-items-center bg-paper text-bark">
      Drawing the map…
    </div>
  );
}

interface MapWorkspaceProps {
  sugarbushId: number;
  data: MapStand;
  sugarbush: Sugarbush;
}

/** The map, its legend and card, and the tools around it. */
export function MapWorkspace({ sugarbushId, data, sugarbush }: MapWorkspaceProps) {
  const { system, unit } = useUnitSystem();
  const role = useRole(sugarbushId);
  const canEdit = can(role, 'edit-trees');
  const canEditBoundary = can(role, 'edit-boundary');
  const canUploadBasemaps = can(role, 'upload-basemaps');
  const { filters, setFilters, selectedId, select } = useMapParams();
  const [map, setMap] = useState<L.Map | null>(null);
  const [focus, setFocus] = useState<FocusRequest | null>(null);
  const [editingBoundary, setEditingBoundary] = useState(false);
  const [picking, setPicking] = useState(false);
  const [addAt, setAddAt] = useState<LatLng | null>(null);
  const geo = useGeolocation('Add the tree by clicking the map instead.');
  const move = useTreeMove(sugarbushId);
  const region = useRef<HTMLDivElement>(null);
  const mapBox = useRef<HTMLDivElement>(null);

  const { trees, mapped: mappedAll, byId } = data;
  const shown = useMemo(() => visibleTrees(mappedAll, filters), [mappedAll, filters]);
  const counts = useMemo(() => countLegend(trees, filters), [trees, filters]);
  const view = useMemo(
    () => initialView(mappedAll, sugarbush.boundary),
    // The first view only; later edits pan through the map itself.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [],
  );
  const backgrounds = useBackground(sugarbushId, mappedAll);
  const selected = selectedId === undefined ? undefined : byId.get(selectedId);
  const shownIndex = shown.findIndex((t) => t.id === selectedId);

  const choose = useCallback(
    (treeId: number | undefined, pan = false) => {
      move.cancel();
      select(treeId);
      const tree = treeId === undefined ? undefined : byId.get(treeId);
      if (!tree || !isMapped(tree)) return;
      // On a phone the card covers the lower map: bring the map up and the tree above the card.
      const upper = cardIsSheet();
      if (upper) mapBox.current?.scrollIntoView?.({ block: 'start' });
      if (pan || upper)
        setFocus((f) => ({
          lat: tree.lat,
          lng: tree.lng,
          zoom: pan ? FIND_ZOOM : undefined,
          upper,
          seq: (f?.seq ?? 0) + 1,
        }));
    },
    [move, select, byId],
  );
  const step = useCallback(
    (direction: 1 | -1) => {
      const next = stepFrom(shown, selectedId, direction);
      if (next) choose(next.id, true);
    },
    [shown, selectedId, choose],
  );

  useMapKeys({
    region,
    onStep: step,
    onZoom: (d) => (d > 0 ? map?.zoomIn() : map?.zoomOut()),
    // Esc closes the innermost thing open.
    onEscape: () => {
      if (addAt) setAddAt(null);
      else if (picking) setPicking(false);
      else if (move.moving) move.cancel();
      else if (selectedId !== undefined) select(undefined);
    },
  });

  const addHere = async () => {
    const position = geo.position ?? (await geo.locate());
    if (position) setAddAt({ lat: position.lat, lng: position.lng });
  };
  const locate = async () => {
    const position = await geo.locate();
    if (position) setFocus((f) => ({ ...position, zoom: FIND_ZOOM, seq: (f?.seq ?? 0) + 1 }));
  };
  const added = (tree: Tree) => {
    setAddAt(null);
    select(tree.id);
  };
  const startMove = (on: boolean) => {
    if (!on || !selected) return move.cancel();
    const center = map?.getCenter();
    const at = isMapped(selected) ? selected : center && { lat: center.lat, lng: center.lng };
    if (at) move.start(selected.id, { lat: at.lat, lng: at.lng });
  };

  const sheet = addAt ? (
    <AddTreeForm
      key={`${addAt.lat},${addAt.lng}`}
      sugarbushId={sugarbushId}
      at={addAt}
      onAdded={added}
      onCancel={() => setAddAt(null)}
    />
  ) : selected ? (
    <TreeCard
      tree={selected}
      season={data.season}
      unit={unit}
      canEdit={canEdit}
      move={move.moving?.treeId === selected.id ? move.state : null}
      onClose={() => choose(undefined)}
      onMoveToggle={startMove}
      onMoveSave={move.save}
    />
  ) : null;

  return (
    <div ref={region}>
      <MapToolbar
        filters={filters}
        onFilters={setFilters}
        onFind={(tag) => {
          const tree = findByTag(trees, tag);
          if (tree) choose(tree.id, true);
          return !!tree;
        }}
        onStep={step}
        position={{ index: shownIndex, count: shown.length }}
      />
      {mappedAll.length === 0 && (
        <div className="mb-4">
          <EmptyState title="No mapped trees yet — import a CSV with lat/lng or add a tree on the map" />
        </div>
      )}
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="flex min-w-0 flex-col gap-4">
          <div
            ref={mapBox}
            tabIndex={0}
            aria-label="Woods map"
            aria-describedby="woods-map-keys"
            className="isolate h-[60vh] min-h-[22rem] scroll-mt-2 overflow-hidden rounded border border-rule"
          >
            <Suspense fallback={<MapLoading />}>
              <MapView
                mapRef={setMap}
                trees={shown}
                selectedId={selectedId}
                onSelect={(id) => choose(id)}
                onClear={() => choose(undefined)}
                boundary={editingBoundary ? null : sugarbush.boundary}
                background={backgrounds.layer}
                initialBounds={view.bounds}
                refLat={view.refLat}
                focus={focus}
                position={geo.position}
                draft={addAt}
                moving={
                  move.moving && selected && move.moving.treeId === selected.id
                    ? { start: move.moving.start, tag: selected.tag, onDrop: move.drop }
                    : null
                }
                onPick={
                  picking
                    ? (at) => {
                        setPicking(false);
                        setAddAt(at);
                      }
                    : null
                }
              />
            </Suspense>
          </div>
          <p id="woods-map-keys" className="hidden text-sm text-bark md:block">
            Arrow keys step from tree to tree; + and − zoom; Esc closes the card.
          </p>
          <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
            <MapBackgrounds
              sugarbushId={sugarbushId}
              canEdit={canUploadBasemaps}
              state={backgrounds}
            />
            {canEditBoundary && (
              <Suspense fallback={null}>
                <BoundaryTools
                  sugarbushId={sugarbushId}
                  boundary={sugarbush.boundary}
                  map={map}
                  onEditingChange={setEditingBoundary}
                  system={system}
                />
              </Suspense>
            )}
            <FieldTools
              canEdit={canEdit}
              system={system}
              locating={geo.status === 'locating'}
              position={geo.position}
              message={geo.status === 'failed' ? geo.message : null}
              picking={picking}
              onLocate={() => void locate()}
              onAddHere={() => void addHere()}
              onPickToggle={(on) => {
                setAddAt(null);
                setPicking(on);
              }}
            />
          </div>
        </div>
        <aside aria-label="Map details" className="flex flex-col gap-4">
          {sheet && (
            <div className="fixed inset-x-0 bottom-14 z-30 max-h-[45vh] overflow-y-auto border-t border-rule bg-paper p-2 shadow-lg md:bottom-0 lg:static lg:max-h-none lg:overflow-visible lg:border-0 lg:p-0 lg:shadow-none">
              {sheet}
            </div>
          )}
          <Legend counts={counts} season={data.season} filtered={hasFilters(filters)} />
          <StandFigures
            sugarbushId={sugarbushId}
            season={undefined}
            system={system}
            onSelectTree={(id) => choose(id, true)}
          />
        </aside>
      </div>
    </div>
  );
}
