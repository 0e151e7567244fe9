import { centroid } from '@turf/turf';
import type { Knex } from 'knex';

/**
 * Where the stand is, for its forecast: the centroid of its boundary (turf `centroid`, the mean
 * of the outline's vertices, close enough for weather), else the mean of its mapped trees, else
 * null.
 */
export async function standPosition(
  db: Knex,
  sugarbushId: number,
): Promise<{ lat: number; lng: number } | null> {
  const stand = await db('sugarbushes').where({ id: sugarbushId }).first('boundary');
  if (stand?.boundary) {
    try {
      const [lng, lat] = centroid(JSON.parse(stand.boundary)).geometry.coordinates;
      if (Number.isFinite(lat) && Number.isFinite(lng)) return { lat, lng };
    } catch {
      // An unreadable outline falls through to the trees.
    }
  }
  const [row] = await db('trees')
    .where({ sugarbush_id: sugarbushId })
    .whereNotNull('lat')
    .whereNotNull('lng')
    .select(db.raw('avg(lat) as lat, avg(lng) as lng'));
  if (row?.lat === null || row?.lat === undefined) return null;
  return { lat: Number(row.lat), lng: Number(row.lng) };
}
