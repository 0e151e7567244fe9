import type { Species } from '../../shared/schemas/enums';
import { insideRing, nearestOnRing, polygonGeoJson, type XY } from './geo';
import { DEMO_PROBLEM_TAGS, applyProblem, problemOf } from './problems';
import type { Rng } from './random';
import { ordinaryStand, type StandLayout } from './stand';
import { thinStand } from './thinning';
import type { TreeSpec } from './types';

/** A hollow in the south-west corner where a brook runs: wetter ground, more red maple. */
const HOLLOW: XY = [-230, -140];

function owlLedgeSpecies(xy: XY, rng: Rng): Species {
  const wet = Math.exp(-((xy[0] - HOLLOW[0]) ** 2 + (xy[1] - HOLLOW[1]) ** 2) / (2 * 80 ** 2));
  const red = 0.085 + 0.36 * wet;
  const x = rng.float();
  if (x < red) return 'red-maple';
  if (x < red + 0.006) return 'black-maple';
  if (x < red + 0.009 + 0.02 * wet) return 'silver-maple';
  if (x < red + 0.014 + 0.02 * wet) return 'other';
  return 'sugar-maple';
}

export const OWL_LEDGE: StandLayout = {
  key: 'owl-ledge',
  tagPrefix: 'OL',
  tagDigits: 4,
  // An invented spot in hill country; nothing here describes a real property.
  origin: { lat: 44.3127, lng: -72.6418 },
  // About 17.5 acres (7.1 ha) down the hill's south-west shoulder, from the ledge at the top to
  // the hollow; the sugarhouse road runs along the north-west side. Some 1,100 maples on it make
  // the basal area and the taps per acre of a managed sugarbush.
  ring: [
    [-290, -131],
    [-247, -179],
    [-165, -160],
    [-79, -117],
    [17, -69],
    [113, -45],
    [180, -11],
    [195, 56],
    [142, 104],
    [56, 94],
    [-21, 70],
    [-108, 37],
    [-194, 8],
    [-266, -40],
  ],
  gaps: [
    { centre: [60, 20], radius: 35 }, // the ledge itself: bare rock and hemlock
    { centre: [-250, -120], radius: 20 }, // a seep at the head of the brook
  ],
  treeCount: 1187,
  clusterCount: 30,
  clusterSd: 22,
  clusteredShare: 0.55,
  minSpacingM: 3.5,
  bandM: 25,
  firstSeason: 2018,
  lastSeason: 2026,
  speciesAt: owlLedgeSpecies,
  // The corner by the sugarhouse at the road's end still hangs buckets.
  collectionAt: ([x, y]) => (x < -190 && y > -60 ? 'bucket' : 'vacuum'),
};

export const OWL_LEDGE_BOUNDARY = polygonGeoJson(OWL_LEDGE.origin, OWL_LEDGE.ring);

/**
 * Share of ordinary trees whose position was never taken (the GPS lost its fix under canopy):
 * every twentieth tag. Set to false to map every tree.
 */
export const SOME_TREES_UNMAPPED = true;
const unmapped = (spec: TreeSpec) =>
  SOME_TREES_UNMAPPED && spec.category === null && spec.n % 20 === 7;

/** A mapping error: the point lands 6–14 m outside the nearest stretch of boundary. */
function pushOutside(xy: XY, n: number): XY {
  const edge = nearestOnRing(OWL_LEDGE.ring, xy);
  let dx = edge[0] - xy[0];
  let dy = edge[1] - xy[1];
  const len = Math.hypot(dx, dy) || 1;
  dx /= len;
  dy /= len;
  let out = 6 + (n % 9);
  let p: XY = [edge[0] + dx * out, edge[1] + dy * out];
  while (insideRing(OWL_LEDGE.ring, p)) {
    out += 2;
    p = [edge[0] + dx * out, edge[1] + dy * out];
  }
  return [Math.round(p[0] * 10) / 10, Math.round(p[1] * 10) / 10];
}

/** Every Owl Ledge tree with the trouble it carries. */
export function owlLedgeSpecs(): TreeSpec[] {
  const troubled = ordinaryStand(OWL_LEDGE).map((base) => {
    const category = problemOf(base.tag);
    return category ? applyProblem(base, category, OWL_LEDGE.lastSeason) : base;
  });
  return thinStand(OWL_LEDGE.key, troubled).map((spec) => {
    if (spec.category === 'outside-boundary' && spec.xy)
      return { ...spec, xy: pushOutside(spec.xy, spec.n) };
    return unmapped(spec) ? { ...spec, xy: null } : spec;
  });
}

export { DEMO_PROBLEM_TAGS };
