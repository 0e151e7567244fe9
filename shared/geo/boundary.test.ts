import { describe, expect, it } from 'vitest';
import { MAX_BOUNDARY_POSITIONS, validateBoundary } from './boundary';

const square: [number, number][] = [
  [-72.65, 44.31],
  [-72.63, 44.31],
  [-72.63, 44.32],
  [-72.65, 44.32],
  [-72.65, 44.31],
];
const hole: [number, number][] = [
  [-72.645, 44.313],
  [-72.64, 44.313],
  [-72.64, 44.316],
  [-72.645, 44.316],
  [-72.645, 44.313],
];
const problem = (value: unknown) => {
  const check = validateBoundary(value);
  return check.ok ? null : check.message;
};

describe('checking a boundary', () => {
  it('when it is a closed polygon, then it is accepted as given', () => {
    const check = validateBoundary({ type: 'Polygon', coordinates: [square] });
    expect(check).toEqual({ ok: true, boundary: { type: 'Polygon', coordinates: [square] } });
  });

  it('when it has a hole and a second part, then it is accepted', () => {
    const east = square.map(([lng, lat]) => [lng + 0.05, lat]);
    expect(problem({ type: 'MultiPolygon', coordinates: [[square, hole], [east]] })).toBeNull();
  });

  it('when positions carry an altitude, then it is dropped', () => {
    const check = validateBoundary({
      type: 'Polygon',
      coordinates: [square.map(([lng, lat]) => [lng, lat, 312])],
    });
    expect(check.ok && check.boundary.coordinates[0]).toEqual(square);
  });

  it('when it is a Feature, then the message asks for its geometry', () => {
    expect(
      problem({ type: 'Feature', geometry: { type: 'Polygon', coordinates: [square] } }),
    ).toMatch(/not a Feature: send its Polygon or MultiPolygon/);
  });

  it('when it is a line, then the message names the type', () => {
    expect(problem({ type: 'LineString', coordinates: square })).toBe(
      'The boundary must be a Polygon or MultiPolygon, not "LineString"',
    );
  });

  it('when a ring is not closed, then the message says the last position must repeat the first', () => {
    expect(problem({ type: 'Polygon', coordinates: [square.slice(0, 4)] })).toBe(
      'The outer ring is not closed: its last position must repeat the first',
    );
  });

  it('when a ring has fewer than four positions, then the message counts them', () => {
    expect(problem({ type: 'Polygon', coordinates: [[square[0], square[1], square[0]]] })).toMatch(
      /^The outer ring has 3 positions; a closed ring needs at least 4/,
    );
  });

  it('when a latitude is out of range, then the message suspects swapped coordinates', () => {
    const prairie = square.map(([lng, lat]) => [lng - 30, lat]);
    const swapped = prairie.map(([lng, lat]) => [lat, lng]);
    expect(problem({ type: 'Polygon', coordinates: [swapped] })).toMatch(
      /^Position 1 of the outer ring has latitude -102.65, outside −90…90 \(GeoJSON lists longitude first/,
    );
  });

  it('when a longitude is out of range, then the message names the position', () => {
    const far = square.map(([lng, lat], i) => (i === 2 ? [lng - 200, lat] : [lng, lat]));
    expect(problem({ type: 'Polygon', coordinates: [far] })).toMatch(
      /^Position 3 of the outer ring has longitude -272.63, outside −180…180/,
    );
  });

  it('when a position is not a pair of numbers, then the message says which', () => {
    const bad = [square[0], ['-72.63', '44.31'], ...square.slice(2)];
    expect(problem({ type: 'Polygon', coordinates: [bad] })).toBe(
      'Position 2 of the outer ring is not a [longitude, latitude] pair of numbers',
    );
  });

  it('when the outline crosses itself (a bow tie), then the message says near where', () => {
    const bowTie = [square[0], square[2], square[1], square[3], square[0]];
    expect(problem({ type: 'Polygon', coordinates: [bowTie] })).toBe(
      'The boundary crosses itself near 44.315000, -72.640000 (latitude, longitude)',
    );
  });

  it('when a hole crosses the outer ring, then it is refused as crossing itself', () => {
    const straddling = hole.map(([lng, lat]) => [lng - 0.008, lat]);
    expect(problem({ type: 'Polygon', coordinates: [square, straddling] })).toMatch(
      /^The boundary crosses itself near/,
    );
  });

  it('when a hole lies outside the outer ring, then the message says so', () => {
    const away = hole.map(([lng, lat]) => [lng + 1, lat]);
    expect(problem({ type: 'Polygon', coordinates: [square, away] })).toBe(
      'Hole 1 lies outside the outer ring',
    );
  });

  it('when every position lies on one line, then it encloses no area', () => {
    const flat = [
      [0, 0],
      [1, 1],
      [2, 2],
      [0, 0],
    ];
    expect(problem({ type: 'Polygon', coordinates: [flat] })).toBe(
      'The outer ring encloses no area: its positions lie on one line or one point',
    );
  });

  it('when a MultiPolygon part is wrong, then the message names the part', () => {
    expect(problem({ type: 'MultiPolygon', coordinates: [[square], [square.slice(0, 4)]] })).toBe(
      'The outer ring of polygon 2 is not closed: its last position must repeat the first',
    );
  });

  it('when it has too many positions to check, then it asks for a simpler outline', () => {
    const n = MAX_BOUNDARY_POSITIONS + 10;
    const circle = Array.from({ length: n }, (_, i) => {
      const a = (2 * Math.PI * i) / n;
      return [-72.64 + 0.01 * Math.cos(a), 44.31 + 0.01 * Math.sin(a)];
    });
    circle.push(circle[0]);
    expect(problem({ type: 'Polygon', coordinates: [circle] })).toMatch(
      /simplify it to at most 5000/,
    );
  });
});
