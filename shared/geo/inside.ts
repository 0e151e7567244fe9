import { booleanPointInPolygon } from '@turf/turf';
import type { Boundary } from './boundary';

/**
 * Whether a point lies inside the boundary (turf `booleanPointInPolygon`). A point on the line
 * counts as inside; a point in a hole does not.
 */
export function insideBoundary(boundary: Boundary, lng: number, lat: number): boolean {
  return booleanPointInPolygon([lng, lat], boundary);
}

/**
 * Outside the boundary: a mapped point that is not inside it. With no boundary, or no position,
 * nothing is outside.
 */
export function isOutside(
  boundary: Boundary | null,
  lng: number | null,
  lat: number | null,
): boolean {
  if (!boundary || lng === null || lat === null) return false;
  return !insideBoundary(boundary, lng, lat);
}
