import { describe, expect, it } from 'vitest';
import type { Boundary } from './boundary';
import { insideBoundary, isOutside } from './inside';

const square = (w: number, s: number, e: number, n: number): [number, number][] => [
  [w, s],
  [e, s],
  [e, n],
  [w, n],
  [w, s],
];
const withHole: Boundary = {
  type: 'Polygon',
  coordinates: [square(-72.65, 44.31, -72.63, 44.32), square(-72.645, 44.313, -72.64, 44.316)],
};

describe('whether a tree stands inside the boundary', () => {
  it('when it is within the outer ring and clear of the hole, then it is inside', () => {
    expect(insideBoundary(withHole, -72.635, 44.318)).toBe(true);
  });

  it('when it is beyond the outer ring, then it is outside', () => {
    expect(insideBoundary(withHole, -72.66, 44.315)).toBe(false);
  });

  it('when it is in the hole, then it is outside', () => {
    expect(insideBoundary(withHole, -72.642, 44.314)).toBe(false);
  });

  it('when it is on the line, then it counts as inside', () => {
    expect(insideBoundary(withHole, -72.64, 44.31)).toBe(true);
  });

  it('when the stand has no boundary or the tree no position, then nothing is outside', () => {
    expect(isOutside(null, -72.66, 44.315)).toBe(false);
    expect(isOutside(withHole, null, null)).toBe(false);
    expect(isOutside(withHole, -72.66, 44.315)).toBe(true);
  });

  it('when the boundary is a MultiPolygon, then a tree in either part is inside', () => {
    const two: Boundary = {
      type: 'MultiPolygon',
      coordinates: [[square(0, 0, 1, 1)], [square(2, 0, 3, 1)]],
    };
    expect(insideBoundary(two, 2.5, 0.5)).toBe(true);
    expect(insideBoundary(two, 1.5, 0.5)).toBe(false);
  });
});
