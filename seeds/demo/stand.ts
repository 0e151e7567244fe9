import type { Collection, Species } from '../../shared/schemas/enums';
import { bbox, insideRing, type Origin, type XY } from './geo';
import { Rng } from './random';
import type { TreeSpec } from './types';

/** What shapes one generated stand. */
export interface StandLayout {
  key: string;
  tagPrefix: string;
  tagDigits: number;
  origin: Origin;
  /** Boundary in local metres, open ring. */
  ring: readonly XY[];
  /** Places inside the boundary with no maples (rock outcrops, a wet seep). */
  gaps: readonly { centre: XY; radius: number }[];
  treeCount: number;
  clusterCount: number;
  clusterSd: number;
  /** Share of trees drawn around a cluster centre rather than anywhere. */
  clusteredShare: number;
  minSpacingM: number;
  /** Tags follow the crews' walking lines: east–west bands this wide, serpentine. */
  bandM: number;
  firstSeason: number;
  lastSeason: number;
  speciesAt: (xy: XY, rng: Rng) => Species;
  collectionAt: (xy: XY) => Collection;
}

function inGap(layout: StandLayout, [x, y]: XY): boolean {
  return layout.gaps.some((g) => Math.hypot(x - g.centre[0], y - g.centre[1]) < g.radius);
}

/** Tree positions: clustered like a natural stand, never closer than the minimum spacing. */
export function placeTrees(layout: StandLayout): XY[] {
  const rng = Rng.for(layout.key, 'positions');
  const [minX, minY, maxX, maxY] = bbox(layout.ring);
  const usable = (p: XY) => insideRing(layout.ring, p) && !inGap(layout, p);
  const anywhere = (): XY => [rng.range(minX, maxX), rng.range(minY, maxY)];

  const centres: XY[] = [];
  while (centres.length < layout.clusterCount) {
    const p = anywhere();
    if (usable(p)) centres.push(p);
  }

  const cell = layout.minSpacingM;
  const grid = new Map<string, XY[]>();
  const key = (x: number, y: number) => `${Math.floor(x / cell)},${Math.floor(y / cell)}`;
  const crowded = ([x, y]: XY) => {
    const cx = Math.floor(x / cell);
    const cy = Math.floor(y / cell);
    for (let i = cx - 1; i <= cx + 1; i++)
      for (let j = cy - 1; j <= cy + 1; j++)
        for (const q of grid.get(`${i},${j}`) ?? [])
          if (Math.hypot(x - q[0], y - q[1]) < layout.minSpacingM) return true;
    return false;
  };

  const points: XY[] = [];
  while (points.length < layout.treeCount) {
    let p: XY;
    if (rng.chance(layout.clusteredShare)) {
      const c = rng.pick(centres);
      p = [rng.normal(c[0], layout.clusterSd), rng.normal(c[1], layout.clusterSd)];
    } else {
      p = anywhere();
    }
    if (!usable(p) || crowded(p)) continue;
    const rounded: XY = [Math.round(p[0] * 10) / 10, Math.round(p[1] * 10) / 10];
    points.push(rounded);
    const k = key(rounded[0], rounded[1]);
    grid.set(k, [...(grid.get(k) ?? []), rounded]);
  }
  return points;
}

/** Order of tagging: north to south in bands, alternately west→east and east→west. */
export function tagOrder(layout: StandLayout, points: XY[]): XY[] {
  const maxY = Math.max(...layout.ring.map((p) => p[1]));
  const band = (p: XY) => Math.floor((maxY - p[1]) / layout.bandM);
  return [...points].sort((a, b) => {
    const ba = band(a);
    const bb = band(b);
    if (ba !== bb) return ba - bb;
    return ba % 2 === 0 ? a[0] - b[0] : b[0] - a[0];
  });
}

export const tagFor = (layout: StandLayout, n: number) =>
  `${layout.tagPrefix}-${String(n).padStart(layout.tagDigits, '0')}`;

/** A first DBH (cm) for an ordinary tree: mostly 25–60 cm, some small, a few large. */
function startingDbh(rng: Rng): number {
  const kind = rng.weighted([
    ['small', 12],
    ['main', 78],
    ['large', 8],
    ['veteran', 2],
  ] as const);
  if (kind === 'small') return rng.range(15, 30);
  if (kind === 'main') return rng.clampedNormal(41, 8, 25, 60);
  if (kind === 'large') return rng.range(58, 70);
  return rng.range(70, 78);
}

/** An ordinary, healthy tree at a position; problems are laid on top afterwards. */
export function ordinaryTree(layout: StandLayout, n: number, xy: XY): TreeSpec {
  const rng = Rng.for(layout.key, 'tree', n);
  const species = layout.speciesAt(xy, rng);
  const dbhStart = Math.round(startingDbh(rng) * 100) / 100;
  const typical = species === 'sugar-maple' ? 0.55 : species === 'red-maple' ? 0.62 : 0.5;
  let rate = rng.clampedNormal(typical, 0.17, 0.25, 1.0);
  if (dbhStart > 60) rate *= 0.85;
  return {
    n,
    tag: tagFor(layout, n),
    species,
    xy,
    collection: layout.collectionAt(xy),
    status: 'active',
    category: null,
    dbhStart,
    rate: Math.round(rate * 1000) / 1000,
    diebackBase: rng.weighted([
      [0, 55],
      [5, 30],
      [10, 12],
      [15, 3],
    ] as const),
    diebackBySeason: {},
    maxDbh: 999,
    noiseSd: 0.12,
    firstSeason: layout.firstSeason,
    measuredThrough: layout.lastSeason,
    tappedThrough: layout.lastSeason,
    noTapping: false,
    wideSpoutFrom: null,
    measureOffset: null,
    diedIn: null,
    removedOn: null,
    release: null,
    tapsOverride: null,
    sloppyFrom: null,
    measureError: null,
    stainRate: 0.04,
    measurementNotes: {},
  };
}

/** Every tree of a stand, in tag order, before any problem is applied. */
export function ordinaryStand(layout: StandLayout): TreeSpec[] {
  return tagOrder(layout, placeTrees(layout)).map((xy, i) => ordinaryTree(layout, i + 1, xy));
}
