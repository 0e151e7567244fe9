import { distance } from '@turf/turf';
import type { LngLat } from './boundary';

export interface DistanceSummary {
  mean: number;
  median: number;
  min: number;
  max: number;
}

/** turf's mean Earth radius, so the search's metres agree with `distance`. */
const EARTH_RADIUS_M = 6_371_008.8;
const LEAF = 8;
const DIMS = 3;

/**
 * A static 3-d tree over points on the sphere as Cartesian coordinates (metres from the Earth's
 * centre), stored implicitly in one index array: the node of a range is its middle element, the
 * left half lies below it on the range's axis, the right half above.
 */
class KdTree {
  readonly ids: Int32Array;

  constructor(readonly coords: Float64Array) {
    this.ids = Int32Array.from({ length: coords.length / DIMS }, (_, i) => i);
    this.build(0, this.ids.length - 1, 0);
  }

  private at(id: number, axis: number) {
    return this.coords[id * DIMS + axis];
  }

  private build(lo: number, hi: number, axis: number) {
    if (hi - lo <= LEAF) return;
    const mid = (lo + hi) >> 1;
    this.select(mid, lo, hi, axis);
    const next = (axis + 1) % DIMS;
    this.build(lo, mid - 1, next);
    this.build(mid + 1, hi, next);
  }

  private swap(i: number, j: number) {
    const t = this.ids[i];
    this.ids[i] = this.ids[j];
    this.ids[j] = t;
  }

  /** Quickselect (Hoare partition): the k-th smallest on `axis` at k, smaller before, larger after. */
  private select(k: number, lo: number, hi: number, axis: number) {
    const { ids } = this;
    while (hi > lo) {
      const pivot = this.at(ids[k], axis);
      let i = lo;
      let j = hi;
      this.swap(lo, k);
      if (this.at(ids[hi], axis) > pivot) this.swap(lo, hi);
      while (i < j) {
        this.swap(i, j);
        i++;
        j--;
        while (this.at(ids[i], axis) < pivot) i++;
        while (this.at(ids[j], axis) > pivot) j--;
      }
      if (this.at(ids[lo], axis) === pivot) this.swap(lo, j);
      else {
        j++;
        this.swap(j, hi);
      }
      if (j <= k) lo = j + 1;
      if (k <= j) hi = j - 1;
    }
  }

  /** The point nearest to point `self` (by straight-line distance), other than itself. */
  nearest(self: number): number {
    const { ids } = this;
    const q = [0, 1, 2].map((a) => this.at(self, a));
    let best = -1;
    let bestD2 = Infinity;
    const consider = (id: number) => {
      if (id === self) return;
      let d2 = 0;
      for (let a = 0; a < DIMS; a++) d2 += (this.at(id, a) - q[a]) ** 2;
      if (d2 < bestD2) {
        bestD2 = d2;
        best = id;
      }
    };
    const search = (lo: number, hi: number, axis: number) => {
      if (hi - lo <= LEAF) {
        for (let k = lo; k <= hi; k++) consider(ids[k]);
        return;
      }
      const mid = (lo + hi) >> 1;
      consider(ids[mid]);
      const delta = q[axis] - this.at(ids[mid], axis);
      const next = (axis + 1) % DIMS;
      if (delta < 0) {
        search(lo, mid - 1, next);
        if (delta * delta < bestD2) search(mid + 1, hi, next);
      } else {
        search(mid + 1, hi, next);
        if (delta * delta < bestD2) search(lo, mid - 1, next);
      }
    };
    search(0, ids.length - 1, 0);
    return best;
  }
}

/**
 * Each point's distance in metres to its nearest other point (turf `distance`, great circle).
 *
 * The neighbour is found with a 3-d tree over the points as positions in space on a sphere of
 * turf's radius: the straight line through the Earth grows with the great-circle distance, so
 * the nearest by one is the nearest by the other, anywhere on the globe. O(n log n) however the
 * trees cluster, instead of comparing every pair.
 */
export function nearestNeighbourDistances(points: readonly LngLat[]): number[] {
  const n = points.length;
  if (n < 2) return [];
  const coords = new Float64Array(n * DIMS);
  points.forEach(([lng, lat], i) => {
    const l = (lng * Math.PI) / 180;
    const f = (lat * Math.PI) / 180;
    coords[i * DIMS] = EARTH_RADIUS_M * Math.cos(f) * Math.cos(l);
    coords[i * DIMS + 1] = EARTH_RADIUS_M * Math.cos(f) * Math.sin(l);
    coords[i * DIMS + 2] = EARTH_RADIUS_M * Math.sin(f);
  });
  const tree = new KdTree(coords);
  return points.map((p, i) => distance(p, points[tree.nearest(i)], { units: 'meters' }));
}

/** Mean, median, min and max of the nearest-neighbour distances (m); null for fewer than two points. */
export function nearestNeighbourSummary(points: readonly LngLat[]): DistanceSummary | null {
  const d = nearestNeighbourDistances(points);
  if (d.length === 0) return null;
  const sorted = Float64Array.from(d).sort();
  const mid = sorted.length >> 1;
  const median = sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
  const sum = d.reduce((s, x) => s + x, 0);
  return { mean: sum / d.length, median, min: sorted[0], max: sorted[sorted.length - 1] };
}
