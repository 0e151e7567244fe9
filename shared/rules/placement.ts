import {
  keepsClear,
  spacingBoxes,
  stainColumnBox,
  type HoleSpot,
  type KeepOutBox,
  type Spacing,
  type Spot,
  type StainColumn,
} from './spacing';
import { normalizeAzimuth } from './units';

/**
 * Where to drill this season. The trunk is unrolled into a strip as wide as the circumference
 * (wrapping round in azimuth) and as tall as the height band. The first hole goes as near the
 * sunny side as it can, further holes are spread evenly round from it (the second opposite) at
 * other heights; each keeps the profile's spacing from every hole still in reach and from the
 * others of the season, and stays out of every such hole's stain column. Candidates are tried
 * nearest first, so the result is deterministic.
 */

export interface PlacementInput {
  dbhCm: number;
  taps: number;
  /** Holes of earlier seasons whose stain is still within a new hole's reach. */
  holesInReach: readonly HoleSpot[];
  spacing: Spacing;
  /** The stain column each hole leaves (the zone model's); no column check when omitted. */
  column?: StainColumn;
  /** Bit of the new holes (sets how far their own wood reaches); 5/16 in when omitted. */
  bitCm?: number;
  heightBand: { minCm: number; maxCm: number };
  sunnyAzimuthDeg: number;
}

export interface PlacementResult {
  placements: Spot[];
  /** True when fewer holes could be placed than asked for. */
  blocked: boolean;
}

/** 5/16 in, the bit of new holes when none is given. */
const NEW_BIT_CM = 0.79375;

/** Holes of one season sit at heights at least this far apart (a different height each). */
export const SAME_SEASON_HEIGHT_GAP_CM = 10;

/** Candidate grid in spacing units: a quarter of the sideways spacing, a sixth of the vertical. */
const COLUMNS_PER_SPACING = 4;
const ROWS_PER_SPACING = 6;
const MAX_COLUMN_OFFSET = 200;
const MAX_ROW_OFFSET = 60;

let searchOrder: Int16Array | null = null;
let scratch = new Uint8Array(4096);
const FEW_FREE_CELLS = 48;

function cost(a: number, b: number): number {
  const x = a / COLUMNS_PER_SPACING;
  const y = b / ROWS_PER_SPACING;
  return x * x + y * y;
}

/** Nearest first; on a tie the smaller height change, then the clockwise side, then the higher spot. */
function comesFirst(a: number, b: number, a2: number, b2: number): boolean {
  const d = cost(a, b) - cost(a2, b2);
  if (d !== 0) return d < 0;
  if (Math.abs(b) !== Math.abs(b2)) return Math.abs(b) < Math.abs(b2);
  if (a !== a2) return a > a2;
  return b > b2;
}

/** Grid offsets (column, row) from nearest to farthest in spacing units, ties broken by fixed rules. */
function nearestFirst(): Int16Array {
  if (searchOrder) return searchOrder;
  const cells: [number, number, number][] = [];
  for (let a = -MAX_COLUMN_OFFSET; a <= MAX_COLUMN_OFFSET; a++) {
    for (let b = -MAX_ROW_OFFSET; b <= MAX_ROW_OFFSET; b++) {
      const x = a / COLUMNS_PER_SPACING;
      const y = b / ROWS_PER_SPACING;
      cells.push([a, b, x * x + y * y]);
    }
  }
  cells.sort(
    (p, q) => p[2] - q[2] || Math.abs(p[1]) - Math.abs(q[1]) || q[0] - p[0] || q[1] - p[1],
  );
  searchOrder = new Int16Array(cells.length * 2);
  cells.forEach(([a, b], i) => {
    searchOrder![2 * i] = a;
    searchOrder![2 * i + 1] = b;
  });
  return searchOrder;
}

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}

function preferredHeight(
  index: number,
  first: number | null,
  band: PlacementInput['heightBand'],
  spacing: Spacing,
): number {
  const middle = (band.minCm + band.maxCm) / 2;
  if (index % 2 === 0 || first === null) return middle;
  const up = first + spacing.verticalCm / 2;
  return up <= band.maxCm ? up : Math.max(band.minCm, first - spacing.verticalCm / 2);
}

/** Signed bark arc (cm) from `fromDeg` to `toDeg`, the short way round: (−C/2, C/2]. */
function signedArc(fromDeg: number, toDeg: number, circumference: number): number {
  let delta = (toDeg - fromDeg) % 360;
  if (delta > 180) delta -= 360;
  else if (delta <= -180) delta += 360;
  return (delta / 360) * circumference;
}

/**
 * The nearest clear spot to `target`. A bitmap of grid cells marks those surely inside a
 * blocker's spacing (shrunk by the rounding margin); the first unmarked cell in nearest-first
 * order is then checked exactly, rounded as returned.
 */
