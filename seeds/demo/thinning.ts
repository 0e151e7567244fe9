import type { XY } from './geo';
import { Rng } from './random';
import type { TreeSpec } from './types';

/**
 * The crop-tree thinning of the winter after the 2021 round: the crew cut about one tree in seven,
 * the ones crowding a bigger neighbour, red maples and thin crowns first, so the best sugar
 * maples had room. Cut trees keep their tags with the status `removed`; the trees around each
 * stump grow faster from the 2022 summer on.
 */
export const THINNING = {
  /** The last autumn round before the cut. */
  lastRound: 2021,
  /** The first summer after it. */
  firstSeason: 2022,
  /** Felling began on this day of January 2022 and went on at about a dozen trees a day. */
  startDay: 10,
  treesPerDay: 12,
  share: 0.14,
} as const;

/** Neighbours closer than this crowd each other's crowns. */
const CROWDING_M = 7;
/** A tree within this distance of a stump has its crown released. */
const RELEASE_M = 9;

const near = (a: XY, b: XY, m: number) => Math.hypot(a[0] - b[0], a[1] - b[1]) < m;

function neighbours(specs: readonly TreeSpec[], radius: number): Map<number, TreeSpec[]> {
  const cell = (v: number) => Math.floor(v / radius);
  const grid = new Map<string, TreeSpec[]>();
  for (const t of specs) {
    if (!t.xy) continue;
    const k = `${cell(t.xy[0])},${cell(t.xy[1])}`;
    grid.set(k, [...(grid.get(k) ?? []), t]);
  }
  const out = new Map<number, TreeSpec[]>();
  for (const t of specs) {
    if (!t.xy) continue;
    const [cx, cy] = [cell(t.xy[0]), cell(t.xy[1])];
    const found: TreeSpec[] = [];
    for (let i = cx - 1; i <= cx + 1; i++)
      for (let j = cy - 1; j <= cy + 1; j++)
        for (const o of grid.get(`${i},${j}`) ?? [])
          if (o !== t && near(t.xy, o.xy!, radius)) found.push(o);
    out.set(t.n, found);
  }
  return out;
}

const ordinary = (t: TreeSpec) => t.category === null && t.status === 'active' && t.xy !== null;

/** How much a tree stands in the way of a better one: the higher, the sooner it is cut. */
function cutScore(key: string, t: TreeSpec, around: readonly TreeSpec[]): number {
  const rng = Rng.for(key, 'thinning', t.n);
  const crowdsBigger = around.some((o) => o.dbhStart > t.dbhStart);
  const species = t.species === 'sugar-maple' || t.species === 'black-maple' ? 1 : 1.4;
  const crown = t.diebackBase >= 10 ? 1.6 : 1;
  // Competitors of a crop tree are trees of its own size, not the saplings under it.
  const size = Math.min(1.5, t.dbhStart / 40);
  return (
    (1 + around.length) * (crowdsBigger ? 1.3 : 1) * species * crown * size * rng.range(0.4, 1.6)
  );
}

const felledOn = (i: number) =>
  `2022-01-${String(THINNING.startDay + Math.floor(i / THINNING.treesPerDay)).padStart(2, '0')} 15:30:00`;

/** The stand after the thinning: cut trees removed, their neighbours released. */
export function thinStand(key: string, specs: readonly TreeSpec[]): TreeSpec[] {
  const crowding = neighbours(specs, CROWDING_M);
  const candidates = specs.filter(ordinary);
  const scored = candidates
    .map((t) => ({ t, score: cutScore(key, t, crowding.get(t.n) ?? []) }))
    .sort((a, b) => b.score - a.score || a.t.n - b.t.n);
  const cut = new Set(
    scored.slice(0, Math.round(THINNING.share * candidates.length)).map(({ t }) => t.n),
  );
  const around = neighbours(specs, RELEASE_M);
  let felled = 0;
  return specs.map((t) => {
    if (cut.has(t.n)) {
      const marked = felled % 6 === 0;
      return {
        ...t,
        status: 'removed',
        removedOn: felledOn(felled++),
        measuredThrough: THINNING.lastRound,
        tappedThrough: THINNING.lastRound,
        measurementNotes: marked
          ? { [THINNING.lastRound]: 'Marked for the winter thinning: crowds a better sugar maple.' }
          : t.measurementNotes,
      };
    }
    if (t.category !== null || !t.xy) return t;
    const opened = (around.get(t.n) ?? []).filter((o) => cut.has(o.n)).length;
    const factor = opened === 0 ? 1.06 : opened === 1 ? 1.18 : 1.28;
    return { ...t, release: { from: THINNING.firstSeason, factor } };
  });
}
