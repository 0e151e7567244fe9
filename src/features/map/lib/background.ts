import type { Basemap } from '@shared/schemas/map';
import type { DemoTiles } from '../api/get-demo-tiles';

/** What is drawn under the trees: the plain grid, the demo tiles, or an uploaded basemap. */
export type BackgroundChoice = 'plain' | 'demo' | `basemap:${number}`;

const storageKey = (sugarbushId: number) => `clearwood.mapBackground.${sugarbushId}`;

export function readBackground(sugarbushId: number): BackgroundChoice {
  try {
    const value = window.localStorage.getItem(storageKey(sugarbushId));
    if (value === 'plain' || value === 'demo' || /^basemap:\d+$/.test(value ?? ''))
      return value as BackgroundChoice;
  } catch {
    // Storage unavailable: the plain grid.
  }
  return 'plain';
}

export function storeBackground(sugarbushId: number, choice: BackgroundChoice): void {
  try {
    window.localStorage.setItem(storageKey(sugarbushId), choice);
  } catch {
    // Private mode: the choice lasts for this visit.
  }
}

export const basemapIdOf = (choice: BackgroundChoice): number | undefined =>
  choice.startsWith('basemap:') ? Number(choice.slice('basemap:'.length)) : undefined;

type Bounds = readonly [number, number, number, number];

export function boundsIntersect(a: Bounds, b: Bounds): boolean {
  return a[0] <= b[2] && b[0] <= a[2] && a[1] <= b[3] && b[1] <= a[3];
}

/** [west, south, east, north] around the mapped trees, or null when none is mapped. */
export function boundsOf(points: readonly { lat: number; lng: number }[]): Bounds | null {
  if (points.length === 0) return null;
  let [w, s, e, n] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const { lat, lng } of points) {
    w = Math.min(w, lng);
    e = Math.max(e, lng);
    s = Math.min(s, lat);
    n = Math.max(n, lat);
  }
  return [w, s, e, n];
}

/** Demo tiles are offered only where they cover this stand's trees. */
export const demoCovers = (demo: DemoTiles | null | undefined, trees: Bounds | null) =>
  !!demo && !!trees && boundsIntersect(demo.bounds, trees);

/** A remembered choice that is no longer on offer falls back to the plain grid. */
export function availableBackground(
  choice: BackgroundChoice,
  offer: { demo: boolean | undefined; basemaps: readonly Basemap[] | undefined },
): BackgroundChoice {
  // While a list is still loading (undefined), keep the choice so the map doesn't flash.
  if (choice === 'demo') return offer.demo === false ? 'plain' : 'demo';
  const id = basemapIdOf(choice);
  if (id !== undefined) {
    if (!offer.basemaps) return choice;
    return offer.basemaps.some((b) => b.id === id) ? choice : 'plain';
  }
  return 'plain';
}