function findSpot(
  target: Spot,
  blockers: readonly HoleSpot[],
  sameSeason: readonly Spot[],
  input: PlacementInput,
  circumference: number,
): Spot | null {
  const order = nearestFirst();
  const { spacing, heightBand } = input;
  const bandHeight = heightBand.maxCm - heightBand.minCm;
  const colCm = Math.max(
    spacing.sidewaysCm / COLUMNS_PER_SPACING,
    circumference / (2 * MAX_COLUMN_OFFSET),
  );
  const rowCm = Math.max(spacing.verticalCm / ROWS_PER_SPACING, bandHeight / MAX_ROW_OFFSET);
  const halfRound = circumference / 2;
  const aMax = Math.min(MAX_COLUMN_OFFSET, Math.floor(halfRound / colCm));
  const aMin = -aMax * colCm <= -halfRound ? -aMax + 1 : -aMax;
  const bMin = Math.max(
    -MAX_ROW_OFFSET,
    Math.ceil((heightBand.minCm - target.heightCm) / rowCm) - 1,
  );
  const bMax = Math.min(
    MAX_ROW_OFFSET,
    Math.floor((heightBand.maxCm - target.heightCm) / rowCm) + 1,
  );
  if (aMin > aMax || bMin > bMax) return null;
  const width = aMax - aMin + 1;
  const cells = width * (bMax - bMin + 1);
  if (scratch.length < cells) scratch = new Uint8Array(Math.max(cells, 2 * scratch.length));
  const blocked = scratch;
  blocked.fill(0, 0, cells);
  const arcMargin = circumference / 7200 + 0.01;
  const rowMargin = 0.06;
  const bit = input.bitCm ?? NEW_BIT_CM;
  const spacingBox = spacingBoxes(input.spacing);
  const boxesOf = (hole: HoleSpot): KeepOutBox[] =>
    input.column ? [...spacingBox, stainColumnBox(hole.bitCm, bit, input.column)] : spacingBox;
  const mark = (hole: Spot, box: KeepOutBox) => {
    const reachX = box.halfArcCm - arcMargin;
    const rise = box.halfHeightCm - rowMargin;
    if (reachX <= 0 || rise <= 0) return;
    const dy = hole.heightCm - target.heightCm;
    const b0 = Math.max(bMin, Math.ceil((dy - rise) / rowCm));
    const b1 = Math.min(bMax, Math.floor((dy + rise) / rowCm));
    if (b0 > b1) return;
    const x = signedArc(target.azimuthDeg, hole.azimuthDeg, circumference);
    for (let turn = -1; turn <= 1; turn++) {
      const centre = x + turn * circumference;
      const a0 = Math.max(aMin, Math.ceil((centre - reachX) / colCm));
      const a1 = Math.min(aMax, Math.floor((centre + reachX) / colCm));
      for (let b = b0; b <= b1; b++) {
        const row = (b - bMin) * width - aMin;
        for (let a = a0; a <= a1; a++) blocked[row + a] = 1;
      }
    }
  };
  for (const hole of blockers) for (const box of boxesOf(hole)) mark(hole, box);
  // Holes of one season keep different heights all round the trunk.
  const gap = SAME_SEASON_HEIGHT_GAP_CM - rowMargin;
  for (const hole of sameSeason) {
    const dy = hole.heightCm - target.heightCm;
    const b0 = Math.max(bMin, Math.ceil((dy - gap) / rowCm));
    const b1 = Math.min(bMax, Math.floor((dy + gap) / rowCm));
    for (let b = b0; b <= b1; b++) blocked.fill(1, (b - bMin) * width, (b - bMin + 1) * width);
  }
  let free = 0;
  for (let i = 0; i < cells; i++) free += 1 - blocked[i];
  const candidate = (a: number, b: number): Spot | null => {
    const heightCm = round1(target.heightCm + b * rowCm);
    if (heightCm < heightBand.minCm || heightCm > heightBand.maxCm) return null;
    let azimuthDeg = round1(
      normalizeAzimuth(target.azimuthDeg + ((a * colCm) / circumference) * 360),
    );
    if (azimuthDeg >= 360) azimuthDeg = 0;
    const spot = { azimuthDeg, heightCm };
    const rules = { spacing, column: input.column };
    for (const h of blockers) if (!keepsClear(spot, bit, h, rules, circumference)) return null;
    for (const h of sameSeason)
      if (Math.abs(h.heightCm - heightCm) < SAME_SEASON_HEIGHT_GAP_CM) return null;
    return spot;
  };
  if (free <= FEW_FREE_CELLS) {
    // Few cells left: rank them directly rather than walking the whole search order.
    while (free > 0) {
      let bestA = 0;
      let bestB = 0;
      let found = false;
      for (let b = bMin; b <= bMax; b++) {
        for (let a = aMin; a <= aMax; a++) {
          if (blocked[(b - bMin) * width + a - aMin]) continue;
          if (!found || comesFirst(a, b, bestA, bestB)) {
            bestA = a;
            bestB = b;
            found = true;
          }
        }
      }
      const spot = candidate(bestA, bestB);
      if (spot) return spot;
      blocked[(bestB - bMin) * width + bestA - aMin] = 1;
      free--;
    }
    return null;
  }
  for (let i = 0; i < order.length && free > 0; i += 2) {
    const a = order[i];
    const b = order[i + 1];
    if (a < aMin || a > aMax || b < bMin || b > bMax || blocked[(b - bMin) * width + a - aMin])
      continue;
    const spot = candidate(a, b);
    if (spot) return spot;
    free--;
  }
  return null;
}

export function placeTapholes(input: PlacementInput): PlacementResult {
  const circumference = Math.PI * input.dbhCm;
  const wanted = Math.max(0, Math.floor(input.taps));
  if (wanted === 0 || !(circumference > 0)) return { placements: [], blocked: false };
  const blockers: HoleSpot[] = [...input.holesInReach];
  const placements: Spot[] = [];
  let firstAzimuth = normalizeAzimuth(input.sunnyAzimuthDeg);
  for (let i = 0; i < wanted; i++) {
    const first = placements.length > 0 ? placements[0].heightCm : null;
    const target = {
      azimuthDeg: normalizeAzimuth(firstAzimuth + (360 * i) / wanted),
      heightCm: preferredHeight(i, first, input.heightBand, input.spacing),
    };
    const spot = findSpot(target, blockers, placements, input, circumference);
    if (!spot) break;
    if (i === 0) firstAzimuth = spot.azimuthDeg;
    placements.push(spot);
    blockers.push({ ...spot, bitCm: input.bitCm ?? NEW_BIT_CM });
  }
  return { placements, blocked: placements.length < wanted };
}
