/**
 * Flat-earth geometry for a stand a few hundred metres across: points in local metres
 * (x east, y north) around an origin, converted to WGS 84 degrees for storage.
 */
export type XY = readonly [number, number];

export interface Origin {
  lat: number;
  lng: number;
}

const M_PER_DEG_LAT = 111_132;
const mPerDegLng = (lat: number) => 111_320 * Math.cos((lat * Math.PI) / 180);

export function toLatLng(origin: Origin, [x, y]: XY): { lat: number; lng: number } {
  return { lat: origin.lat + y / M_PER_DEG_LAT, lng: origin.lng + x / mPerDegLng(origin.lat) };
}

export function toXY(origin: Origin, lat: number, lng: number): XY {
  return [(lng - origin.lng) * mPerDegLng(origin.lat), (lat - origin.lat) * M_PER_DEG_LAT];
}

/** Ring area in square metres (shoelace). */
export function ringArea(ring: readonly XY[]): number {
  let s = 0;
  for (let i = 0; i < ring.length; i++) {
    const [x1, y1] = ring[i];
    const [x2, y2] = ring[(i + 1) % ring.length];
    s += x1 * y2 - x2 * y1;
  }
  return Math.abs(s) / 2;
}

/** Even–odd ray test; the ring is open (first vertex not repeated). */
export function insideRing(ring: readonly XY[], [px, py]: XY): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > py !== yj > py && px < ((xj - xi) * (py - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** The closest point of the ring's outline to p. */
export function nearestOnRing(ring: readonly XY[], [px, py]: XY): XY {
  let best: XY = ring[0];
  let bestD = Infinity;
  for (let i = 0; i < ring.length; i++) {
    const [ax, ay] = ring[i];
    const [bx, by] = ring[(i + 1) % ring.length];
    const dx = bx - ax;
    const dy = by - ay;
    const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
    const q: XY = [ax + t * dx, ay + t * dy];
    const d = Math.hypot(px - q[0], py - q[1]);
    if (d < bestD) {
      bestD = d;
      best = q;
    }
  }
  return best;
}

/** Bounding box of a ring: [minX, minY, maxX, maxY]. */
export function bbox(ring: readonly XY[]): [number, number, number, number] {
  const xs = ring.map((p) => p[0]);
  const ys = ring.map((p) => p[1]);
  return [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
}

/** A GeoJSON Polygon (closed ring, [lng, lat] order, 6 decimals) as stored in the database. */
export function polygonGeoJson(origin: Origin, ring: readonly XY[]): string {
  const coords = [...ring, ring[0]].map((p) => {
    const { lat, lng } = toLatLng(origin, p);
    return [Number(lng.toFixed(6)), Number(lat.toFixed(6))];
  });
  return JSON.stringify({ type: 'Polygon', coordinates: [coords] });
}
