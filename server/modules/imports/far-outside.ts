import { point, pointToPolygonDistance } from '@turf/turf';
import type { Boundary } from '../../../shared/geo/boundary';
import {
  OUTSIDE_BOUNDARY_WARN_M,
  type ImportRowError,
  type ImportSource,
} from '../../../shared/schemas/imports';
import type { TreeRow } from './read-rows';

/**
 * Trees placed more than `OUTSIDE_BOUNDARY_WARN_M` outside the stand's boundary: one warning a
 * row, not an error — the boundary may be the one that is wrong. Without a boundary, none.
 */
export function farOutside(
  boundary: Boundary | null,
  rows: readonly TreeRow[],
  column: string,
  source: ImportSource,
): ImportRowError[] {
  if (!boundary) return [];
  const out: ImportRowError[] = [];
  for (const r of rows) {
    if (r.lat === null || r.lng === null) continue;
    // Negative inside the boundary, in metres along the ground.
    const m = pointToPolygonDistance(point([r.lng, r.lat]), boundary, { units: 'meters' });
    if (m > OUTSIDE_BOUNDARY_WARN_M)
      out.push({
        row: r.row,
        column,
        message: `${source === 'gpx' ? 'Waypoint' : 'Tree'} ${r.tag} lies about ${Math.round(m).toLocaleString('en-US')} m outside the stand's boundary (more than ${OUTSIDE_BOUNDARY_WARN_M} m): check its position`,
      });
  }
  return out;
}
