import { validateBoundary, type Boundary } from '@shared/geo/boundary';

export type BoundaryResult = { ok: true; boundary: Boundary } | { ok: false; message: string };

const fail = (message: string): BoundaryResult => ({ ok: false, message });

const typeOf = (value: unknown) =>
  value && typeof value === 'object' && 'type' in value
    ? String((value as { type: unknown }).type)
    : undefined;

/** Unwraps a Feature, or a FeatureCollection holding exactly one, down to its geometry. */
function unwrap(value: unknown): unknown | BoundaryResult {
  const type = typeOf(value);
  if (type === 'FeatureCollection') {
    const features = (value as { features?: unknown }).features;
    if (!Array.isArray(features) || features.length === 0)
      return fail('The file holds an empty FeatureCollection. Export the stand outline itself.');
    if (features.length > 1)
      return fail(
        `The file holds ${features.length} features. Keep only the stand outline (one Polygon or MultiPolygon) and import again.`,
      );
    return unwrap(features[0]);
  }
  if (type === 'Feature') {
    const geometry = (value as { geometry?: unknown }).geometry;
    if (!geometry) return fail('The feature in the file has no geometry.');
    return geometry;
  }
  return value;
}

const isResult = (value: unknown): value is BoundaryResult =>
  !!value && typeof value === 'object' && 'ok' in value;

/**
 * Unwraps what a GIS program exports and checks it as the server will (closed rings, ranges,
 * no crossing edges), so the message comes before the upload.
 */
export function parseBoundary(value: unknown): BoundaryResult {
  const geometry = unwrap(value);
  if (isResult(geometry)) return geometry;
  const type = typeOf(geometry);
  if (type !== 'Polygon' && type !== 'MultiPolygon') {
    return fail(
      type
        ? `The file holds a ${type}. A boundary must be a Polygon or MultiPolygon.`
        : 'This is not GeoJSON: there is no "type". A boundary must be a Polygon or MultiPolygon.',
    );
  }
  const check = validateBoundary(geometry);
  return check.ok ? { ok: true, boundary: check.boundary } : fail(`${check.message}.`);
}

export function parseBoundaryText(text: string): BoundaryResult {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return fail("The file isn't valid JSON. Choose a .geojson or .json file.");
  }
  return parseBoundary(value);
}
