import type { RoundTree } from '../api/get-round';
import { roundOrder, roundRoute } from './round-route';

const tree = (id: number, lat: number | null, measured = false): RoundTree => ({
  id,
  tag: `T-${id}`,
  lat,
  lng: lat === null ? null : -72,
  status: 'active',
  latestDbhCm: 30,
  latestMeasuredOn: null,
  measured,
});

// A row of trees running north, about 11 m apart (the last two closer), listed out of order.
const trees = [
  tree(1, 44.0),
  tree(4, 44.00025),
  tree(2, 44.0001, true),
  tree(3, 44.0002),
  tree(5, null),
];

describe('the route of a measuring round', () => {
  it('when started at a tree, then it walks to its nearest neighbours in turn, unplaced trees last', () => {
    expect(roundOrder(trees, { treeId: 3 }).map((t) => t.id)).toEqual([3, 4, 2, 1, 5]);
  });

  it('when started where the forester stands, then the nearest tree comes first', () => {
    expect(roundOrder(trees, { at: { lat: 44.00031, lng: -72 } })[0].id).toBe(4);
  });

  it('when trees are measured or skipped, then the route leaves them out and keeps the skipped ones for the end', () => {
    const order = roundOrder(trees, { treeId: 1 });
    const route = roundRoute(order, new Set([3]), [1]);
    expect(route.ahead.map((t) => t.id)).toEqual([4, 5]);
    expect(route.skipped.map((t) => t.id)).toEqual([1]);
  });

  it('when the chosen start has no position, then it still comes first', () => {
    expect(roundOrder(trees, { treeId: 5 }).map((t) => t.id)).toEqual([5, 1, 2, 3, 4]);
  });
});
