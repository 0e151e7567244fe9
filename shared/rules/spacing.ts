import type { SpacingRule } from './profile-types';
import { azimuthGapDeg } from './units';

export interface Spot {
  azimuthDeg: number;
  heightCm: number;
}

export interface Spacing {
  sidewaysCm: number;
  verticalCm: number;
  /** How the two distances combine; `either` when omitted. */
  rule?: SpacingRule;
}

/** The stain column a hole leaves, as the tapping-zone model draws it (001-tapping-zone-model.md). */
export interface StainColumn {
  /** Stain length, centred on the hole: half runs above, half below. */
  stainLengthCm: number;
  /** Width of stain beyond the bit itself. */
  stainMarginCm: number;
}

/** An old hole a new one keeps clear of; its bit sets the width of its stain column. */
export interface HoleSpot extends Spot {
  bitCm?: number;
}

/**
 * A box around an old hole that a new hole's centre must stay out of: it is inside when less
 * than `halfArcCm` of bark arc AND less than `halfHeightCm` of height lie between them.
 */
export interface KeepOutBox {
  halfArcCm: number;
  halfHeightCm: number;
}

/** Differences this small are rounding, not distance. */
const SPACING_TOLERANCE_CM = 1e-6;
/** Bit assumed for an old hole whose bit is not known: 5/16 in. */
const DEFAULT_OLD_BIT_CM = 0.79375;

/** Bark arc between two azimuths on a trunk of this circumference, the short way round. */
export function arcDistanceCm(aDeg: number, bDeg: number, circumferenceCm: number): number {
  return (azimuthGapDeg(aDeg, bDeg) / 360) * circumferenceCm;
}

/**
 * The boxes a spacing draws round an old hole.
 * - `either` ("2–4 in to the side or 6–12 in above/below"): one box, sideways × vertical.
 * - `both` ("3 in over and 6 in up/down", the diagonal step): near an old hole both distances
 *   are required, so the hole's own column (less than the sideways spacing round) and its own
 *   row (less than the vertical spacing up or down) are closed. "Near" ends one further step
 *   away — twice the spacing either way — where a hole is on another part of the trunk; read
 *   literally, "and" would forbid any two holes at one height all round the tree.
 */
export function spacingBoxes(spacing: Spacing): KeepOutBox[] {
  const { sidewaysCm: x, verticalCm: y } = spacing;
  if (spacing.rule === 'both') {
    return [
      { halfArcCm: x, halfHeightCm: 2 * y },
      { halfArcCm: 2 * x, halfHeightCm: y },
    ];
  }
  return [{ halfArcCm: x, halfHeightCm: y }];
}

/**
 * The stain column of an old hole, widened by half the new bit so that the new hole's own wood
 * stays out of it: (old bit + margin) / 2 + new bit / 2 round, stain length / 2 + new bit / 2 up
 * and down.
 */
export function stainColumnBox(
  oldBitCm: number | undefined,
  newBitCm: number,
  column: StainColumn,
): KeepOutBox {
  const half = newBitCm / 2;
  return {
    halfArcCm: ((oldBitCm ?? DEFAULT_OLD_BIT_CM) + column.stainMarginCm) / 2 + half,
    halfHeightCm: column.stainLengthCm / 2 + half,
  };
}

function inside(a: Spot, b: Spot, box: KeepOutBox, circumferenceCm: number): boolean {
  return (
    arcDistanceCm(a.azimuthDeg, b.azimuthDeg, circumferenceCm) <
      box.halfArcCm - SPACING_TOLERANCE_CM &&
    Math.abs(a.heightCm - b.heightCm) < box.halfHeightCm - SPACING_TOLERANCE_CM
  );
}

/** True when `a` keeps the spacing from `b`, read as the spacing's rule says. */
export function isClearOf(a: Spot, b: Spot, spacing: Spacing, circumferenceCm: number): boolean {
  return spacingBoxes(spacing).every((box) => !inside(a, b, box, circumferenceCm));
}

/** True when a new hole of `newBitCm` at `spot` would cut into the stain column of `hole`. */
export function isInStainColumn(
  spot: Spot,
  hole: HoleSpot,
  newBitCm: number,
  column: StainColumn,
  circumferenceCm: number,
): boolean {
  return inside(spot, hole, stainColumnBox(hole.bitCm, newBitCm, column), circumferenceCm);
}

export interface DatedSpot extends HoleSpot {
  season: number;
}

/** What keeps a new hole off an old one: the guideline's spacing, and the old hole's stain column. */
export interface SpacingRules {
  spacing: Spacing;
  column?: StainColumn;
}

/** True when `a` (drilled with `aBitCm`) keeps both the spacing and out of `b`'s stain column. */
export function keepsClear(
  a: Spot,
  aBitCm: number,
  b: HoleSpot,
  rules: SpacingRules,
  circumferenceCm: number,
): boolean {
  if (!isClearOf(a, b, rules.spacing, circumferenceCm)) return false;
  return !rules.column || !isInStainColumn(a, b, aBitCm, rules.column, circumferenceCm);
}

/**
 * Pairs of holes too close where the newer one was drilled in `season` and the older one was
 * drilled that season or within `reachSeasons` before it.
 */
export function crowdedPairs<T extends DatedSpot>(
  holes: readonly T[],
  season: number,
  reachSeasons: number,
  rules: SpacingRules,
  circumferenceCm: number,
): [T, T][] {
  const newest = holes.filter((h) => h.season === season);
  const older = holes.filter((h) => h.season < season && season - h.season < reachSeasons);
  const pairs: [T, T][] = [];
  const close = (a: T, b: T) =>
    !keepsClear(a, a.bitCm ?? DEFAULT_OLD_BIT_CM, b, rules, circumferenceCm);
  newest.forEach((a, i) => {
    for (const b of newest.slice(i + 1)) if (close(a, b)) pairs.push([a, b]);
    for (const b of older) if (close(a, b)) pairs.push([a, b]);
  });
  return pairs;
}
