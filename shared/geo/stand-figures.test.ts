import { describe, expect, it } from 'vitest';
import type { Boundary } from './boundary';
import { basalAreaPerArea } from './stand-basal-area';
import { standFigures, type FigureTree } from './stand-figures';

const deg = (m: number) => m / ((6_371_008.8 * Math.PI) / 180);
/** A 100 m × 100 m square on the equator: one hectare (see area.test.ts). */
const side = deg(100);
const hectare: Boundary = {
  type: 'Polygon',
  coordinates: [
    [
      [0, 0],
      [side, 0],
      [side, side],
      [0, side],
      [0, 0],
    ],
  ],
};

describe('stand basal area per area', () => {
  it('is 78.54 ft²/acre for 100 trees of 12 in on one acre (π/576 · 12² · 100)', () => {
    const ba = basalAreaPerArea(Array(100).fill(12 * 2.54), 4046.8564224)!;
    expect(ba.ft2PerAcre).toBeCloseTo(78.54, 2);
    // The same trees in metric: π/40000 · 30.48² · 100 = 7.2966 m² on 0.404686 ha.
    expect(ba.m2PerHa).toBeCloseTo(18.03, 2);
  });

  it('is 0.0707 m² for one 30 cm tree on a hectare', () => {
    expect(basalAreaPerArea([30], 10_000)!.m2PerHa).toBeCloseTo(0.0707, 4);
  });

  it('is null without an area', () => {
    expect(basalAreaPerArea([30], null)).toBeNull();
    expect(basalAreaPerArea([30], 0)).toBeNull();
  });
});

describe('the figures of a stand', () => {
  // On the one-hectare square: four living trees of 30 cm (one planned for 2 taps, one for 1),
  // a dead one and a removed one inside, one tree 10 m outside, one never mapped.
  const at = (xM: number, yM: number) => ({ lng: deg(xM), lat: deg(yM) });
  const trees: FigureTree[] = [
    { id: 1, tag: 'A', ...at(10, 10), status: 'active', dbhCm: 30, taps: 2 },
    { id: 2, tag: 'B', ...at(14, 10), status: 'active', dbhCm: 30, taps: 1 },
    { id: 3, tag: 'C', ...at(10, 13), status: 'held-out', dbhCm: 30, taps: 0 },
    { id: 4, tag: 'D', ...at(50, 50), status: 'active', dbhCm: 30, taps: 0 },
    { id: 5, tag: 'E', ...at(54, 50), status: 'dead', dbhCm: 40, taps: 0 },
    { id: 6, tag: 'F', ...at(80, 80), status: 'removed', dbhCm: 40, taps: 0 },
    { id: 7, tag: 'G', ...at(110, 50), status: 'active', dbhCm: 30, taps: 3 },
    { id: 8, tag: 'H', lat: null, lng: null, status: 'active', dbhCm: 30, taps: 2 },
  ];
  const f = standFigures(hectare, trees);

  it('counts the register, the mapped trees, and those inside and outside the boundary', () => {
    expect(f).toMatchObject({ boundary: true, trees: 8, mappedTrees: 7, treesInside: 6 });
    expect(f.treesOutside).toEqual([{ id: 7, tag: 'G' }]);
    expect(f.areaHa).toBeCloseTo(1, 6);
    expect(f.areaAcres).toBeCloseTo(2.4710538, 5);
  });

  it('gives densities of the standing trees inside and basal area of the living ones', () => {
    expect(f.tapsPlanned).toBe(8);
    expect(f.treesPerHa).toBeCloseTo(5, 5); // A–E; F is removed
    expect(f.treesPerAcre).toBeCloseTo(5 / 2.4710538, 5);
    expect(f.tapsPerHa).toBeCloseTo(3, 5);
    // A–D: 4 × π/40000 · 30² = 0.28274 m²; E is dead.
    expect(f.basalAreaM2PerHa).toBeCloseTo(0.28274, 5);
    expect(f.basalAreaFt2PerAcre).toBeCloseTo((0.28274 * 10.7639104) / 2.4710538, 4);
  });

  it('measures spacing between the standing trees inside: A–B 4 m, A–C 3 m, D–E 4 m', () => {
    const nn = f.nearestNeighbourM!;
    expect(nn.min).toBeCloseTo(3, 4);
    expect(nn.max).toBeCloseTo(4, 4);
    expect(nn.median).toBeCloseTo(4, 4); // A 3, B 4, C 3, D 4, E 4 → sorted 3, 3, 4, 4, 4
    expect(nn.mean).toBeCloseTo(3.6, 4);
  });

  it('without a boundary, leaves every area figure null and nothing outside', () => {
    const bare = standFigures(null, trees);
    expect(bare).toMatchObject({
      boundary: false,
      areaHa: null,
      areaAcres: null,
      treesInside: 7,
      treesOutside: [],
      treesPerHa: null,
      basalAreaFt2PerAcre: null,
    });
    expect(bare.nearestNeighbourM).not.toBeNull();
  });
});
