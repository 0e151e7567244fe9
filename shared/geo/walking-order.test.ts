import { describe, expect, it } from 'vitest';
import { distance } from '@turf/turf';
import { walkingOrder } from './walking-order';

// A row of trees about 11 m apart running north, given out of order.
const row = [3, 0, 4, 1, 2].map((i) => ({ id: i, lat: 45 + i * 0.0001, lng: -72 }));

describe('walkingOrder', () => {
  it('walks a row from its southern end to its northern one', () => {
    expect(walkingOrder(row)[0].id).toBe(3);
    expect(walkingOrder(row, { lat: 44.9999, lng: -72 }).map((t) => t.id)).toEqual([0, 1, 2, 3, 4]);
  });

  it('starts at the tree nearest to where the walker stands', () => {
    const order = walkingOrder(row, { lat: 45.00021, lng: -72.00001 });
    expect(order[0].id).toBe(2);
    expect(order).toHaveLength(5);
  });

  it('keeps trees without a position, at the end', () => {
    const order = walkingOrder([...row, { id: 9, lat: null, lng: null }]);
    expect(order.at(-1)?.id).toBe(9);
    expect(new Set(order.map((t) => t.id)).size).toBe(6);
  });

  it('goes on to the nearest unvisited tree each time (checked against turf distances)', () => {
    let seed = 7;
    const rand = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
    const trees = Array.from({ length: 300 }, (_, id) => ({
      id,
      lat: 45 + rand() * 0.002,
      lng: -72 + rand() * 0.003,
    }));
    const order = walkingOrder(trees);
    const seen = new Set<number>();
    for (let i = 0; i < order.length - 1; i++) {
      seen.add(order[i].id);
      const from = [order[i].lng, order[i].lat];
      const next = distance(from, [order[i + 1].lng, order[i + 1].lat]);
      for (const t of trees) {
        if (seen.has(t.id)) continue;
        expect(distance(from, [t.lng, t.lat])).toBeGreaterThanOrEqual(next - 1e-9);
      }
    }
  });
});
