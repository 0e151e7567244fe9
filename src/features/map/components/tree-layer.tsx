import L from 'leaflet';
import { useEffect, useRef } from 'react';
import { useMap } from 'react-leaflet';
import type { MapTree, MappedTree } from '../lib/map-stand';
import { markerRadius, showsLetters, verdictStyle } from '../lib/verdict-style';
import { TreeMarker, type TreeMarkerLook } from './tree-marker';

interface TreeLayerProps {
  trees: readonly MappedTree[];
  selectedId: number | undefined;
  onSelect: (treeId: number) => void;
}

const lookOf = (tree: MapTree, zoom: number, selected: boolean): TreeMarkerLook => ({
  style: verdictStyle(tree.verdict),
  radius: markerRadius(zoom) + (selected ? 2 : 0),
  showLetter: showsLetters(zoom),
  selected,
});

/**
 * Every tree as one canvas marker in a single layer group, drawn imperatively: React owns the
 * data, Leaflet owns the drawing, and the map itself is never re-created.
 */
export function TreeLayer({ trees, selectedId, onSelect }: TreeLayerProps) {
  const map = useMap();
  const groupRef = useRef<L.LayerGroup | null>(null);
  const markersRef = useRef(new Map<number, { marker: TreeMarker; tree: MappedTree }>());
  const selectedRef = useRef(selectedId);
  const onSelectRef = useRef(onSelect);

  useEffect(() => {
    onSelectRef.current = onSelect;
  }, [onSelect]);

  useEffect(() => {
    const group = L.layerGroup().addTo(map);
    groupRef.current = group;
    const markers = markersRef.current;
    return () => {
      group.remove();
      markers.clear();
      groupRef.current = null;
    };
  }, [map]);

  // New data or new filters: redraw the dots, keeping the map as it is.
  useEffect(() => {
    const group = groupRef.current;
    if (!group) return;
    group.clearLayers();
    const markers = markersRef.current;
    markers.clear();
    const zoom = map.getZoom();
    let selected: TreeMarker | undefined;
    for (const tree of trees) {
      const isSelected = tree.id === selectedRef.current;
      const marker = new TreeMarker([tree.lat, tree.lng], lookOf(tree, zoom, isSelected), {
        bubblingMouseEvents: false,
      });
      // Leaflet sets a string tooltip as HTML; a text node keeps a tag a tag, built on opening.
      marker.bindTooltip(() => textElement(tree.tag), {
        direction: 'top',
        offset: [0, -8],
        className: 'cw-tag-tip',
      });
      marker.on('click', () => onSelectRef.current(tree.id));
      group.addLayer(marker);
      markers.set(tree.id, { marker, tree });
      if (isSelected) selected = marker;
    }
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
    const before = previous === undefined ? undefined : markersRef.current.get(previous);
    before?.marker.setLook(lookOf(before.tree, zoom, false));
    const now = selectedId === undefined ? undefined : markersRef.current.get(selectedId);
    if (now) {
      now.marker.setLook(lookOf(now.tree, zoom, true));
      now.marker.bringToFront();
    }
  }, [map, selectedId]);

  // Zooming changes the size of every dot and whether letters fit.
  useEffect(() => {
    const onZoom = () => {
      const zoom = map.getZoom();
      for (const { marker, tree } of markersRef.current.values()) {
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
