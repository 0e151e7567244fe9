import { basalAreaGrowthCm2 } from './basal-area';
import type { ZoneParams } from './profile-types';
import { defaultZone } from './profiles';
import { cm2ToIn2, inToCm } from './units';

/**
 * The tapping zone (docs/decisions/001-tapping-zone-model.md): an annulus of wood as deep as a
 * new hole reaches past the bark, as tall as the zone height, right under the bark. Each hole
 * leaves a column of stain (stain length × (bit + margin) × its wood depth); growth lays clear
 * wood outside, so a hole k seasons old keeps max(0, 1 − g·k/d) of its stain inside the zone.
 */

export const DEFAULT_BIT_CM = inToCm(5 / 16);
/** Drilled depth including bark. */
export const DEFAULT_DEPTH_CM = inToCm(2);

export interface ZoneHole {
  season: number;
  bitCm?: number;
  depthCm?: number;
}

export interface ZoneShape {
  dbhCm: number;
  /** Drilled depth (incl. bark) of a new hole: sets the zone's wood depth. */
  depthCm?: number;
  zone?: Partial<ZoneParams>;
}

export interface ConductiveShareInput extends ZoneShape {
  radialGrowthCmPerYear: number;
  season: number;
  holes: readonly ZoneHole[];
}

export function zoneParams(zone?: Partial<ZoneParams>): ZoneParams {
  return zone ? { ...defaultZone, ...zone } : defaultZone;
}

export function woodDepthCm(depthCm: number | undefined, zone: ZoneParams): number {
  return Math.max(0, (depthCm ?? DEFAULT_DEPTH_CM) - zone.barkCm);
}

/**
 * Holes drilled before `season` whose stain a new hole of this depth can still reach: growth
 * has not yet laid `woodDepth` of clear wood over them (g · k < d). New holes are spaced from
 * these, and kept out of their stain columns.
 */
export function holesInReach<H extends ZoneHole>(
  holes: readonly H[],
  options: {
    season: number;
    depthCm: number;
    radialGrowthCmPerYear: number;
    zone?: Partial<ZoneParams>;
  },
): H[] {
  const depth = woodDepthCm(options.depthCm, zoneParams(options.zone));
  const g = Math.max(0, options.radialGrowthCmPerYear);
  return holes.filter((h) => h.season < options.season && g * (options.season - h.season) < depth);
}

/**
 * How much of a hole's stain a new hole of this depth can still reach in `season`, 0–1: all of
 * it the season it was drilled, less each season as growth lays clear wood over it (1 − g·k/d),
 * none once it is out of reach. Of earlier seasons' holes, those above 0 are `holesInReach`.
 */
export function stainLeftInReach(
  hole: ZoneHole,
  options: {
    season: number;
    depthCm: number;
    radialGrowthCmPerYear: number;
    zone?: Partial<ZoneParams>;
  },
): number {
  const age = options.season - hole.season;
  if (age < 0) return 0;
  const depth = woodDepthCm(options.depthCm, zoneParams(options.zone));
  if (!(depth > 0)) return 0;
  const g = Math.max(0, options.radialGrowthCmPerYear);
  return clamp01(1 - (g * age) / depth);
}

/** π(R² − (R − d)²) · H with R = DBH / 2. */
export function zoneVolumeCm3(dbhCm: number, woodDepth: number, zone: ZoneParams): number {
  const r = dbhCm / 2;
  const inner = Math.max(0, r - woodDepth);
  return Math.PI * (r * r - inner * inner) * zone.zoneHeightCm;
}

/** Stain a fresh hole leaves: stain length × (bit + margin) × wood depth. */
export function stainVolumeCm3(
  bitCm: number | undefined,
  woodDepth: number,
  zone: ZoneParams,
): number {
  return zone.stainLengthCm * ((bitCm ?? DEFAULT_BIT_CM) + zone.stainMarginCm) * woodDepth;
}

/**
 * Stain of these holes still inside a zone of wood depth `zoneDepth` in `season`. A hole's own
 * stain runs from g·k to g·k + its depth under today's bark; the part shallower than `zoneDepth`
 * counts. With equal depths this is the fraction max(0, 1 − g·k/d).
 */
