import KDBush from 'kdbush';
import { around } from 'geokdbush';

export interface Waypoint {
  id: number;
  lat: number;
  lng: number;
}

/**
 * A walking order through the trees: from `start` (where the walker stands, or the first tree),
 * always on to the nearest tree not yet visited — the nearest-neighbour tour. Not the shortest
 * round, but one a person follows without a map, and it keeps neighbours together. The search
 * runs on a k-d tree (kdbush, great-circle distances by geokdbush), so a stand of tens of
 * thousands of trees is ordered in well under a second. Trees without a position keep their
 * given order at the end.
 */
export function walkingOrder<T extends { id: number; lat: number | null; lng: number | null }>(
  trees: readonly T[],
  start?: { lat: number; lng: number } | null,
): T[] {
  const placed = trees.filter(
    (t): t is T & { lat: number; lng: number } => Number.isFinite(t.lat) && Number.isFinite(t.lng),
  );
  const unplaced = trees.filter((t) => !Number.isFinite(t.lat) || !Number.isFinite(t.lng));
  if (placed.length === 0) return [...unplaced];

  const index = new KDBush(placed.length);
  for (const t of placed) index.add(t.lng, t.lat);
  index.finish();

  const visited = new Uint8Array(placed.length);
  const order: T[] = [];
  let at = start ?? { lat: placed[0].lat, lng: placed[0].lng };
  for (let n = 0; n < placed.length; n++) {
    const [next] = around(index, at.lng, at.lat, 1, Infinity, (i) => visited[i] === 0);
    visited[next] = 1;
    const tree = placed[next];
    order.push(tree);
    at = tree;
  }
  return [...order, ...unplaced];
}
