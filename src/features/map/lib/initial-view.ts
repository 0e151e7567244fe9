import type { Boundary } from '@shared/schemas/sugarbush';
import { boundsOf } from './background';

/** Where the map opens: around the mapped trees, else around the boundary, else nowhere yet. */
export function initialView(
  mapped: readonly { lat: number; lng: number }[],
  boundary: Boundary | null,
) {
  let bounds = boundsOf(mapped);
  if (!bounds && boundary) {
    const positions =
      boundary.type === 'Polygon' ? boundary.coordinates.flat() : boundary.coordinates.flat(2);
    bounds = boundsOf(positions.map(([lng, lat]) => ({ lat, lng })));
  }
  return { bounds, refLat: bounds ? (bounds[1] + bounds[3]) / 2 : 45 };
}
