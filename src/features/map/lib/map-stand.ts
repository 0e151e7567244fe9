import type { VerdictKey } from '@shared/rules/verdicts';
import type { WarningCode } from '@shared/rules/warnings';
import type { Species, TreeStatus } from '@shared/schemas/enums';
import type { MapColumns } from '@shared/schemas/map';

/** One tree as the map, its legend, filters and card read it. */
export interface MapTree {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  species: Species;
  status: TreeStatus;
  verdict: VerdictKey;
  taps: number;
  /** Warning codes only; the card asks for the tree's advice, which has the messages. */
  warnings: readonly WarningCode[];
  /** Mapped outside the stand's boundary (false when there is no boundary or no position). */
  outside: boolean;
}

export type MappedTree = MapTree & { lat: number; lng: number };

/** A stand's map answer, decoded once: what every part of the map reads, built once per answer. */
export interface MapStand {
  season: number;
  /** Every tree, in tag order as people read tags (numbers by value): the order arrows step in. */
  trees: readonly MapTree[];
  /** The trees with a position, in the same order. */
  mapped: readonly MappedTree[];
  byId: ReadonlyMap<number, MapTree>;
}

const tagOrder = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });
export const byTag = (a: { tag: string }, b: { tag: string }) => tagOrder.compare(a.tag, b.tag);

export const isMapped = (tree: MapTree): tree is MappedTree =>
  tree.lat !== null && tree.lng !== null;

const NO_WARNINGS: readonly WarningCode[] = Object.freeze([]);

/**
 * Turns the map's columns into one object per tree, by the codes the answer carries. Trees
 * with the same warnings share one list, so a stand of 100,000 trees makes few of them.
 */
export function decodeMapStand(columns: MapColumns): MapStand {
  const { codes } = columns;
  const lists = new Map<number, readonly WarningCode[]>([[0, NO_WARNINGS]]);
  const warningsOf = (mask: number) => {
    let list = lists.get(mask);
    if (!list) {
      list = Object.freeze(codes.warning.filter((_, bit) => (mask & (1 << bit)) !== 0));
      lists.set(mask, list);
    }
    return list;
  };
  const trees: MapTree[] = new Array(columns.count);
  for (let i = 0; i < columns.count; i++) {
    trees[i] = {
      id: columns.ids[i],
      tag: columns.tags[i],
      lat: columns.lat[i],
      lng: columns.lng[i],
      species: codes.species[columns.species[i]],
      status: codes.status[columns.status[i]],
      verdict: codes.verdict[columns.verdict[i]],
      taps: columns.taps[i],
      warnings: warningsOf(columns.warnings[i]),
      outside: columns.outside[i] === 1,
    };
  }
  // The server sends its own tag order; this one sorts numbers by value ("2" before "10").
  trees.sort(byTag);
  return {
    season: columns.season,
    trees,
    mapped: trees.filter(isMapped),
    byId: new Map(trees.map((t) => [t.id, t])),
  };
}
