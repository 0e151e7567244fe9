import { distance, featureCollection, polygon as turfPolygon, union } from '@turf/turf';
import { boundaryAreaM2 } from './area';
import { validateBoundary, type Boundary, type BoundaryCheck, type Ring } from './boundary';

/** One outline found in a file: its name, its geometry in WGS 84, and its area on the sphere. */
export interface BoundaryCandidate {
  name: string;
  geometry: Boundary;
  areaM2: number;
}
/** A shape in the file that is no usable outline, and why. */
export interface SkippedShape {
  name: string;
  reason: string;
}
/** A feature as read from any format: the name it carries, if any, and its geometry. */
export interface FoundShape {
  name: string | null;
  geometry: unknown;
}

/** More polygons than this in one file and the list is no longer a choice anyone can make. */
export const MAX_CANDIDATES = 100;

type Geometry = { type?: unknown; coordinates?: unknown; geometries?: unknown };

const samePosition = (a: number[], b: number[]) => a[0] === b[0] && a[1] === b[1];

/** A line's positions as one ring when it ends where it starts; otherwise how far apart its ends are. */
function closeLine(positions: number[][]): { ring: Ring } | { gapM: number } | null {
  if (positions.length < 2 || !positions.every((p) => Array.isArray(p) && p.length >= 2))
    return null;
  const [first, last] = [positions[0], positions[positions.length - 1]];
  if (positions.length >= 4 && samePosition(first, last)) return { ring: positions as Ring };
  return { gapM: distance(first.slice(0, 2), last.slice(0, 2), { units: 'meters' }) };
}

/** The segments of a MultiLineString (a GPX track with several segments) joined end to end. */
function joinSegments(segments: unknown): number[][] {
  if (!Array.isArray(segments)) return [];
  const joined: number[][] = [];
  for (const segment of segments) {
    if (!Array.isArray(segment)) continue;
    for (const p of segment as number[][]) {
      const previous = joined[joined.length - 1];
      if (!previous || !samePosition(previous, p)) joined.push(p);
    }
  }
  return joined;
}

type Outline = { geometry: unknown } | { reason: string };

/** Turns one geometry into an outline: polygons as they are, a closed line or track as its ring. */
function outlineOf(geometry: Geometry | null): Outline {
  if (!geometry || typeof geometry !== 'object') return { reason: 'has no geometry' };
  const { type } = geometry;
  if (type === 'Polygon' || type === 'MultiPolygon') return { geometry };
  if (type === 'LineString' || type === 'MultiLineString') {
    const positions =
      type === 'LineString'
        ? (geometry.coordinates as number[][])
        : joinSegments(geometry.coordinates);
    const closed = Array.isArray(positions) ? closeLine(positions) : null;
    if (!closed) return { reason: 'is a line with too few positions to read' };
    if ('ring' in closed) return { geometry: { type: 'Polygon', coordinates: [closed.ring] } };
    return {
      reason:
        `is a line or track that does not end where it starts (its ends are ${Math.round(closed.gapM)} m apart), ` +
        'so it encloses nothing; close it to its first point, or walk back to the start',
    };
  }
  if (type === 'GeometryCollection' && Array.isArray(geometry.geometries)) {
    const parts = (geometry.geometries as Geometry[]).map(outlineOf);
    const polygons = parts.flatMap((part) => {
      if (!('geometry' in part)) return [];
      const g = part.geometry as { type: string; coordinates: Ring[] | Ring[][] };
      return g.type === 'Polygon' ? [g.coordinates as Ring[]] : (g.coordinates as Ring[][]);
    });
    if (polygons.length === 0) return { reason: 'holds no polygon or closed line' };
    return {
      geometry:
        polygons.length === 1
          ? { type: 'Polygon', coordinates: polygons[0] }
          : { type: 'MultiPolygon', coordinates: polygons },
    };
  }
  if (type === 'Point' || type === 'MultiPoint') return { reason: 'is a point, not an outline' };
  return { reason: `is a ${String(type)}, not an outline` };
}

const displayName = (shape: FoundShape, index: number, count: number, fallback: string | null) => {
  const name = shape.name?.trim();
  if (name) return name;
  return count === 1 && fallback ? fallback : `Polygon ${index + 1}`;
};

/**
 * Every polygon found (and every line or track that ends where it starts) becomes a candidate,
 * checked by the boundary rules; what fails, or is no outline at all, is listed with its reason.
 */
export function candidatesOf(
  shapes: FoundShape[],
  fallbackName: string | null,
): { candidates: BoundaryCandidate[]; skipped: SkippedShape[] } {
  const candidates: BoundaryCandidate[] = [];
  const skipped: SkippedShape[] = [];
  shapes.forEach((shape, i) => {
    const name = displayName(shape, i, shapes.length, fallbackName);
    const outline = outlineOf(shape.geometry as Geometry | null);
    if ('reason' in outline) return skipped.push({ name, reason: outline.reason });
    const check = validateBoundary(outline.geometry);
    if (!check.ok) return skipped.push({ name, reason: `cannot be used: ${check.message}` });
    candidates.push({ name, geometry: check.boundary, areaM2: boundaryAreaM2(check.boundary) });
  });
  return { candidates, skipped };
}

const polygonsOf = (boundary: Boundary): Ring[][] =>
  boundary.type === 'Polygon' ? [boundary.coordinates] : boundary.coordinates;

/**
 * Merges outlines into one boundary: their union (turf `union`), so outlines that touch or
 * overlap become one polygon and the rest stay separate parts of a MultiPolygon. The result is
 * checked like any boundary.
 */
export function mergeOutlines(outlines: Boundary[]): BoundaryCheck {
  if (outlines.length === 0) return { ok: false, message: 'Choose at least one outline' };
  if (outlines.length === 1) return validateBoundary(outlines[0]);
  const parts = outlines.flatMap(polygonsOf).map((rings) => turfPolygon(rings));
  const merged = union(featureCollection(parts));
  if (!merged) return { ok: false, message: 'The merged outlines enclose no area' };
  return validateBoundary(merged.geometry);
}
