import { azimuthGapDeg } from './units';

export interface Spot {
  azimuthDeg: number;
  heightCm: number;
}

export interface Spacing {
  sidewaysCm: number;
  verticalCm: number;
}

/** Differences this small are rounding, not distance. */
const SPACING_TOLERANCE_CM = 1e-6;

/** Bark arc between two azimuths on a trunk of this circumference, the short way round. */
export function arcDistanceCm(aDeg: number, bDeg: number, circumferenceCm: number): number {
  return (azimuthGapDeg(aDeg, bDeg) / 360) * circumferenceCm;
}

/**
 * The rectangle rule: two holes are far enough apart when at least `sidewaysCm` of bark arc
 * OR at least `verticalCm` of height lies between them.
 */
export function isClearOf(a: Spot, b: Spot, spacing: Spacing, circumferenceCm: number): boolean {
  return (
    arcDistanceCm(a.azimuthDeg, b.azimuthDeg, circumferenceCm) >=
      spacing.sidewaysCm - SPACING_TOLERANCE_CM ||
    Math.abs(a.heightCm - b.heightCm) >= spacing.verticalCm - SPACING_TOLERANCE_CM
  );
}

export interface DatedSpot extends Spot {
  season: number;
}

/**
 * Pairs of holes closer than the spacing where the newer one was drilled in `season` and the
 * older one was drilled that season or within `reachSeasons` before it.
 */
export function crowdedPairs<T extends DatedSpot>(
  holes: readonly T[],
  season: number,
  reachSeasons: number,
  spacing: Spacing,
  circumferenceCm: number,
): [T, T][] {
  const newest = holes.filter((h) => h.season === season);
  const older = holes.filter((h) => h.season < season && season - h.season < reachSeasons);
  const pairs: [T, T][] = [];
  newest.forEach((a, i) => {
    for (const b of newest.slice(i + 1))
      if (!isClearOf(a, b, spacing, circumferenceCm)) pairs.push([a, b]);
    for (const b of older) if (!isClearOf(a, b, spacing, circumferenceCm)) pairs.push([a, b]);
  });
  return pairs;
}
