import { describe, expect, it } from 'vitest';
import { ACRES_PER_HA, M2_PER_ACRE, acresFromM2, boundaryAreaM2, hectaresFromM2 } from './area';
import type { Boundary } from './boundary';

/** turf's mean Earth radius. */
const R = 6_371_008.8;
const rad = (deg: number) => (deg * Math.PI) / 180;
/** Area of a spherical rectangle between two meridians and two parallels: R²·Δλ·(sin φ2 − sin φ1). */
const sphericalRectangle = (west: number, south: number, east: number, north: number) =>
  R * R * rad(east - west) * (Math.sin(rad(north)) - Math.sin(rad(south)));

const cell = (w: number, s: number, e: number, n: number): [number, number][] => [
  [w, s],
  [e, s],
  [e, n],
  [w, n],
  [w, s],
];

describe('the area of a boundary', () => {
  it('of a 1° × 1° cell at 44–45° N equals the spherical-rectangle area R²·Δλ·(sin φ2 − sin φ1), R = 6 371 008.8 m', () => {
    const boundary: Boundary = { type: 'Polygon', coordinates: [cell(-73, 44, -72, 45)] };
    const expected = sphericalRectangle(-73, 44, -72, 45); // ≈ 8 819 km²
    expect(boundaryAreaM2(boundary) / expected).toBeCloseTo(1, 12);
    expect(expected / 1e6).toBeCloseTo(8818.8, 0);
  });

  it('of a 100 m × 100 m square on the equator is one hectare, 2.4710538 acres (same formula; side = 100 m / (R·π/180) degrees)', () => {
    const side = 100 / ((R * Math.PI) / 180);
    const boundary: Boundary = { type: 'Polygon', coordinates: [cell(0, 0, side, side)] };
    const m2 = boundaryAreaM2(boundary);
    expect(m2 / sphericalRectangle(0, 0, side, side)).toBeCloseTo(1, 12);
    expect(m2).toBeCloseTo(10_000, 3); // sin Δφ ≈ Δφ: the curvature is below a square millimetre
    expect(hectaresFromM2(m2)).toBeCloseTo(1, 7);
    expect(acresFromM2(m2)).toBeCloseTo(2.4710538, 6);
  });

  it('of a cell with a hole is the outer cell less the hole (spherical-rectangle formula for each)', () => {
    const boundary: Boundary = {
      type: 'Polygon',
      coordinates: [cell(-73, 44, -72, 45), cell(-72.75, 44.25, -72.25, 44.75).reverse()],
    };
    const expected =
      sphericalRectangle(-73, 44, -72, 45) - sphericalRectangle(-72.75, 44.25, -72.25, 44.75);
    expect(boundaryAreaM2(boundary) / expected).toBeCloseTo(1, 12);
  });

  it('of a MultiPolygon is the sum of its parts', () => {
    const boundary: Boundary = {
      type: 'MultiPolygon',
      coordinates: [[cell(-73, 44, -72, 45)], [cell(-70, 44, -69, 45)]],
    };
    expect(boundaryAreaM2(boundary) / (2 * sphericalRectangle(-73, 44, -72, 45))).toBeCloseTo(
      1,
      12,
    );
  });

  it('converts with the international acre: 1 acre = 4046.8564224 m², 1 ha = 2.4710538 acres', () => {
    expect(M2_PER_ACRE).toBe(4046.8564224);
    expect(ACRES_PER_HA).toBeCloseTo(2.4710538, 7);
    expect(acresFromM2(4046.8564224)).toBe(1);
  });
});