export function stainInZoneCm3(
  holes: readonly ZoneHole[],
  season: number,
  radialGrowthCmPerYear: number,
  zoneDepth: number,
  zone: ZoneParams,
): number {
  const g = Math.max(0, radialGrowthCmPerYear);
  let total = 0;
  for (const hole of holes) {
    const age = season - hole.season;
    if (age < 0) continue;
    const ownDepth = woodDepthCm(hole.depthCm, zone);
    const inside = Math.min(ownDepth, zoneDepth - g * age);
    if (inside > 0)
      total += zone.stainLengthCm * ((hole.bitCm ?? DEFAULT_BIT_CM) + zone.stainMarginCm) * inside;
  }
  return total;
}

function clamp01(x: number): number {
  return x < 0 ? 0 : x > 1 ? 1 : x;
}

/** Share (0–1) of the tapping zone still conductive this season: the chance a new hole finds clear wood. */
export function conductiveShare(input: ConductiveShareInput): number {
  const zone = zoneParams(input.zone);
  const d = woodDepthCm(input.depthCm, zone);
  const volume = zoneVolumeCm3(input.dbhCm, d, zone);
  if (!(volume > 0)) return input.holes.some((h) => h.season <= input.season) ? 0 : 1;
  const stained = stainInZoneCm3(input.holes, input.season, input.radialGrowthCmPerYear, d, zone);
  return clamp01(1 - stained / volume);
}

/** Σ over k = 0, 1, 2 … of max(0, 1 − g·k/d): this season's holes count in full. */
export function stainAgeSum(radialGrowthCmPerYear: number, woodDepth: number): number {
  if (!(radialGrowthCmPerYear > 0)) return Infinity;
  const terms = Math.ceil(woodDepth / radialGrowthCmPerYear);
  return terms - ((radialGrowthCmPerYear / woodDepth) * terms * (terms - 1)) / 2;
}

export interface RateInput extends ZoneShape {
  tapsPerYear: number;
  bitCm?: number;
}

/** Share left conductive once tapping at a constant rate has run long enough to settle. */
export function steadyStateShare(input: RateInput & { radialGrowthCmPerYear: number }): number {
  if (!(input.tapsPerYear > 0)) return 1;
  const zone = zoneParams(input.zone);
  const d = woodDepthCm(input.depthCm, zone);
  const perHole = stainVolumeCm3(input.bitCm, d, zone) / zoneVolumeCm3(input.dbhCm, d, zone);
  const sum = stainAgeSum(input.radialGrowthCmPerYear, d);
  return clamp01(1 - input.tapsPerYear * perHole * sum);
}

/** Radial growth (cm/yr) below which this rate cannot keep the steady-state share at the floor. */
export function minimumSustainableRadialGrowth(input: RateInput): number {
  if (!(input.tapsPerYear > 0)) return 0;
  const zone = zoneParams(input.zone);
  const d = woodDepthCm(input.depthCm, zone);
  const perHole = stainVolumeCm3(input.bitCm, d, zone) / zoneVolumeCm3(input.dbhCm, d, zone);
  const allowedSum = (1 - zone.floor) / (input.tapsPerYear * perHole);
  if (!(allowedSum >= 1)) return Infinity;
  let lo = 0;
  let hi = d;
  for (let i = 0; i < 80; i++) {
    const mid = (lo + hi) / 2;
    if (stainAgeSum(mid, d) > allowedSum) lo = mid;
    else hi = mid;
  }
  return hi;
}

/** Basal-area growth (in²/yr) below which tapping at this rate is not sustainable. */
export function minimumSustainableGrowth(input: RateInput): number {
  const g = minimumSustainableRadialGrowth(input);
  return Number.isFinite(g) ? cm2ToIn2(basalAreaGrowthCm2(input.dbhCm, g)) : Infinity;
}

/** Largest whole number of taps a year whose steady-state share stays at or above the floor. */
export function maxSustainableTaps(
  input: ZoneShape & { radialGrowthCmPerYear: number; bitCm?: number },
): number {
  const zone = zoneParams(input.zone);
  const d = woodDepthCm(input.depthCm, zone);
  const perHole = stainVolumeCm3(input.bitCm, d, zone) / zoneVolumeCm3(input.dbhCm, d, zone);
  const sum = stainAgeSum(input.radialGrowthCmPerYear, d);
  if (!Number.isFinite(sum) || !(perHole > 0)) return 0;
  return Math.max(0, Math.floor((1 - zone.floor) / (perHole * sum) + 1e-9));
}
