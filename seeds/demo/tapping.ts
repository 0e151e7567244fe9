import type { GrowthHistory } from './growth';
import { Rng } from './random';
import type { TapTable, TapholeRow, TreeSpec } from './types';

const IN = 2.54;

/** Conservative set: under 12 in none, 12–<18 in one, 18 in and over two (NAMSPM 2006 via UVM — S). */
export const conservativeTaps: TapTable = (d) => (d < 12 * IN ? 0 : d < 18 * IN ? 1 : 2);
/** Traditional set: one more tap for each 5 in over 10 in, at most four (same source — S). */
export const traditionalTaps: TapTable = (d) =>
  d < 10 * IN ? 0 : Math.min(4, 1 + Math.floor((d - 10 * IN) / (5 * IN)));

/** Drilled 2 in deep with a 5/16 in bit (common practice). */
export const DEPTH_CM = 2 * IN;
export const BIT_CM = (5 / 16) * IN;
/** The traditional 7/16 in bit, still used on a few trees. */
export const WIDE_BIT_CM = (7 / 16) * IN;

/**
 * A careful tapper keeps each new hole clear of every earlier one: at least 11.5 cm apart across
 * the trunk or 31 cm above/below — a little more than the widest published spacing (4 in to the
 * side or 12 in up/down, UVM Proctor 2020 and Cornell — S), inside a 60–150 cm band.
 */
export const SIDE_CM = 11.5;
export const VERTICAL_CM = 31;
export const BAND_CM = [60, 150] as const;

interface Hole {
  season: number;
  az: number;
  h: number;
}

const norm = (az: number) => ((Math.round(az) % 360) + 360) % 360;
const chord = (dbh: number, a: number, b: number) => {
  const d = Math.abs(a - b) % 360;
  return dbh * Math.sin((Math.min(d, 360 - d) * Math.PI) / 360);
};
const clearOf = (dbh: number, c: Hole, holes: Hole[]) =>
  holes.every((o) => chord(dbh, c.az, o.az) >= SIDE_CM || Math.abs(c.h - o.h) >= VERTICAL_CM);

/** Moves away from the intended spot, cheapest first: a little round the trunk or up/down. */
const OFFSETS: [number, number][] = (() => {
  const out: [number, number][] = [];
  for (let a = -180; a <= 180; a += 2) for (let h = -90; h <= 90; h += 1) out.push([a, h]);
  return out.sort(
    (p, q) =>
      Math.abs(p[0]) / 12 + Math.abs(p[1]) / 10 - (Math.abs(q[0]) / 12 + Math.abs(q[1]) / 10),
  );
})();

/** The nearest clear spot to the intended one; if the trunk is crowded, clear of recent holes only. */
function place(dbh: number, target: Hole, prior: Hole[]): Hole {
  for (const lookback of [Infinity, 6, 3, 1]) {
    const near = prior.filter((o) => target.season - o.season < lookback);
    for (const [da, dh] of OFFSETS) {
      const c = { season: target.season, az: norm(target.az + da), h: Math.round(target.h + dh) };
      if (c.h < BAND_CM[0] || c.h > BAND_CM[1]) continue;
      if (clearOf(dbh, c, near)) return c;
    }
  }
  return { ...target, az: norm(target.az), h: Math.round(target.h) };
}

/** How many holes the tapper drilled: the table on the last known size, fewer on a stressed crown. */
function tapCount(spec: TreeSpec, g: GrowthHistory, table: TapTable, s: number, rng: Rng): number {
  if (spec.noTapping || s > spec.tappedThrough) return 0;
  if (spec.tapsOverride && s >= spec.tapsOverride.from)
    return rng.int(spec.tapsOverride.min, spec.tapsOverride.max);
  // The tapper goes by the latest reading on file (an old one if the tree has not been re-measured).
  const before = g.measurements.findLast((m) => m.season < s)?.dbhCm ?? Infinity;
  const same = g.measurements.find((m) => m.season === s)?.dbhCm ?? Infinity;
  const basis = Math.min(g.springDbh[s], before, same);
  const taps = table(basis);
  const crown = g.dieback[s - 1] ?? g.dieback[s];
  return crown > 15 ? Math.min(taps, 1) : taps;
}

export interface TappingOptions {
  key: string;
  table: TapTable;
  lastSeason: number;
  bitCm: number;
  depthCm: number;
  /** Day of March the crew starts; they then tap about this many trees a day. */
  treesPerDay: number;
}

export function tapTree(spec: TreeSpec, g: GrowthHistory, o: TappingOptions): TapholeRow[] {
  const rng = Rng.for(o.key, 'tapping', spec.n);
  const holes: Hole[] = [];
  const rows: TapholeRow[] = [];
  let primaryAz = 180 + rng.range(-60, 60);
  let started = false;
  // Spacing is judged on the trunk as it was at the first tapping: later growth only widens it.
  let dbh = 0;
  for (let s = spec.firstSeason; s <= o.lastSeason; s++) {
    const taps = tapCount(spec, g, o.table, s, rng);
    if (taps === 0) continue;
    primaryAz = started ? primaryAz + rng.range(40, 70) : primaryAz;
    if (!started) dbh = g.springDbh[s];
    started = true;
    const low = rng.range(68, 85);
    const high = rng.range(112, 135);
    const lowFirst = s % 2 === 0;
    const previous = holes.filter((h) => h.season === s - 1);
    const start = Rng.for(o.key, 'tapping-day', s).int(2, 6);
    const drilledOn = `${s}-03-${String(start + Math.floor((spec.n - 1) / o.treesPerDay)).padStart(2, '0')}`;
    for (let i = 0; i < taps; i++) {
      const target = {
        season: s,
        az: primaryAz + (i * 360) / taps,
        h: (i % 2 === 0) === lowFirst ? low : high,
      };
      let hole: Hole;
      if (i === 0 && spec.sloppyFrom !== null && s >= spec.sloppyFrom && previous.length > 0) {
        // Drilled right beside last season's hole: 2–3 cm round the trunk, within 5 cm up/down.
        const prev = previous[0];
        const side =
          (rng.range(2, 2.8) / (Math.PI * g.springDbh[s])) * 360 * (rng.chance(0.5) ? 1 : -1);
        const h = Math.min(BAND_CM[1], Math.max(BAND_CM[0], prev.h + rng.int(-5, 5)));
        hole = { season: s, az: norm(prev.az + side), h };
      } else {
        hole = place(dbh, target, holes);
      }
      holes.push(hole);
      rows.push({
        season: s,
        heightCm: hole.h,
        azimuthDeg: hole.az,
        depthCm: o.depthCm,
        bitCm: spec.wideSpoutFrom !== null && s >= spec.wideSpoutFrom ? WIDE_BIT_CM : o.bitCm,
        collection: spec.collection,
        drilledOn,
        stainHit: rng.chance(spec.stainRate),
      });
    }
  }
  return rows;
}
