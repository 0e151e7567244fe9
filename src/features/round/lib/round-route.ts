import { walkingOrder } from '@shared/geo/walking-order';
import type { RoundTree } from '../api/get-round';

export interface RoundStart {
  /** Start at this tree… */
  treeId?: number;
  /** …or where the forester stands. */
  at?: { lat: number; lng: number };
}

/**
 * The walking order through every tree of the round from the start (a tree, where the forester
 * stands, or the first tree). Measured trees stay in the order so that the route through the
 * rest does not jump about as trees are done.
 */
export function roundOrder(trees: readonly RoundTree[], start: RoundStart): RoundTree[] {
  const from = start.treeId !== undefined ? trees.find((t) => t.id === start.treeId) : undefined;
  const origin =
    start.at ??
    (from && from.lat !== null && from.lng !== null ? { lat: from.lat, lng: from.lng } : null);
  const ordered = walkingOrder(trees, origin);
  // A chosen start without a position still comes first.
  return from && !origin ? [from, ...ordered.filter((t) => t !== from)] : ordered;
}

/**
 * What is left to walk: the trees not measured this season (on the server or on this device),
 * in walking order, the skipped ones at the end to come back to.
 */
export function roundRoute(
  order: readonly RoundTree[],
  done: ReadonlySet<number>,
  skipped: readonly number[],
): { ahead: RoundTree[]; skipped: RoundTree[] } {
  const due = order.filter((t) => !t.measured && !done.has(t.id));
  const skippedSet = new Set(skipped);
  return {
    ahead: due.filter((t) => !skippedSet.has(t.id)),
    skipped: skipped
      .map((id) => due.find((t) => t.id === id))
      .filter((t): t is RoundTree => t !== undefined),
  };
}
