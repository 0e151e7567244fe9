import L from 'leaflet';
import { useEffect, useRef } from 'react';
import { useMap } from 'react-leaflet';
import type { MappedTree } from '../lib/map-stand';
import { markerRadius, showsLetters, verdictStyle } from '../lib/verdict-style';
import { TreeMarker, type TreeMarkerLook } from './tree-marker';

interface TreeLayerProps {
  trees: readonly MappedTree[];
  selectedId: number | undefined;
  onSelect: (treeId: number) => void;
}

interface Entry {
  marker: TreeMarker;
  tree: MappedTree;
}

const lookOf = (tree: MappedTree, zoom: number, selected: boolean): TreeMarkerLook => ({
  style: verdictStyle(tree.verdict),
  radius: markerRadius(zoom) + (selected ? 2 : 0),
  showLetter: showsLetters(zoom),
  selected,
});

/**
 * Every tree as one canvas marker in a single feature group, drawn imperatively: React owns the
 * data, Leaflet owns the drawing, and the map itself is never re-created. Each tree gets its
 * marker once; new filters add and remove markers, a new answer moves or restyles only the
 * markers whose tree changed. One tooltip and one click handler on the group serve every tree.
 */
export function TreeLayer({ trees, selectedId, onSelect }: TreeLayerProps) {
  const map = useMap();
  const groupRef = useRef<L.FeatureGroup | null>(null);
  const entriesRef = useRef(new Map<number, Entry>());
  const byMarker = useRef(new WeakMap<L.Layer, Entry>());
  const selectedRef = useRef(selectedId);
  const onSelectRef = useRef(onSelect);

  useEffect(() => {
    onSelectRef.current = onSelect;
  }, [onSelect]);

  useEffect(() => {
    const group = L.featureGroup().addTo(map);
    const entryOf = (layer: L.Layer | undefined) =>
      layer ? byMarker.current.get(layer) : undefined;
    // Leaflet sets a string tooltip as HTML; a text node keeps a tag a tag, built on opening.
    group.bindTooltip((layer) => textElement(entryOf(layer)?.tree.tag ?? ''), {
      direction: 'top',
      offset: [0, -8],
      className: 'cw-tag-tip',
    });
    group.on('click', (e: L.LeafletEvent & { layer?: L.Layer }) => {
      const entry = entryOf(e.layer);
      if (entry) onSelectRef.current(entry.tree.id);
    });
    groupRef.current = group;
    const entries = entriesRef.current;
    return () => {
      group.remove();
      entries.clear();
      groupRef.current = null;
    };
  }, [map]);

  // New data or new filters: add the trees now shown, drop the others, keep the map as it is.
  useEffect(() => {
    const group = groupRef.current;
    if (!group) return;
    const entries = entriesRef.current;
    const zoom = map.getZoom();
    const shown = new Set<TreeMarker>();
    let selected: TreeMarker | undefined;
    for (const tree of trees) {
      const isSelected = tree.id === selectedRef.current;
      let entry = entries.get(tree.id);
      if (!entry) {
        const marker = new TreeMarker([tree.lat, tree.lng], lookOf(tree, zoom, isSelected), {
          bubblingMouseEvents: false,
        });
        entry = { marker, tree };
        entries.set(tree.id, entry);
        byMarker.current.set(marker, entry);
      } else if (entry.tree !== tree) {
        const before = entry.tree;
        entry.tree = tree;
        if (before.lat !== tree.lat || before.lng !== tree.lng)
          entry.marker.setLatLng([tree.lat, tree.lng]);
        if (before.verdict !== tree.verdict) entry.marker.setLook(lookOf(tree, zoom, isSelected));
      }
      shown.add(entry.marker);
      if (!group.hasLayer(entry.marker)) group.addLayer(entry.marker);
      if (isSelected) selected = entry.marker;
    }
    for (const { marker } of entries.values())
      if (!shown.has(marker) && group.hasLayer(marker)) group.removeLayer(marker);
    selected?.bringToFront();
    // For the map benchmark: every marker is in the group; the canvas paints on the next frame.
    map.getContainer().dataset.treesDrawn = String(trees.length);
    performance.mark('clearwood:trees-drawn');
  }, [map, trees]);

  // A new selection restyles two markers, not the whole stand.
  useEffect(() => {
    const previous = selectedRef.current;
    selectedRef.current = selectedId;
    if (previous === selectedId) return;
    const zoom = map.getZoom();
    const before = previous === undefined ? undefined : entriesRef.current.get(previous);
    before?.marker.setLook(lookOf(before.tree, zoom, false));
    const now = selectedId === undefined ? undefined : entriesRef.current.get(selectedId);
    if (now) {
      now.marker.setLook(lookOf(now.tree, zoom, true));
      now.marker.bringToFront();
    }
  }, [map, selectedId]);

  // Zooming changes the size of every dot and whether letters fit (hidden ones too, so a
  // marker shown again by a filter is already the right size).
  useEffect(() => {
    const onZoom = () => {
      const zoom = map.getZoom();
      for (const { marker, tree } of entriesRef.current.values()) {
        marker.setLook(lookOf(tree, zoom, tree.id === selectedRef.current));
      }
    };
    map.on('zoomend', onZoom);
    return () => {
      map.off('zoomend', onZoom);
    };
  }, [map]);

  return null;
}

function textElement(text: string): HTMLElement {
  const span = document.createElement('span');
  span.textContent = text;
  return span;
}
