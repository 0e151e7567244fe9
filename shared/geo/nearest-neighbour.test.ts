import { distance } from '@turf/turf';
import { describe, expect, it } from 'vitest';
import type { LngLat } from './boundary';
import { nearestNeighbourDistances, nearestNeighbourSummary } from './nearest-neighbour';

/** Degrees of arc for a distance on turf's sphere (R = 6 371 008.8 m). */
const deg = (m: number) => m / ((6_371_008.8 * Math.PI) / 180);

/** A little generator so the scattered stands are the same on every run. */
function scatter(n: number, seed: number, spread: number): LngLat[] {
  let s = seed;
  const next = () => (s = (s * 16807) % 2147483647) / 2147483647;
  return Array.from({ length: n }, () => [-72.64 + next() * spread, 44.31 + next() * spread * 0.7]);
}

describe('the nearest-neighbour distance between trees', () => {
  it('on a square grid of 3 m spacing at the equator is 3 m for every tree (mean, median, min, max)', () => {
    const grid: LngLat[] = [];
    for (let i = 0; i < 20; i++) for (let j = 0; j < 20; j++) grid.push([deg(3 * i), deg(3 * j)]);
    const s = nearestNeighbourSummary(grid)!;
    // Along a parallel the spacing shrinks by cos φ; at 57 m from the equator that is 4·10⁻¹¹.
    for (const v of [s.mean, s.median, s.min, s.max]) expect(v).toBeCloseTo(3, 6);
  });

  it('matches comparing every pair with turf distance on a scattered stand with duplicates', () => {
    const points = scatter(1500, 11, 0.01);
    for (let i = 0; i < 20; i++) points.push([...points[i * 7]] as LngLat);
    const fast = nearestNeighbourDistances(points);
    const slow = points.map((p, i) =>
      Math.min(...points.filter((_, j) => j !== i).map((q) => distance(p, q, { units: 'meters' }))),
    );
    expect(fast).toEqual(slow);
    expect(Math.min(...fast)).toBe(0);
  });

  it('finds the true neighbour of a point mapped far away (a tree misplaced at 0°, 0°)', () => {
    const points = [...scatter(200, 5, 0.005), [0, 0] as LngLat];
    const fast = nearestNeighbourDistances(points);
    const expected = Math.min(
      ...points.slice(0, -1).map((q) => distance([0, 0], q, { units: 'meters' })),
    );
    expect(fast.at(-1)).toBe(expected);
  });

  it('gives the median of an even count as the mean of the middle two', () => {
    const line: LngLat[] = [0, 1, 3, 6].map((m) => [deg(m), 0]);
    // Neighbours: 1, 1, 2, 3 m → median 1.5, mean 1.75.
    const s = nearestNeighbourSummary(line)!;
    expect(s.median).toBeCloseTo(1.5, 6);
    expect(s.mean).toBeCloseTo(1.75, 6);
    expect([s.min, s.max].map((v) => Number(v.toFixed(6)))).toEqual([1, 3]);
  });

  it('is null for fewer than two trees', () => {
    expect(nearestNeighbourSummary([])).toBeNull();
    expect(nearestNeighbourSummary([[-72.6, 44.3]])).toBeNull();
  });

  it('handles 20,000 trees, clustered or spread, well within a second or two (not every pair)', () => {
    const spread = scatter(20_000, 3, 0.02);
    const clump = [...scatter(20_000, 9, 1e-6), [0, 0] as LngLat];
    const started = performance.now();
    expect(nearestNeighbourDistances(spread)).toHaveLength(20_000);
    expect(nearestNeighbourDistances(clump)).toHaveLength(20_001);
    expect(performance.now() - started).toBeLessThan(2000);
  });
});
