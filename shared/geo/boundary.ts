import { booleanPointInPolygon, kinks } from '@turf/turf';

/** A GeoJSON position as Clearwood keeps it: [longitude, latitude] in WGS 84 degrees. */
export type LngLat = [number, number];
export type Ring = LngLat[];
export interface PolygonBoundary {
  type: 'Polygon';
  coordinates: Ring[];
}
export interface MultiPolygonBoundary {
  type: 'MultiPolygon';
  coordinates: Ring[][];
}
/** A stand's boundary: a GeoJSON Polygon or MultiPolygon geometry. */
export type Boundary = PolygonBoundary | MultiPolygonBoundary;

export type BoundaryCheck = { ok: true; boundary: Boundary } | { ok: false; message: string };

/** More vertices than this and the self-intersection test (every segment against every other) gets slow. */
export const MAX_BOUNDARY_POSITIONS = 5000;

/** A ring that encloses less than this (m²) is taken as enclosing nothing: its points lie on a line. */
const MIN_RING_AREA_M2 = 0.01;

class BoundaryProblem extends Error {}
function fail(message: string): never {
  throw new BoundaryProblem(message);
}

const ringName = (ring: number, polygon: number | null) => {
  const which = ring === 0 ? 'the outer ring' : `hole ${ring}`;
  return polygon === null ? which : `${which} of polygon ${polygon + 1}`;
};
const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

function readPosition(value: unknown, where: string): LngLat {
  if (
    !Array.isArray(value) ||
    value.length < 2 ||
    value.length > 3 ||
    !value.every((n) => typeof n === 'number' && Number.isFinite(n))
  )
    fail(`${where} is not a [longitude, latitude] pair of numbers`);
  const [lng, lat] = value as number[];
  if (lat < -90 || lat > 90) {
    const swapped = Math.abs(lng) <= 90 && Math.abs(lat) <= 180;
    fail(
      `${where} has latitude ${lat}, outside −90…90` +
        (swapped ? ' (GeoJSON lists longitude first: are the two swapped?)' : ''),
    );
  }
  if (lng < -180 || lng > 180) fail(`${where} has longitude ${lng}, outside −180…180`);
  return [lng, lat]; // an altitude, when given, is dropped
}

function readRing(value: unknown, ring: number, polygon: number | null): Ring {
  const name = ringName(ring, polygon);
  if (!Array.isArray(value)) return fail(`${capital(name)} is not a list of positions`);
  const positions = value.map((p, i) => readPosition(p, `Position ${i + 1} of ${name}`));
  if (positions.length < 4)
    fail(
      `${capital(name)} has ${positions.length} position${positions.length === 1 ? '' : 's'}; ` +
        'a closed ring needs at least 4 (three corners and the first again)',
    );
  const [first, last] = [positions[0], positions[positions.length - 1]];
  if (first[0] !== last[0] || first[1] !== last[1])
    fail(`${capital(name)} is not closed: its last position must repeat the first`);
  return positions;
}

function readPolygon(value: unknown, polygon: number | null): Ring[] {
  const what = polygon === null ? 'The polygon' : `Polygon ${polygon + 1}`;
  if (!Array.isArray(value) || value.length === 0)
    return fail(`${what} needs a list of rings, the outer ring first`);
  return value.map((r, i) => readRing(r, i, polygon));
}

/**
 * Ring area in m² on a flat projection around the ring (shoelace): zero for points on one line,
 * where the spherical formula in turf `area` is not (a lng/lat line is no great circle).
 */
function flatArea(ring: Ring): number {
  const lat0 = ring.reduce((s, p) => s + p[1], 0) / ring.length;
  const mPerDeg = 111_195;
  const kx = mPerDeg * Math.cos((lat0 * Math.PI) / 180);
  const [lng0] = ring[0];
  let sum = 0;
  for (let i = 0; i + 1 < ring.length; i++) {
    const [x1, y1] = [(ring[i][0] - lng0) * kx, (ring[i][1] - lat0) * mPerDeg];
    const [x2, y2] = [(ring[i + 1][0] - lng0) * kx, (ring[i + 1][1] - lat0) * mPerDeg];
    sum += x1 * y2 - x2 * y1;
  }
  return Math.abs(sum) / 2;
}

/** Once nothing crosses: every ring encloses some area, and every hole lies in its outer ring. */
function checkShape(rings: Ring[], polygon: number | null) {
  rings.forEach((ring, i) => {
    if (flatArea(ring) < MIN_RING_AREA_M2)
      fail(
        `${capital(ringName(i, polygon))} encloses no area: its positions lie on one line or one point`,
      );
  });
  const outer: PolygonBoundary = { type: 'Polygon', coordinates: [rings[0]] };
  rings.slice(1).forEach((hole, i) => {
    if (!booleanPointInPolygon(hole[0], outer))
      fail(`${capital(ringName(i + 1, polygon))} lies outside the outer ring`);
  });
}

function read(value: unknown): Boundary {
  if (typeof value !== 'object' || value === null || Array.isArray(value))
    return fail('The boundary must be a GeoJSON Polygon or MultiPolygon geometry');
  const { type, coordinates } = value as { type?: unknown; coordinates?: unknown };
  if (type === 'Feature' || type === 'FeatureCollection')
    fail(`The boundary must be a geometry, not a ${type}: send its Polygon or MultiPolygon`);
  if (type !== 'Polygon' && type !== 'MultiPolygon')
    fail(`The boundary must be a Polygon or MultiPolygon, not ${JSON.stringify(type ?? null)}`);
  let boundary: Boundary;
  if (type === 'Polygon') {
    boundary = { type: 'Polygon', coordinates: readPolygon(coordinates, null) };
  } else {
    if (!Array.isArray(coordinates) || coordinates.length === 0)
      return fail('The MultiPolygon needs at least one polygon');
    boundary = { type: 'MultiPolygon', coordinates: coordinates.map((p, i) => readPolygon(p, i)) };
  }
  const positions = (boundary.coordinates.flat(2) as unknown[]).length;
  if (positions > MAX_BOUNDARY_POSITIONS)
    fail(
      `The boundary has ${positions} positions; simplify it to at most ${MAX_BOUNDARY_POSITIONS}`,
    );
  const crossings = kinks(boundary).features;
  if (crossings.length > 0) {
    const [lng, lat] = crossings[0].geometry.coordinates;
    fail(
      `The boundary crosses itself near ${lat.toFixed(6)}, ${lng.toFixed(6)} (latitude, longitude)` +
        (crossings.length > 1 ? ` and in ${crossings.length - 1} more place(s)` : ''),
    );
  }
  if (boundary.type === 'Polygon') checkShape(boundary.coordinates, null);
  else boundary.coordinates.forEach((rings, i) => checkShape(rings, i));
  return boundary;
}

/**
 * Check a boundary as sent by a form or an import: a Polygon or MultiPolygon whose rings are
 * closed, have at least four positions within longitude/latitude ranges, enclose some area, hold
 * their holes inside, and never cross themselves or each other (turf `kinks`). The message says
 * what is wrong in plain words; the boundary comes back with any altitudes dropped.
 */
export function validateBoundary(value: unknown): BoundaryCheck {
  try {
    return { ok: true, boundary: read(value) };
  } catch (err) {
    if (err instanceof BoundaryProblem) return { ok: false, message: err.message };
    throw err;
  }
}
